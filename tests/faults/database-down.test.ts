// MariaDB dies under device traffic: the API answers a plain 503 with Retry-After while it is
// gone, and serves configurations again by itself once it is back, without an app restart.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { A, B, approvedBase, createRelease, ensureServices, killDb, pollConfig, registerController, signInCrew, siteId, sleep, startDb, uniqueTag, type Answer } from "./support";

type Sample = { port: number; startedAt: number; endedAt: number; status: number; retryAfter: string | null; contentType: string; text: string };

const RECOVERY_MS = 10_000;
const STACK_FRAME = /\n\s*at\s|\bat\s+\S+\s+\(|node_modules|\.ts:\d+|\.js:\d+/;

function sampleOf(port: number, startedAt: number, answer: Answer): Sample {
  return { port, startedAt, endedAt: Date.now(), status: answer.status, retryAfter: answer.headers.get("retry-after"), contentType: answer.headers.get("content-type") ?? "", text: answer.text };
}

const describeSample = (s: Sample) => `${s.status} from ${s.port}: ${s.text.slice(0, 200)}`;

describe("MariaDB killed during device traffic", () => {
  let controller: { serial: string; token: string };
  let etag: string;

  beforeAll(async () => {
    await ensureServices();
    const crew = await signInCrew(A);
    const tag = uniqueTag();
    const base = await approvedBase(A, crew, `DB${tag}`);
    controller = await registerController(A, crew.technician, { serial: `FDB-${tag}`, doorModelId: base.doorModelId, siteId: await siteId() });
    const release = await createRelease(A, crew.admin, { baseRevisionId: base.revisionId, percent: 100 });
    expect(release.status, release.text).toBe(201);
    const first = await pollConfig(B, controller.serial, controller.token);
    expect(first.status, first.text).toBe(200);
    etag = first.headers.get("etag")!;
  });

  afterAll(async () => {
    // Whatever happened, leave MariaDB running for the other files.
    await startDb();
  });

  it("answers every poll with a plain 503 and Retry-After while MariaDB is down, and 200/304 again within 10 s of its return", async () => {
    const samples: Sample[] = [];
    const failures: string[] = [];
    let running = true;
    // Two pollers, one per instance, as fast as the server answers (with a short pause).
    const poller = async (port: number) => {
      while (running) {
        const startedAt = Date.now();
        try {
          samples.push(sampleOf(port, startedAt, await pollConfig(port, controller.serial, controller.token, etag)));
        } catch (err) {
          failures.push(`${port}: request failed: ${err instanceof Error ? err.message : String(err)}`);
        }
        await sleep(40);
      }
    };
    const pollers = [poller(A), poller(B)];

    await sleep(600);
    const killedAt = Date.now();
    await killDb();
    const deadAt = Date.now();
    await sleep(2500);
    const restartAt = Date.now();
    await startDb();
    const backAt = Date.now();
    // Poll until both instances serve again, or give up after the allowed recovery time.
    const servedAgain = (port: number) => samples.some((s) => s.port === port && s.startedAt >= backAt && (s.status === 200 || s.status === 304));
    while (Date.now() - backAt < RECOVERY_MS && !(servedAgain(A) && servedAgain(B))) await sleep(50);
    await sleep(300);
    running = false;
    await Promise.all(pollers);

    expect(failures, "no poll may fail at the HTTP level: the app must keep answering").toEqual([]);
    const before = samples.filter((s) => s.endedAt < killedAt);
    const down = samples.filter((s) => s.startedAt >= deadAt && s.endedAt < restartAt);
    const after = samples.filter((s) => s.startedAt >= backAt);
    expect(before.length, "polls before the kill").toBeGreaterThan(2);
    for (const s of before) expect([200, 304], describeSample(s)).toContain(s.status);
    expect(down.length, "polls while MariaDB was down").toBeGreaterThan(5);
    for (const s of down) {
      expect(s.status, `while MariaDB is down: ${describeSample(s)}`).toBe(503);
      expect(s.retryAfter, `Retry-After on ${describeSample(s)}`).toMatch(/^[1-9]\d*$/);
      expect(s.contentType).toContain("application/json");
      const body = JSON.parse(s.text) as Record<string, unknown>;
      expect(Object.keys(body).sort(), `503 body keys: ${s.text}`).toEqual(["error", "message"]);
      expect(body.error).toBe("unavailable");
      expect(typeof body.message === "string" && body.message.length > 0, s.text).toBe(true);
      expect(s.text, "no stack trace or driver text in a 503").not.toMatch(STACK_FRAME);
      expect(s.text).not.toMatch(/ECONNREFUSED|mysql|mariadb|sql/i);
    }
    // Around the kill and the restart a poll may still see the old or the new state, never a 500.
    for (const s of samples) {
      expect([200, 304, 503], `any poll: ${describeSample(s)}`).toContain(s.status);
      expect(s.text).not.toMatch(STACK_FRAME);
    }
    for (const port of [A, B]) {
      const firstServed = after.find((s) => s.port === port && (s.status === 200 || s.status === 304));
      expect(firstServed, `instance ${port} served a configuration again within ${RECOVERY_MS / 1000} s of MariaDB's return`).toBeDefined();
      expect(firstServed!.endedAt - backAt).toBeLessThan(RECOVERY_MS);
      // Once serving again it keeps serving, and the configuration is the one it had (304 on the ETag).
      const later = after.filter((s) => s.port === port && s.startedAt > firstServed!.endedAt);
      for (const s of later) expect([200, 304], `after recovery: ${describeSample(s)}`).toContain(s.status);
      expect(firstServed!.status, `unchanged configuration after recovery on ${port}`).toBe(304);
    }
    console.log(
      `[faults] MariaDB down ${restartAt - deadAt} ms, ${down.length} polls all 503; served again after ${[A, B].map((p) => after.find((s) => s.port === p && s.status !== 503)!.endedAt - backAt).join(" / ")} ms`,
    );
  });
});
