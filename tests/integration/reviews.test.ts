import { and, eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as createProfileRoute } from "@/app/api/v1/profiles/route";
import { POST as saveRoute } from "@/app/api/v1/profiles/[profileId]/revisions/route";
import { GET as revisionRoute } from "@/app/api/v1/revisions/[revisionId]/route";
import { POST as submitRoute } from "@/app/api/v1/revisions/[revisionId]/submit/route";
import { POST as decisionRoute } from "@/app/api/v1/revisions/[revisionId]/decision/route";
import { POST as withdrawRoute } from "@/app/api/v1/revisions/[revisionId]/withdraw/route";
import { POST as commentRoute } from "@/app/api/v1/revisions/[revisionId]/comments/route";
import { GET as queueRoute } from "@/app/api/v1/reviews/route";
import { db } from "@/db/client";
import { auditEvents, profileRevisions, reviewDecisions } from "@/db/schema";
import { setSafetyApprovals } from "@/db/queries/reviews";
import { signedInUser, waitForMail } from "@/tests/support/auth";
import { baseDocument, createDoorModel, jsonRequest, params } from "@/tests/support/profiles";

type Person = Awaited<ReturnType<typeof signedInUser>>;

async function draft(author: Person, content = baseDocument()) {
  const model = await createDoorModel();
  const res = await createProfileRoute(jsonRequest("/api/v1/profiles", author.cookie, "POST", { layer: "base", name: `Base ${model.code}`, doorModelId: model.id, schemaVersion: 2, content }), {});
  expect(res.status).toBe(201);
  return (await res.json()) as { profileId: number; revisionId: number };
}

async function warningsOf(cookie: string, revisionId: number): Promise<string[]> {
  const body = await (await revisionRoute(jsonRequest(`/api/v1/revisions/${revisionId}`, cookie, "GET"), params("revisionId", revisionId))).json();
  return body.checks.findings.filter((f: { severity: string }) => f.severity === "warning").map((f: { ruleId: string }) => f.ruleId);
}

async function submit(author: Person, revisionId: number) {
  const acknowledgements = (await warningsOf(author.cookie, revisionId)).map((ruleId) => ({ ruleId, reason: "Checked on the test door; acceptable here." }));
  return submitRoute(jsonRequest(`/api/v1/revisions/${revisionId}/submit`, author.cookie, "POST", { acknowledgements }), params("revisionId", revisionId));
}

async function hashOf(revisionId: number) {
  const [r] = await db.select({ h: profileRevisions.contentHash }).from(profileRevisions).where(eq(profileRevisions.id, revisionId));
  return r!.h;
}

const decide = async (reviewer: Person, revisionId: number, decision: "approve" | "request_changes", comment?: string, hash?: string) =>
  decisionRoute(jsonRequest(`/api/v1/revisions/${revisionId}/decision`, reviewer.cookie, "POST", { decision, contentHash: hash ?? (await hashOf(revisionId)), comment }), params("revisionId", revisionId));

async function stateOf(revisionId: number) {
  const [r] = await db.select({ s: profileRevisions.state }).from(profileRevisions).where(eq(profileRevisions.id, revisionId));
  return r!.s;
}

describe("submitting for review", () => {
  it("asks for a reason for each safety warning before it accepts a submission", async () => {
    const engineer = await signedInUser("engineer");
    const { revisionId } = await draft(engineer);
    expect(await warningsOf(engineer.cookie, revisionId)).toContain("RL-NO-SITE");
    const bare = await submitRoute(jsonRequest(`/api/v1/revisions/${revisionId}/submit`, engineer.cookie, "POST", { acknowledgements: [] }), params("revisionId", revisionId));
    expect(bare.status).toBe(400);
    expect((await bare.json()).message).toMatch(/RL-NO-SITE/);
    const short = await submitRoute(jsonRequest(`/api/v1/revisions/${revisionId}/submit`, engineer.cookie, "POST", { acknowledgements: [{ ruleId: "RL-NO-SITE", reason: "ok" }] }), params("revisionId", revisionId));
    expect(short.status).toBe(400);
    expect((await submit(engineer, revisionId)).status).toBe(200);
    expect(await stateOf(revisionId)).toBe("in_review");
  });

  it("refuses to submit a revision with a safety error", async () => {
    const engineer = await signedInUser("engineer");
    const { revisionId } = await draft(engineer, baseDocument({ stall: { thresholdCps: 400, windowMs: 100, startupBlankingMs: 300, reopenOnStall: true } }));
    const res = await submit(engineer, revisionId);
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].message).toMatch(/RL-STALL-FRACTION/);
    expect(await stateOf(revisionId)).toBe("draft");
  });

  it("mails the reviewers and lists the revision in their queue", async () => {
    const reviewer = await signedInUser("reviewer");
    const engineer = await signedInUser("engineer");
    const { revisionId } = await draft(engineer);
    await submit(engineer, revisionId);
    expect(await waitForMail(reviewer.email)).toMatch(/submitted revision 1/);
    const queue = (await (await queueRoute(jsonRequest("/api/v1/reviews", reviewer.cookie, "GET"), {})).json()).queue;
    expect(queue.map((q: { revisionId: number }) => q.revisionId)).toContain(revisionId);
  });
});

