import { eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as listMail } from "@/app/api/v1/mail/route";
import { GET as getMail } from "@/app/api/v1/mail/[mailId]/route";
import { db } from "@/db/client";
import { mailOutbox } from "@/db/schema";
import { deliverDue, enqueueMail, retryMail } from "@/db/queries/mail";
import { deliverDueMail } from "@/lib/mail/outbox";
import { signedInUser, uniqueEmail, waitForMail, withCookie } from "@/tests/support/auth";

const base = "http://127.0.0.1:3100";

async function outboxRow(id: number) {
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id));
  return row!;
}

describe("mail outbox", () => {
  it("keeps a message whose delivery failed, with the error, and sends it on a later pass", async () => {
    const to = uniqueEmail("outbox");
    const id = await enqueueMail({ kind: "notice", toAddress: to, subject: "Door check", textBody: "hello" });
    const down = await deliverDue({
      send: async (m) => {
        if (m.to === to) throw new Error("connect ECONNREFUSED 127.0.0.1:2526");
      },
    });
    expect(down.failed).toBeGreaterThanOrEqual(1);
    const failed = await outboxRow(id);
    expect(failed).toMatchObject({ status: "failed", attempts: 1, lastError: "connect ECONNREFUSED 127.0.0.1:2526" });
    expect(failed.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());

    // Not due yet: a pass now leaves it alone.
    const sent: string[] = [];
    await deliverDue({ send: async (m) => void sent.push(m.to) });
    expect(sent).not.toContain(to);

    // An admin's "send again" makes it due; the SMTP stand-in is back.
    expect(await retryMail({ mailId: id })).toBe(true);
    await deliverDueMail();
    expect((await outboxRow(id)).status).toBe("sent");
    expect(await waitForMail(to)).toContain("hello");
    expect(await retryMail({ mailId: id })).toBe(false);
  });

  it("never sends one message twice when two passes run at once", async () => {
    const to = uniqueEmail("race");
    const ids = await Promise.all([1, 2, 3].map((n) => enqueueMail({ kind: "notice", toAddress: to, subject: `n${n}`, textBody: "x" })));
    const seen: string[] = [];
    const send = async (m: { to: string; subject: string }) => {
      if (m.to === to) seen.push(m.subject);
      await new Promise((r) => setTimeout(r, 20));
    };
    await Promise.all([deliverDue({ send }), deliverDue({ send })]);
    expect(seen.sort()).toEqual(["n1", "n2", "n3"]);
    const rows = await db.select({ status: mailOutbox.status }).from(mailOutbox).where(inArray(mailOutbox.id, ids));
    expect(rows.every((r) => r.status === "sent")).toBe(true);
  });
});

describe("captured mail API", () => {
  it("lists and shows captured messages to admins, with their links", async () => {
    const admin = await signedInUser("admin");
    const to = uniqueEmail("captured");
    await enqueueMail({ kind: "notice", toAddress: to, subject: "Links", textBody: "See http://127.0.0.1:3100/sites now." });
    await deliverDueMail();
    await waitForMail(to);
    const list = await listMail(new Request(`${base}/api/v1/mail?to=${encodeURIComponent(to)}`, { headers: withCookie(admin.cookie) }), {});
    expect(list.status).toBe(200);
    const { mails } = await list.json();
    expect(mails).toHaveLength(1);
    const one = await getMail(new Request(`${base}/api/v1/mail/${mails[0].id}`, { headers: withCookie(admin.cookie) }), { params: Promise.resolve({ mailId: String(mails[0].id) }) });
    expect((await one.json()).mail.links).toEqual(["http://127.0.0.1:3100/sites"]);
  });

  it("refuses non-admins and bad queries", async () => {
    const viewer = await signedInUser("viewer");
    const admin = await signedInUser("admin");
    expect((await listMail(new Request(`${base}/api/v1/mail`, { headers: withCookie(viewer.cookie) }), {})).status).toBe(403);
    expect((await listMail(new Request(`${base}/api/v1/mail`), {})).status).toBe(401);
    const bad = await listMail(new Request(`${base}/api/v1/mail?limit=0&to=nope`, { headers: withCookie(admin.cookie) }), {});
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues.map((i: { path: string }) => i.path).sort()).toEqual(["/limit", "/to"]);
    const ctx = (mailId: string) => ({ params: Promise.resolve({ mailId }) });
    expect((await getMail(new Request(`${base}/api/v1/mail/x`, { headers: withCookie(admin.cookie) }), ctx("x"))).status).toBe(400);
    expect((await getMail(new Request(`${base}/api/v1/mail/99999999`, { headers: withCookie(admin.cookie) }), ctx("99999999"))).status).toBe(404);
  });
});
