// People acting at the same moment on two instances: each request gets one clear outcome, and the
// rows say what the answers said.
import { beforeAll, describe, expect, it } from "vitest";
import { A, B, api, apiExpect, approve, approvedBase, baseInReview, changeRelease, createDoorModel, createRelease, ensureServices, fleetDocument, integrityViolations, invitedUser, json, query, signInCrew, uniqueTag, userId, type Answer, type Crew } from "./support";

type Outcome = { state: string; approvals: number; required: number };

describe("two people at the same moment on two instances", () => {
  let crewA: Crew;
  let crewB: Crew;
  let secondAdminB: string;
  let tag: string;

  beforeAll(async () => {
    await ensureServices();
    [crewA, crewB] = await Promise.all([signInCrew(A), signInCrew(B)]);
    tag = uniqueTag();
    secondAdminB = (await invitedUser(B, crewB.admin, "admin", tag)).cookie;
  });

  it("records both reviewers' approvals of one revision once each, and approves it once (three rounds)", async () => {
    const ids = { reviewer: await userId("reviewer@hollowmere.example"), reviewer2: await userId("reviewer2@hollowmere.example") };
    for (const round of [1, 2, 3]) {
      const r = await baseInReview(A, crewA, `RV${tag}${round}`);
      expect(r.requiredApprovals).toBe(2);
      const [onA, onB] = await Promise.all([approve(A, crewA.reviewer, r.revisionId, r.contentHash), approve(B, crewB.reviewer2, r.revisionId, r.contentHash)]);
      expect([onA.status, onB.status], `round ${round}: ${onA.text} | ${onB.text}`).toEqual([200, 200]);
      const outcomes = [onA.body, onB.body] as unknown as Outcome[];
      expect(outcomes.map((o) => `${o.state}:${o.approvals}`).sort(), "one answer counts the first approval, the other the second").toEqual(["approved:2", "in_review:1"]);
      const [rev] = await query<{ state: string }>("SELECT state FROM profile_revisions WHERE id = ?", [r.revisionId]);
      expect(rev!.state).toBe("approved");
      const decisions = await query<{ reviewer_id: string }>("SELECT reviewer_id FROM review_decisions WHERE revision_id = ? ORDER BY reviewer_id", [r.revisionId]);
      expect(decisions.map((d) => d.reviewer_id)).toEqual([ids.reviewer, ids.reviewer2].sort());
      expect(await integrityViolations([r.doorModelId])).toEqual([]);
    }
  });

  it("lets one reviewer's double submission from two instances count once and answer the other 409", async () => {
    const r = await baseInReview(A, crewA, `RD${tag}`);
    const answers = await Promise.all([approve(A, crewA.reviewer, r.revisionId, r.contentHash), approve(B, crewB.reviewer, r.revisionId, r.contentHash)]);
    expect(answers.map((a) => a.status).sort(), answers.map((a) => a.text).join(" | ")).toEqual([200, 409]);
    expect(answers.find((a) => a.status === 409)!.body.error).toBe("conflict");
    const decisions = await query("SELECT id FROM review_decisions WHERE revision_id = ?", [r.revisionId]);
    expect(decisions).toHaveLength(1);
    const [rev] = await query<{ state: string }>("SELECT state FROM profile_revisions WHERE id = ?", [r.revisionId]);
    expect(rev!.state, "one approval of two: still in review").toBe("in_review");
    expect(await integrityViolations([r.doorModelId])).toEqual([]);
  });

  it("creates one release when two admins release the same revision to the same target at once, and answers the other 409", async () => {
    const base = await approvedBase(A, crewA, `RR${tag}`);
    const body = { baseRevisionId: base.revisionId, percent: 25, target: { kind: "door_model" } };
    const answers = await Promise.all([createRelease(A, crewA.admin, body), createRelease(B, secondAdminB, body)]);
    const rows = await query<{ id: number }>("SELECT id FROM releases WHERE base_revision_id = ? AND target_kind = 'door_model' AND percent = 25", [base.revisionId]);
    expect(rows.length, `releases created: ${answers.map((a) => `${a.status} ${a.text.slice(0, 160)}`).join(" | ")}`).toBe(1);
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
    expect(answers.find((a) => a.status === 409)!.body.error).toBe("conflict");
    expect((answers.find((a) => a.status === 201)!.body as { releaseId: number }).releaseId).toBe(rows[0]!.id);
    expect(await integrityViolations([base.doorModelId])).toEqual([]);
  });

  it("widens one release to either admin's percent when both widen it at once, with one audit event per success (three rounds)", async () => {
    const base = await approvedBase(A, crewA, `RW${tag}`);
    const created = await createRelease(A, crewA.admin, { baseRevisionId: base.revisionId, percent: 10 });
    expect(created.status, created.text).toBe(201);
    const releaseId = (created.body as { releaseId: number }).releaseId;
    for (const [pa, pb] of [[30, 60], [75, 70], [90, 100]] as const) {
      const before = await query("SELECT id FROM audit_events WHERE subject_type = 'release' AND subject_id = ? AND action = 'release.widened'", [String(releaseId)]);
      const [onA, onB] = await Promise.all([changeRelease(A, crewA.admin, releaseId, { percent: pa }), changeRelease(B, secondAdminB, releaseId, { percent: pb })]);
      const [row] = await query<{ percent: number }>("SELECT percent FROM releases WHERE id = ?", [releaseId]);
      const tried: [Answer, number][] = [
        [onA, pa],
        [onB, pb],
      ];
      const succeeded = tried.filter(([a]) => a.status === 200).map(([, p]) => p);
      const summary = `${pa} on A → ${onA.status} ${onA.text.slice(0, 120)} | ${pb} on B → ${onB.status} ${onB.text.slice(0, 120)}; row at ${row!.percent} %`;
      expect(succeeded.length, summary).toBeGreaterThan(0);
      for (const [a, p] of tried) {
        if (a.status === 200) continue;
        // A 409 either way: the row was locked and changed meanwhile, or the other widening landed first and went further.
        expect(a.status, summary).toBe(409);
        if (!a.text.includes("only widens")) continue;
        expect(row!.percent, summary).toBeGreaterThan(p);
      }
      expect([pa, pb], summary).toContain(row!.percent);
      expect(succeeded, summary).toContain(row!.percent);
      const events = await query<{ detail: unknown }>("SELECT detail FROM audit_events WHERE subject_type = 'release' AND subject_id = ? AND action = 'release.widened' ORDER BY id", [String(releaseId)]);
      const fresh = events.slice(before.length).map((e) => (json(e.detail).to as { percent: number }).percent);
      expect(fresh.sort(), `one audit event per successful widening: ${summary}`).toEqual([...succeeded].sort());
      expect((json(events.at(-1)!.detail).to as { percent: number }).percent, `the newest audit event ends where the row is: ${summary}`).toBe(row!.percent);
    }
    expect(await integrityViolations([base.doorModelId])).toEqual([]);
  });

  it("creates every base profile when engineers on both instances start profiles for new door models at the same moment (six at once, three rounds)", async () => {
    for (const round of [1, 2, 3]) {
      const models: number[] = [];
      for (const i of [0, 1, 2, 3, 4, 5]) models.push(await createDoorModel(`RP${tag}${round}${i}`));
      const answers = await Promise.all(
        models.map((doorModelId, i) => {
          const [port, cookie] = i % 2 === 0 ? [A, crewA.engineer] : [B, crewB.engineer];
          return apiExpect<{ profileId: number }>(201, port, cookie, "POST", "/api/v1/profiles", { layer: "base", name: `Race base ${tag} ${round}${i}`, doorModelId, schemaVersion: 2, content: fleetDocument() }).then(
            (body) => `201 profile ${body.profileId}`,
            (err: Error) => err.message,
          );
        }),
      );
      expect(answers.filter((a) => !a.startsWith("201")), `round ${round} (the cause is in .artifacts/faults-3101.log and faults-3102.log)`).toEqual([]);
      const rows = await query("SELECT id FROM profiles WHERE layer = 'base' AND door_model_id IN (?)", [models]);
      expect(rows).toHaveLength(models.length);
    }
  });

  it("creates one base profile when two engineers start the base profile of the same door model at once, and answers the other 409 (six rounds)", async () => {
    for (const round of [1, 2, 3, 4, 5, 6]) {
      const doorModelId = await createDoorModel(`RS${tag}${round}`);
      const body = (i: number) => ({ layer: "base", name: `Same base ${tag} ${round}${i}`, doorModelId, schemaVersion: 2, content: fleetDocument() });
      const answers = await Promise.all([api(A, crewA.engineer, "POST", "/api/v1/profiles", body(0)), api(B, crewB.engineer, "POST", "/api/v1/profiles", body(1))]);
      const summary = `round ${round}: ${answers.map((a) => `${a.status} ${a.text.slice(0, 120)}`).join(" | ")}`;
      expect(answers.map((a) => a.status).sort(), summary).toEqual([201, 409]);
      expect(await query("SELECT id FROM profiles WHERE layer = 'base' AND door_model_id = ?", [doorModelId]), summary).toHaveLength(1);
    }
  });
});
