// An app instance is SIGKILLed while approvals, releases and widenings are in flight: after a
// restart, everything the code writes in one transaction is found together or not at all, and no
// row lock of the dead process is left behind.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { A, B, approve, approvedBase, baseInReview, changeRelease, createRelease, ensureServices, integrityViolations, json, killApp, query, signInCrew, siteId, startApp, uniqueTag, userId, type Answer, type Crew, type InReview } from "./support";

type Op = { label: string; run: () => Promise<Answer>; effect: (answer: Answer) => Promise<string | null> };
type Outcome = { label: string; status: number | null; error: string | null; effect: Op["effect"]; answer: Answer | null };

const CONCURRENCY = 10;
const KILL_AFTER = 6;

describe("app instance killed mid-approvals and mid-releases", () => {
  let crewA: Crew;
  let inReview: InReview[];
  let approved: { base: InReview; releaseId: number }[];
  let doorModelIds: number[];
  let reviewerIds: Record<"reviewer" | "reviewer2", string>;
  let lindenhof: number;

  beforeAll(async () => {
    await ensureServices();
    const crewB = await signInCrew(B);
    crewA = await signInCrew(A);
    const tag = uniqueTag();
    // One after the other: creating base profiles at the same moment is a test of its own.
    inReview = [];
    for (const i of [0, 1, 2, 3, 4, 5]) inReview.push(await baseInReview(B, crewB, `K${tag}R${i}`));
    approved = [];
    for (const i of [0, 1, 2]) {
      const base = await approvedBase(B, crewB, `K${tag}A${i}`);
      const created = await createRelease(B, crewB.admin, { baseRevisionId: base.revisionId, percent: 10 });
      if (created.status !== 201) throw new Error(`release of ${base.revisionId}: ${created.status} ${created.text}`);
      approved.push({ base, releaseId: (created.body as { releaseId: number }).releaseId });
    }
    doorModelIds = [...inReview, ...approved.map((a) => a.base)].map((r) => r.doorModelId);
    reviewerIds = { reviewer: await userId("reviewer@hollowmere.example"), reviewer2: await userId("reviewer2@hollowmere.example") };
    lindenhof = await siteId();
    expect(inReview.every((r) => r.requiredApprovals === 2), "a new base profile needs two approvals").toBe(true);
  });

  afterAll(async () => {
    await startApp(A);
  });

  function operations(): Op[] {
    const decisionStored = (revisionId: number, who: keyof typeof reviewerIds) => async () => {
      const rows = await query("SELECT id FROM review_decisions WHERE revision_id = ? AND reviewer_id = ?", [revisionId, reviewerIds[who]]);
      return rows.length === 1 ? null : `answered 200 but ${rows.length} decision rows are stored`;
    };
    const releaseStored = async (answer: Answer) => {
      const id = (answer.body as { releaseId?: number }).releaseId;
      const rows = await query("SELECT id FROM releases WHERE id = ?", [id]);
      return rows.length === 1 ? null : `answered 201 with release ${id}, which is not stored`;
    };
    const widenStored = (releaseId: number, percent: number) => async () => {
      const rows = await query<{ detail: unknown }>("SELECT detail FROM audit_events WHERE subject_type = 'release' AND subject_id = ? AND action = 'release.widened'", [String(releaseId)]);
      return rows.some((r) => (json(r.detail).to as { percent?: number }).percent === percent) ? null : `answered 200 but no audit event widens release ${releaseId} to ${percent} %`;
    };
    const ops: Op[] = [];
    for (const [i, r] of inReview.entries()) {
      ops.push({ label: `approve ${r.revisionId} as reviewer`, run: () => approve(A, crewA.reviewer, r.revisionId, r.contentHash), effect: decisionStored(r.revisionId, "reviewer") });
      const a = approved[i % approved.length]!;
      const percent = 20 + 10 * Math.floor(i / approved.length);
      ops.push({ label: `widen ${a.releaseId} to ${percent}`, run: () => changeRelease(A, crewA.admin, a.releaseId, { percent }), effect: widenStored(a.releaseId, percent) });
      ops.push({ label: `approve ${r.revisionId} as reviewer2`, run: () => approve(A, crewA.reviewer2, r.revisionId, r.contentHash), effect: decisionStored(r.revisionId, "reviewer2") });
      ops.push({ label: `release ${r.revisionId}`, run: () => createRelease(A, crewA.admin, { baseRevisionId: r.revisionId, percent: 5 }), effect: releaseStored });
    }
    for (const a of approved) {
      ops.push({ label: `release ${a.base.revisionId} to Lindenhof`, run: () => createRelease(A, crewA.admin, { baseRevisionId: a.base.revisionId, percent: 15, target: { kind: "site", siteId: lindenhof } }), effect: releaseStored });
      for (const percent of [60, 80]) ops.push({ label: `widen ${a.releaseId} to ${percent}`, run: () => changeRelease(A, crewA.admin, a.releaseId, { percent }), effect: widenStored(a.releaseId, percent) });
    }
    return ops;
  }

  it("leaves no approval, release or widening half-written, and every answered write stored", async () => {
    expect(await integrityViolations(doorModelIds), "before the storm").toEqual([]);
    const queue = operations();
    const total = queue.length;
    const outcomes: Outcome[] = [];
    let inFlight = 0;
    let inFlightAtKill = -1;
    let killed: Promise<void> | null = null;
    const worker = async () => {
      while (queue.length && !killed) {
        const op = queue.shift()!;
        inFlight++;
        try {
          const answer = await op.run();
          outcomes.push({ label: op.label, status: answer.status, error: null, effect: op.effect, answer });
        } catch (err) {
          outcomes.push({ label: op.label, status: null, error: err instanceof Error ? (err.cause instanceof Error ? err.cause.message : err.message) : String(err), effect: op.effect, answer: null });
        }
        inFlight--;
        if (!killed && outcomes.length >= KILL_AFTER) {
          inFlightAtKill = inFlight;
          killed = killApp(A, "SIGKILL");
        }
      }
    };
    await Promise.all(Array.from({ length: CONCURRENCY }, worker));
    await killed;
    const answered = outcomes.filter((o) => o.status !== null);
    console.log(`[faults] ${total} writes queued, ${answered.length} answered, ${outcomes.length - answered.length} cut off, ${inFlightAtKill} in flight at the kill`);
    expect(inFlightAtKill, "requests were in flight when the instance died").toBeGreaterThan(0);
    expect(outcomes.length - answered.length, "some requests were cut off by the kill").toBeGreaterThan(0);
    expect(answered.length, "the instance died before every write was answered").toBeLessThan(total);
    for (const o of answered) expect([200, 201, 400, 409], `${o.label}: ${o.answer?.text.slice(0, 300)}`).toContain(o.status);

    await startApp(A);
    expect(await integrityViolations(doorModelIds), "after the kill and restart").toEqual([]);
    const lost: string[] = [];
    for (const o of answered.filter((x) => x.status === 200 || x.status === 201)) {
      const problem = await o.effect(o.answer!);
      if (problem) lost.push(`${o.label}: ${problem}`);
    }
    expect(lost, "every write that was answered as done is stored").toEqual([]);

    // No lock of the dead process is left: the restarted instance finishes every review and widening.
    const crew = await signInCrew(A);
    for (const r of inReview) {
      for (const reviewer of [crew.reviewer, crew.reviewer2]) {
        const answer = await approve(A, reviewer, r.revisionId, r.contentHash);
        if (answer.status !== 200) expect(answer.text, `approving ${r.revisionId} after the restart`).toMatch(/already decided|approved, not waiting/);
      }
    }
    for (const a of approved) {
      const answer = await changeRelease(A, crew.admin, a.releaseId, { percent: 100 });
      expect(answer.status, `widening ${a.releaseId} after the restart: ${answer.text}`).toBe(200);
    }
    const states = await query<{ state: string }>("SELECT state FROM profile_revisions WHERE id IN (?)", [inReview.map((r) => r.revisionId)]);
    expect(states.map((s) => s.state)).toEqual(inReview.map(() => "approved"));
    expect(await integrityViolations(doorModelIds), "after finishing on the restarted instance").toEqual([]);
  });

  it("moves the configuration generation in the same transaction as every release change", async () => {
    // Every instance trusts its cached device configurations until this number moves, so a release
    // change committed without its bump would go unserved; extra bumps are harmless.
    const [gen] = await query<{ generation: number }>("SELECT generation FROM config_generation WHERE id = 1");
    const [changes] = await query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM audit_events WHERE subject_type = 'release' AND action IN ('release.created', 'release.widened', 'release.paused', 'release.resumed', 'release.rolled_back')",
    );
    expect(gen, "config_generation has its row").toBeDefined();
    expect(Number(gen!.generation), `generation ${gen!.generation} against ${changes!.n} release changes in the audit log`).toBeGreaterThanOrEqual(Number(changes!.n));
  });
});
