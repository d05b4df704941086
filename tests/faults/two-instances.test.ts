// Two app instances over one database: what one of them approves and releases, the other serves
// on the very next device poll, byte for byte the same.
import { beforeAll, describe, expect, it } from "vitest";
import { A, B, apiExpect, approve, approvedBase, changeRelease, createRelease, ensureServices, fleetDocument, pollConfig, registerController, signInCrew, siteId, submitForReview, uniqueTag, type Crew } from "./support";

type Config = { releaseId: number; baseRevisionId: number; contentHash: string; parameters: { travelTimeoutMs: number } };

describe("two instances over one database", () => {
  let crewA: Crew;
  let crewB: Crew;

  beforeAll(async () => {
    await ensureServices();
    [crewA, crewB] = await Promise.all([signInCrew(A), signInCrew(B)]);
  });

  it("serves on instance B, at the next poll, a revision approved and released through instance A", async () => {
    const tag = uniqueTag();
    const base = await approvedBase(A, crewA, `TI${tag}`);
    const controller = await registerController(A, crewA.technician, { serial: `FTI-${tag}`, doorModelId: base.doorModelId, siteId: await siteId() });
    const first = await createRelease(A, crewA.admin, { baseRevisionId: base.revisionId, percent: 100 });
    expect(first.status, first.text).toBe(201);
    const firstReleaseId = (first.body as { releaseId: number }).releaseId;

    // B serves the first release at once, and keeps serving it (304) until something changes.
    const onB = await pollConfig(B, controller.serial, controller.token);
    expect(onB.status, onB.text).toBe(200);
    expect((onB.body as unknown as Config).releaseId).toBe(firstReleaseId);
    const firstEtag = onB.headers.get("etag")!;
    expect((await pollConfig(B, controller.serial, controller.token, firstEtag)).status).toBe(304);
    expect((await pollConfig(A, controller.serial, controller.token, firstEtag)).status, "both instances give the same ETag").toBe(304);

    // A new revision, reviewed and released entirely through A.
    const saved = await apiExpect<{ revisionId: number }>(201, A, crewA.engineer, "POST", `/api/v1/profiles/${base.profileId}/revisions`, {
      parentRevisionId: base.revisionId,
      message: "Longer travel timeout",
      content: fleetDocument({ travelTimeoutMs: 13000 }),
    });
    const { contentHash, requiredApprovals } = await submitForReview(A, crewA.engineer, saved.revisionId);
    for (const reviewer of [crewA.reviewer, crewA.reviewer2].slice(0, requiredApprovals)) {
      const answer = await approve(A, reviewer, saved.revisionId, contentHash);
      expect(answer.status, answer.text).toBe(200);
    }
    const second = await createRelease(A, crewA.admin, { baseRevisionId: saved.revisionId, percent: 100 });
    expect(second.status, second.text).toBe(201);
    const secondReleaseId = (second.body as { releaseId: number }).releaseId;

    const next = await pollConfig(B, controller.serial, controller.token, firstEtag);
    expect(next.status, `B's very next poll after the release on A: ${next.text.slice(0, 200)}`).toBe(200);
    const config = next.body as unknown as Config;
    expect(config.releaseId).toBe(secondReleaseId);
    expect(config.baseRevisionId).toBe(saved.revisionId);
    expect(config.parameters.travelTimeoutMs).toBe(13000);
    const secondEtag = next.headers.get("etag")!;
    expect(secondEtag).not.toBe(firstEtag);
    const onA = await pollConfig(A, controller.serial, controller.token);
    expect(onA.text, "A serves the same bytes").toBe(next.text);
    expect(onA.headers.get("etag")).toBe(secondEtag);

    // Changes to the release made on B show on A's very next poll: paused, then rolled back to the first release.
    const paused = await changeRelease(B, crewB.admin, secondReleaseId, { state: "paused" });
    expect(paused.status, paused.text).toBe(200);
    // A paused release still counts as live: the controller keeps the parameters it has.
    const whilePaused = await pollConfig(A, controller.serial, controller.token);
    expect(whilePaused.status, whilePaused.text.slice(0, 200)).toBe(200);
    expect((whilePaused.body as unknown as Config).releaseId).toBe(secondReleaseId);
    expect((whilePaused.body as unknown as Config).contentHash).toBe(config.contentHash);
    const rolledBack = await changeRelease(B, crewB.admin, secondReleaseId, { state: "rolled_back" });
    expect(rolledBack.status, rolledBack.text).toBe(200);
    const afterRollback = await pollConfig(A, controller.serial, controller.token, secondEtag);
    expect(afterRollback.status, `A's very next poll after the rollback on B: ${afterRollback.text.slice(0, 200)}`).toBe(200);
    expect((afterRollback.body as unknown as Config).releaseId).toBe(firstReleaseId);
    expect(afterRollback.headers.get("etag")).toBe(firstEtag);
  });
});
