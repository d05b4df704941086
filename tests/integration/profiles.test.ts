import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as listProfilesRoute, POST as createProfileRoute } from "@/app/api/v1/profiles/route";
import { POST as saveRoute } from "@/app/api/v1/profiles/[profileId]/revisions/route";
import { GET as revisionRoute } from "@/app/api/v1/revisions/[revisionId]/route";
import { GET as compareRoute } from "@/app/api/v1/compare/route";
import { db } from "@/db/client";
import { auditEvents, profileRevisions } from "@/db/schema";
import { contentHash } from "@/lib/profiles/canonical";
import { signedInUser } from "@/tests/support/auth";
import { baseDocument, createDoorModel, jsonRequest, params } from "@/tests/support/profiles";

async function newBase(cookie: string, content = baseDocument()) {
  const model = await createDoorModel();
  const res = await createProfileRoute(jsonRequest("/api/v1/profiles", cookie, "POST", { layer: "base", name: `Base ${model.code}`, doorModelId: model.id, schemaVersion: 2, content }), {});
  expect(res.status).toBe(201);
  return { model, ...((await res.json()) as { profileId: number; revisionId: number }) };
}

const save = (cookie: string, profileId: number, body: unknown) => saveRoute(jsonRequest(`/api/v1/profiles/${profileId}/revisions`, cookie, "POST", body), params("profileId", profileId));

