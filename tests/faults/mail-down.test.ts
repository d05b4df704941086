// The SMTP server is down while an admin invites people: the invitation still succeeds, the
// message waits in the outbox (shown as failed on the Mail page), and it is delivered by the
// instances' own retry loop once SMTP is back, exactly once.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { A, B, api, callFormAction, ensureServices, query, signInCrew, sleep, startMailSink, stopMailSink, uniqueTag, waitFor, type Crew } from "./support";

// instrumentation.ts retries every 15 s; a first failure is due again 15 s later (retryDelaySeconds).
const DELIVERY_WITHIN_MS = 40_000;

type OutboxRow = { id: number; status: string; attempts: number; last_error: string | null };

describe("SMTP down while inviting", () => {
  let crewA: Crew;
  let crewB: Crew;

  beforeAll(async () => {
    await ensureServices();
    [crewA, crewB] = await Promise.all([signInCrew(A), signInCrew(B)]);
  });

  afterAll(async () => {
    await startMailSink();
  });

  it("keeps the invitations in the outbox while SMTP is down and delivers each once after it returns", async () => {
    const tag = uniqueTag().toLowerCase();
    const viaRoute = `fault-mail-route-${tag}@example.test`;
    const viaAction = `fault-mail-action-${tag}@example.test`;
    await stopMailSink();

    const invited = await api(A, crewA.admin, "POST", "/api/v1/users", { name: "Outbox Route", email: viaRoute, role: "technician" });
    expect(invited.status, `invite over the API while SMTP is down: ${invited.text}`).toBe(201);
    const action = await callFormAction(B, {
      filename: "app/(console)/admin/users/actions.ts",
      exportedName: "inviteUserAction",
      pagePath: "/admin/users",
      cookie: crewB.admin,
      fields: { name: "Outbox Action", email: viaAction, role: "viewer" },
    });
    expect(action.status, action.text.slice(0, 300)).toBe(200);
    expect(action.result, `the People page's invite action while SMTP is down: ${action.text.slice(0, 300)}`).toMatchObject({ ok: true });

    for (const to of [viaRoute, viaAction]) {
      const rows = await query<OutboxRow>("SELECT id, status, attempts, last_error FROM mail_outbox WHERE to_address = ?", [to]);
      expect(rows, `one outbox message to ${to}`).toHaveLength(1);
      expect(["queued", "failed"], `outbox status to ${to}: ${JSON.stringify(rows[0])}`).toContain(rows[0]!.status);
      if (rows[0]!.status === "failed") expect(rows[0]!.last_error, "a failed message says why").toBeTruthy();
      expect(await query("SELECT id FROM captured_mails WHERE envelope_to = ?", [to])).toHaveLength(0);
    }
    // The admin sees it on the Mail page, from either instance.
    const page = await api(B, crewB.admin, "GET", "/admin/mail");
    expect(page.status).toBe(200);
    for (const to of [viaRoute, viaAction]) expect(page.text, `the Mail page lists ${to}`).toContain(to);
    const shown = (await query<OutboxRow>("SELECT status FROM mail_outbox WHERE to_address IN (?)", [[viaRoute, viaAction]])).map((r) => r.status);
    if (shown.includes("failed")) expect(page.text).toMatch(/failed/);

    await sleep(500);
    const smtpBack = Date.now();
    await startMailSink();
    await waitFor(async () => (await query("SELECT id FROM captured_mails WHERE envelope_to IN (?)", [[viaRoute, viaAction]])).length >= 2, {
      timeoutMs: DELIVERY_WITHIN_MS,
      intervalMs: 250,
      message: "the queued invitations were not delivered after SMTP came back: nothing retried them",
    });
    const deliveredAfter = Date.now() - smtpBack;
    // Let both instances' loops tick once more: a second send would show up as a second capture.
    await sleep(1000);
    for (const to of [viaRoute, viaAction]) {
      const captured = await query<{ text_body: string }>("SELECT text_body FROM captured_mails WHERE envelope_to = ?", [to]);
      expect(captured, `delivered to ${to} exactly once`).toHaveLength(1);
      expect(captured[0]!.text_body).toMatch(/set-password\?token=/);
      const [row] = await query<OutboxRow>("SELECT id, status, attempts, last_error FROM mail_outbox WHERE to_address = ?", [to]);
      expect(row!.status).toBe("sent");
    }
    console.log(`[faults] invitations delivered ${deliveredAfter} ms after SMTP came back`);
  });
});