describe("deciding", () => {
  it("never lets the author approve their own revision", async () => {
    const admin = await signedInUser("admin");
    const { revisionId } = await draft(admin);
    await submit(admin, revisionId);
    const res = await decide(admin, revisionId, "approve");
    expect(res.status).toBe(403);
    expect(await stateOf(revisionId)).toBe("in_review");
  });

  it("needs two approvals from different reviewers for a safety-relevant change", async () => {
    const admin = await signedInUser("admin");
    await setSafetyApprovals({ actorId: admin.id, value: 2 });
    const engineer = await signedInUser("engineer");
    const [r1, r2] = [await signedInUser("reviewer"), await signedInUser("reviewer")];
    const { revisionId } = await draft(engineer);
    const submitted = await (await submit(engineer, revisionId)).json();
    expect(submitted).toMatchObject({ safetyRelevant: true, requiredApprovals: 2 });
    expect((await (await decide(r1, revisionId, "approve")).json()).state).toBe("in_review");
    expect((await decide(r1, revisionId, "approve")).status).toBe(409);
    expect((await (await decide(r2, revisionId, "approve")).json()).state).toBe("approved");
    expect(await waitForMail(engineer.email)).toBeTruthy();
    const audit = await db.select({ action: auditEvents.action }).from(auditEvents).where(eq(auditEvents.subjectId, String(revisionId)));
    expect(audit.map((a) => a.action)).toEqual(expect.arrayContaining(["revision.submitted", "revision.approved"]));
  });

  it("binds an approval to the content hash the reviewer saw", async () => {
    const engineer = await signedInUser("engineer");
    const reviewer = await signedInUser("reviewer");
    const { revisionId } = await draft(engineer);
    await submit(engineer, revisionId);
    const res = await decide(reviewer, revisionId, "approve", undefined, "0".repeat(64));
    expect(res.status).toBe(409);
    expect(await db.select().from(reviewDecisions).where(eq(reviewDecisions.revisionId, revisionId))).toHaveLength(0);
  });

  it("needs a fresh review after a new revision: the old one is superseded", async () => {
    const engineer = await signedInUser("engineer");
    const reviewer = await signedInUser("reviewer");
    const { profileId, revisionId } = await draft(engineer);
    await submit(engineer, revisionId);
    const saved = await saveRoute(jsonRequest(`/api/v1/profiles/${profileId}/revisions`, engineer.cookie, "POST", { parentRevisionId: revisionId, message: "One more tweak", content: baseDocument({ debounceMs: 45 }) }), params("profileId", profileId));
    const { revisionId: next } = await saved.json();
    expect(await stateOf(revisionId)).toBe("superseded");
    expect((await decide(reviewer, revisionId, "approve")).status).toBe(409);
    expect(await stateOf(next)).toBe("draft");
  });

  it("gives exactly one outcome when two reviewers act at the same moment", async () => {
    const admin = await signedInUser("admin");
    await setSafetyApprovals({ actorId: admin.id, value: 1 });
    try {
      const engineer = await signedInUser("engineer");
      const [r1, r2] = [await signedInUser("reviewer"), await signedInUser("reviewer")];
      const { revisionId } = await draft(engineer);
      await submit(engineer, revisionId);
      const results = await Promise.all([decide(r1, revisionId, "approve"), decide(r2, revisionId, "request_changes", "Blanking looks long")]);
      expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
      const decisions = await db.select().from(reviewDecisions).where(eq(reviewDecisions.revisionId, revisionId));
      expect(decisions).toHaveLength(1);
      expect(await stateOf(revisionId)).toBe(decisions[0]!.decision === "approve" ? "approved" : "changes_requested");
    } finally {
      await setSafetyApprovals({ actorId: admin.id, value: 2 });
    }
  });

  it("asks for a comment when sending a revision back, and lets the author withdraw", async () => {
    const engineer = await signedInUser("engineer");
    const reviewer = await signedInUser("reviewer");
    const { revisionId } = await draft(engineer);
    await submit(engineer, revisionId);
    const bare = await decide(reviewer, revisionId, "request_changes");
    expect(bare.status).toBe(400);
    expect((await bare.json()).issues[0].path).toBe("/comment");
    const withdrawn = await withdrawRoute(jsonRequest(`/api/v1/revisions/${revisionId}/withdraw`, engineer.cookie, "POST"), params("revisionId", revisionId));
    expect(withdrawn.status).toBe(200);
    expect(await stateOf(revisionId)).toBe("draft");
  });

  it("anchors comments to a parameter path and refuses viewers", async () => {
    const engineer = await signedInUser("engineer");
    const reviewer = await signedInUser("reviewer");
    const viewer = await signedInUser("viewer");
    const { revisionId } = await draft(engineer);
    const ok = await commentRoute(jsonRequest(`/api/v1/revisions/${revisionId}/comments`, reviewer.cookie, "POST", { path: "/stall/thresholdCps", body: "Why 50 %?" }), params("revisionId", revisionId));
    expect(ok.status).toBe(201);
    const bad = await commentRoute(jsonRequest(`/api/v1/revisions/${revisionId}/comments`, reviewer.cookie, "POST", { path: "stall", body: "x" }), params("revisionId", revisionId));
    expect(bad.status).toBe(400);
    expect((await commentRoute(jsonRequest(`/api/v1/revisions/${revisionId}/comments`, viewer.cookie, "POST", { path: "/debounceMs", body: "x" }), params("revisionId", revisionId))).status).toBe(403);
    expect((await decisionRoute(jsonRequest(`/api/v1/revisions/${revisionId}/decision`, engineer.cookie, "POST", { decision: "approve", contentHash: "0".repeat(64) }), params("revisionId", revisionId))).status).toBe(403);
    const rows = await db.select().from(auditEvents).where(and(eq(auditEvents.subjectId, String(revisionId)), inArray(auditEvents.action, ["revision.commented"])));
    expect(rows).toHaveLength(1);
  });
});

