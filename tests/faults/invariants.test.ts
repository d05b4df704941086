// The invariant check the other fault tests rely on notices each kind of broken pairing (rows of
// this test's own door models are broken by hand with SQL).
import { beforeAll, describe, expect, it } from "vitest";
import { A, approvedBase, baseInReview, changeRelease, createRelease, ensureServices, integrityViolations, query, signInCrew, uniqueTag, type Crew } from "./support";

describe("the invariant check", () => {
  let crew: Crew;

  beforeAll(async () => {
    await ensureServices();
    crew = await signInCrew(A);
  });

  it("finds nothing on whole data and each broken pairing once it is broken", async () => {
    const tag = uniqueTag();
    const base = await approvedBase(A, crew, `IV${tag}`);
    const pending = await baseInReview(A, crew, `IW${tag}`);
    const created = await createRelease(A, crew.admin, { baseRevisionId: base.revisionId, percent: 10 });
    expect(created.status, created.text).toBe(201);
    const releaseId = (created.body as { releaseId: number }).releaseId;
    expect((await changeRelease(A, crew.admin, releaseId, { percent: 40 })).status).toBe(200);
    const models = [base.doorModelId, pending.doorModelId];
    expect(await integrityViolations(models)).toEqual([]);

    await query("DELETE FROM audit_events WHERE subject_type = 'revision' AND subject_id = ? AND action = 'revision.approved' ORDER BY id LIMIT 1", [String(base.revisionId)]);
    await query("UPDATE releases SET percent = 55 WHERE id = ?", [releaseId]);
    await query("UPDATE profile_revisions SET state = 'approved', decided_at = NOW(3) WHERE id = ?", [pending.revisionId]);
    await query("INSERT INTO releases (base_revision_id, door_model_id, overlay_revision_ids, target_kind, percent) VALUES (?, ?, '{}', 'door_model', 5)", [pending.revisionId, pending.doorModelId]);
    await query("UPDATE profile_revisions SET state = 'in_review' WHERE id = ?", [pending.revisionId]);

    const found = (await integrityViolations(models)).join("\n");
    expect(found).toMatch(new RegExp(`decision \\d+ \\(approve of revision ${base.revisionId}\\) has 0 audit events`));
    expect(found).toContain(`release ${releaseId} is at 55 % but its audit trail ends at 40 %`);
    expect(found).toMatch(/release \d+ pins base revision \d+, which is in_review/);
    expect(found).toMatch(/release \d+ has 0 release\.created audit events/);
  });
});