describe("profiles and revisions", () => {
  it("creates a base profile whose first revision carries the canonical content hash", async () => {
    const engineer = await signedInUser("engineer");
    const { revisionId } = await newBase(engineer.cookie);
    const [rev] = await db.select().from(profileRevisions).where(eq(profileRevisions.id, revisionId));
    expect(rev).toMatchObject({ number: 1, state: "draft", schemaVersion: 2, contentHash: contentHash(baseDocument()) });
  });

  it("keeps earlier revisions unchanged when a new one is saved", async () => {
    const engineer = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(engineer.cookie);
    const res = await save(engineer.cookie, profileId, { parentRevisionId: revisionId, message: "Faster stall check", content: baseDocument({ debounceMs: 40 }) });
    expect(res.status).toBe(201);
    const { revisionId: second } = await res.json();
    const rows = await db.select().from(profileRevisions).where(eq(profileRevisions.profileId, profileId));
    const first = rows.find((r) => r.id === revisionId)!;
    expect(first.content).toEqual(baseDocument());
    expect(first.contentHash).toBe(contentHash(baseDocument()));
    expect(first.state).toBe("superseded");
    expect(rows.find((r) => r.id === second)).toMatchObject({ number: 2, parentRevisionId: revisionId, state: "draft" });
    const audit = await db.select().from(auditEvents).where(eq(auditEvents.subjectId, String(second)));
    expect(audit[0]?.detail).toMatchObject({ beforeHash: first.contentHash, afterHash: contentHash(baseDocument({ debounceMs: 40 })) });
  });

  it("refuses a save on a stale parent with 409 and keeps the other person's revision", async () => {
    const a = await signedInUser("engineer");
    const b = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(a.cookie);
    const [first, second] = await Promise.all([
      save(a.cookie, profileId, { parentRevisionId: revisionId, message: "A's change", content: baseDocument({ debounceMs: 35 }) }),
      save(b.cookie, profileId, { parentRevisionId: revisionId, message: "B's change", content: baseDocument({ debounceMs: 45 }) }),
    ]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    const loser = first.status === 409 ? first : second;
    expect((await loser.json()).message).toMatch(/newer revision/);
    expect(await db.select().from(profileRevisions).where(eq(profileRevisions.profileId, profileId))).toHaveLength(2);
  });

  it("refuses content that fails the schema, naming the path, and saves nothing", async () => {
    const engineer = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(engineer.cookie);
    const cases: [unknown, string][] = [
      [baseDocument({ debounceMs: "thirty" }), "/debounceMs"],
      [baseDocument({ closeTravelCounts: 5_000_000 }), "/closeTravelCounts"],
      [baseDocument({ sparkles: true }), "/sparkles"],
    ];
    for (const [content, path] of cases) {
      const res = await save(engineer.cookie, profileId, { parentRevisionId: revisionId, message: "Bad", content });
      expect(res.status).toBe(400);
      const body = await res.json();
      expect(body.error).toBe("invalid_profile");
      expect(body.issues.map((i: { path: string }) => i.path)).toContain(path);
    }
    expect(await db.select().from(profileRevisions).where(eq(profileRevisions.profileId, profileId))).toHaveLength(1);
  });

  it("refuses a document of another parameter-set version", async () => {
    const engineer = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(engineer.cookie);
    const res = await save(engineer.cookie, profileId, { parentRevisionId: revisionId, message: "v1 by mistake", content: baseDocument({ parameterSetVersion: 1 }) });
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe("/parameterSetVersion");
  });

  it("answers 400 to malformed JSON, 401 without a session, 403 to a viewer and 404 for unknown ids", async () => {
    const engineer = await signedInUser("engineer");
    const viewer = await signedInUser("viewer");
    const { profileId } = await newBase(engineer.cookie);
    expect((await save(engineer.cookie, profileId, "{not json")).status).toBe(400);
    expect((await save(viewer.cookie, profileId, { parentRevisionId: 1, message: "x", content: {} })).status).toBe(403);
    expect((await listProfilesRoute(jsonRequest("/api/v1/profiles", null, "GET"), {})).status).toBe(401);
    expect((await save(engineer.cookie, 99_999_999, { parentRevisionId: 1, message: "nope", content: baseDocument() })).status).toBe(404);
    expect((await revisionRoute(jsonRequest("/api/v1/revisions/abc", engineer.cookie, "GET"), params("revisionId", "abc"))).status).toBe(404);
  });

  it("downloads a revision as a JSON file and compares two revisions parameter by parameter", async () => {
    const engineer = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(engineer.cookie);
    const { revisionId: second } = await (await save(engineer.cookie, profileId, { parentRevisionId: revisionId, message: "Longer close", content: baseDocument({ closeTravelCounts: 17200 }) })).json();
    const file = await revisionRoute(jsonRequest(`/api/v1/revisions/${revisionId}?download=1`, engineer.cookie, "GET"), params("revisionId", revisionId));
    expect(file.headers.get("content-disposition")).toMatch(/attachment/);
    expect(JSON.parse(await file.text())).toEqual(baseDocument());
    const cmp = await (await compareRoute(jsonRequest(`/api/v1/compare?from=${revisionId}&to=${second}`, engineer.cookie, "GET"), {})).json();
    expect(cmp.rows).toEqual([expect.objectContaining({ path: "/closeTravelCounts", before: 17112, after: 17200, unit: "counts", safety: true })]);
    expect(cmp.rows[0].rules).toContain("RL-CLOSE-TRAVEL");
    expect(cmp.patch).toContain('-  "closeTravelCounts": 17112');
    expect(cmp.safetyChanged).toBe(true);
  });
});

describe("migration and limits", () => {
  it("migrates a version 1 base profile to version 2 as a new draft that passes the new schema", async () => {
    const { POST: migrateRoute } = await import("@/app/api/v1/profiles/[profileId]/migrate/route");
    const v1 = (await import("@/tests/fixtures/profiles/v1-base-henhouse-350.json")).default;
    const engineer = await signedInUser("engineer");
    const model = await createDoorModel();
    const created = await createProfileRoute(jsonRequest("/api/v1/profiles", engineer.cookie, "POST", { layer: "base", name: `Old ${model.code}`, doorModelId: model.id, schemaVersion: 1, content: v1 }), {});
    expect(created.status).toBe(201);
    const { profileId, revisionId } = await created.json();
    const res = await migrateRoute(jsonRequest(`/api/v1/profiles/${profileId}/migrate`, engineer.cookie, "POST", { parentRevisionId: revisionId }), params("profileId", profileId));
    expect(res.status).toBe(201);
    const { revisionId: migrated } = await res.json();
    const [rev] = await db.select().from(profileRevisions).where(eq(profileRevisions.id, migrated));
    expect(rev).toMatchObject({ schemaVersion: 2, number: 2, state: "draft" });
    expect((rev!.content as { stall: { thresholdCps: number } }).stall.thresholdCps).toBe(v1.stallThresholdCps);
    const again = await migrateRoute(jsonRequest(`/api/v1/profiles/${profileId}/migrate`, engineer.cookie, "POST", { parentRevisionId: migrated }), params("profileId", profileId));
    expect(again.status).toBe(409);
  });

  it("refuses a 10 MB body with a clear 400 and saves nothing", async () => {
    const engineer = await signedInUser("engineer");
    const { profileId, revisionId } = await newBase(engineer.cookie);
    const huge = JSON.stringify({ parentRevisionId: revisionId, message: "Huge", content: { ...baseDocument(), padding: "x".repeat(10 * 1024 * 1024) } });
    const res = await save(engineer.cookie, profileId, huge);
    expect(res.status).toBe(400);
    expect((await res.json()).message).toMatch(/larger than 256 KiB/);
    expect(await db.select().from(profileRevisions).where(eq(profileRevisions.profileId, profileId))).toHaveLength(1);
  });
});