describe("audit log API", () => {
  it("filters by action and exports CSV for reviewers, and refuses engineers", async () => {
    const { GET: auditRoute } = await import("@/app/api/v1/audit/route");
    const reviewer = await signedInUser("reviewer");
    const engineer = await signedInUser("engineer");
    const { revisionId } = await draft(engineer);
    const json = await (await auditRoute(jsonRequest(`/api/v1/audit?action=profile.&actor=${encodeURIComponent(engineer.email)}`, reviewer.cookie, "GET"), {})).json();
    expect(json.events.length).toBe(1);
    expect(json.events[0]).toMatchObject({ action: "profile.created", actorEmail: engineer.email });
    const csv = await auditRoute(jsonRequest(`/api/v1/audit?format=csv&actor=${encodeURIComponent(engineer.email)}`, reviewer.cookie, "GET"), {});
    expect(csv.headers.get("content-type")).toMatch(/text\/csv/);
    expect((await csv.text()).split("\r\n")[0]).toBe("id,time,actor,actor_email,action,subject_type,subject_id,detail");
    expect((await auditRoute(jsonRequest("/api/v1/audit", engineer.cookie, "GET"), {})).status).toBe(403);
    expect((await auditRoute(jsonRequest("/api/v1/audit?limit=0", reviewer.cookie, "GET"), {})).status).toBe(400);
    expect(revisionId).toBeGreaterThan(0);
  });
});
