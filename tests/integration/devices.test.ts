import { verify, createPublicKey } from "node:crypto";
import { describe, expect, it } from "vitest";
import { GET as configRoute } from "@/app/api/v1/controllers/[serial]/config/route";
import { POST as checkInRoute } from "@/app/api/v1/controllers/[serial]/check-ins/route";
import { DELETE as revokeRoute, POST as rotateRoute } from "@/app/api/v1/controllers/[serial]/token/route";
import { GET as publicKeyRoute } from "@/app/api/v1/device/public-key/route";
import { PATCH as releasePatch } from "@/app/api/v1/releases/[releaseId]/route";
import { canonicalJson } from "@/lib/profiles/canonical";
import { inStage } from "@/lib/fleet/stage";
import { signedInUser } from "@/tests/support/auth";
import { approvedBase, deviceRequest, registerController, release, serialFor, siteId } from "@/tests/support/fleet";
import { jsonRequest, params } from "@/tests/support/profiles";

const config = (serial: string, token: string | null, headers: Record<string, string> = {}) => configRoute(deviceRequest(`/api/v1/controllers/${serial}/config`, token, { headers }), params("serial", serial));
const checkIn = (serial: string, token: string, body: unknown) => checkInRoute(deviceRequest(`/api/v1/controllers/${serial}/check-ins`, token, { method: "POST", body }), params("serial", serial));

const goodCheckIn = (hash: string | null) => ({
  appliedHash: hash,
  refusedReason: hash ? null : "nothing received yet",
  firmwareVersion: "1.4.2",
  uptimeS: 3600,
  counters: { doorCycles: 12, lastOpenCounts: 17100, lastCloseCounts: 17112, lastTravelMs: 4400, stallEvents: 0, timeFixAgeS: 120 },
});

describe("device configuration", () => {
  it("answers 404 with a JSON body until something is released, then serves the signed, approved configuration", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const c = await registerController(doorModelId);
    const before = await config(c.serial, c.token);
    expect(before.status).toBe(404);
    expect((await before.json()).message).toMatch(/Nothing has been released/);

    const rel = await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 });
    expect(rel.status).toBe(201);
    const res = await config(c.serial, c.token);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({ serial: c.serial, parameterSetVersion: 2, baseRevisionId: revisionId });
    expect(body.parameters.closeTravelCounts).toBe(17112);

    // Independent check: node:crypto verifies the detached signature with the published key.
    const key = await (await publicKeyRoute(new Request("http://127.0.0.1:3100/api/v1/device/public-key"), {})).json();
    const { signature, ...signed } = body;
    expect(verify(null, Buffer.from(canonicalJson(signed)), createPublicKey(key.pem), Buffer.from(signature.value, "base64"))).toBe(true);
    const tampered = { ...signed, parameters: { ...signed.parameters, closeTravelCounts: 99999 } };
    expect(verify(null, Buffer.from(canonicalJson(tampered)), createPublicKey(key.pem), Buffer.from(signature.value, "base64"))).toBe(false);

    const etag = res.headers.get("etag")!;
    expect(etag).toMatch(/^"[0-9a-f]{40}"$/);
    const cached = await config(c.serial, c.token, { "if-none-match": etag });
    expect(cached.status).toBe(304);
    expect(await cached.text()).toBe("");
  });

  it("refuses a missing or wrong token with 401, and another controller's serial with 403", async () => {
    const { doorModelId } = await approvedBase();
    const a = await registerController(doorModelId);
    const b = await registerController(doorModelId);
    expect((await config(a.serial, null)).status).toBe(401);
    expect((await config(a.serial, "rlc_" + "x".repeat(43))).status).toBe(401);
    expect((await config(b.serial, a.token)).status).toBe(403);
  });

  it("ends a revoked token's access on its next request, and a rotated token replaces the old one", async () => {
    const admin = await signedInUser("admin");
    const technician = await signedInUser("technician");
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    expect((await config(c.serial, c.token)).status).toBe(404);
    const rotated = await rotateRoute(jsonRequest(`/api/v1/controllers/${c.serial}/token`, admin.cookie, "POST"), params("serial", c.serial));
    const { token } = await rotated.json();
    expect((await config(c.serial, c.token)).status).toBe(401);
    expect((await config(c.serial, token)).status).toBe(404);
    expect((await revokeRoute(jsonRequest(`/api/v1/controllers/${c.serial}/token`, technician.cookie, "DELETE"), params("serial", c.serial))).status).toBe(403);
    expect((await revokeRoute(jsonRequest(`/api/v1/controllers/${c.serial}/token`, admin.cookie, "DELETE"), params("serial", c.serial))).status).toBe(200);
    expect((await config(c.serial, token)).status).toBe(401);
  });

  it("answers 429 with Retry-After when one controller polls too fast", async () => {
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    let last: Response | undefined;
    for (let i = 0; i < 121; i++) last = await config(c.serial, c.token);
    expect(last!.status).toBe(429);
    expect(Number(last!.headers.get("retry-after"))).toBeGreaterThan(0);
  });
});

describe("check-ins", () => {
  it("stores a check-in and names the path of a wrong field", async () => {
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    expect((await checkIn(c.serial, c.token, goodCheckIn("a".repeat(64)))).status).toBe(201);
    const negative = await checkIn(c.serial, c.token, { ...goodCheckIn(null), counters: { ...goodCheckIn(null).counters, doorCycles: -1 } });
    expect(negative.status).toBe(400);
    expect((await negative.json()).issues[0].path).toBe("/counters/doorCycles");
    expect((await checkIn(c.serial, c.token, "{nope")).status).toBe(400);
    const noReason = await checkIn(c.serial, c.token, { ...goodCheckIn(null), refusedReason: null });
    expect((await noReason.json()).issues[0].path).toBe("/refusedReason");
  });
});

describe("releases", () => {
  it("keeps each controller in the same stage as the release widens", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const fleet = [];
    for (let i = 0; i < 12; i++) fleet.push(await registerController(doorModelId, { serial: serialFor(`S${i}`) }));
    const res = await release(admin, { baseRevisionId: revisionId, target: { kind: "site", siteId: await siteId() }, percent: 30 });
    const { releaseId } = await res.json();
    const served30 = new Set<string>();
    for (const c of fleet) if ((await config(c.serial, c.token)).status === 200) served30.add(c.serial);
    expect([...served30].sort()).toEqual(fleet.filter((c) => inStage(c.serial, 30)).map((c) => c.serial).sort());
    await releasePatch(jsonRequest(`/api/v1/releases/${releaseId}`, admin.cookie, "PATCH", { percent: 70 }), params("releaseId", releaseId));
    const served70 = new Set<string>();
    for (const c of fleet) if ((await config(c.serial, c.token)).status === 200) served70.add(c.serial);
    for (const s of served30) expect(served70.has(s)).toBe(true);
    const narrower = await releasePatch(jsonRequest(`/api/v1/releases/${releaseId}`, admin.cookie, "PATCH", { percent: 10 }), params("releaseId", releaseId));
    // A release never narrows: the share it is at is the state, and asking for less conflicts with it.
    expect(narrower.status).toBe(409);
  });

  it("rolls back to the previous release", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const c = await registerController(doorModelId);
    const first = await (await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 })).json();
    const second = await (await release(admin, { baseRevisionId: revisionId, target: { kind: "controllers", serials: [c.serial] }, percent: 100, note: "again" })).json();
    expect((await (await config(c.serial, c.token)).json()).releaseId).toBe(second.releaseId);
    const rb = await releasePatch(jsonRequest(`/api/v1/releases/${second.releaseId}`, admin.cookie, "PATCH", { state: "rolled_back" }), params("releaseId", second.releaseId));
    expect(rb.status).toBe(200);
    expect((await (await config(c.serial, c.token)).json()).releaseId).toBe(first.releaseId);
  });

  it("refuses a release that would serve an invalid configuration, listing the controllers", async () => {
    const admin = await signedInUser("admin");
    const engineer = await signedInUser("engineer");
    const { doorModelId, revisionId } = await approvedBase();
    const old = await registerController(doorModelId, { parameterSetVersion: 1 });
    const res = await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues[0].path).toBe(`/controllers/${old.serial}`);
    expect(body.issues[0].message).toMatch(/parameter set 1/);
    expect((await release(engineer, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 })).status).toBe(403);
  });

  it("only releases approved revisions", async () => {
    const admin = await signedInUser("admin");
    const { revisionId } = await approvedBase();
    const res = await release(admin, { baseRevisionId: revisionId + 100000, target: { kind: "door_model" }, percent: 100 });
    expect(res.status).toBe(404);
  });
});

describe("adoption", () => {
  it("counts controllers running a release, now and per day", async () => {
    const { adoptionOf } = await import("@/lib/releases/adoption");
    const { getRelease } = await import("@/db/queries/releases");
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const a = await registerController(doorModelId);
    const b = await registerController(doorModelId);
    const { releaseId } = await (await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 })).json();
    const served = await (await config(a.serial, a.token)).json();
    expect((await checkIn(a.serial, a.token, goodCheckIn(served.contentHash))).status).toBe(201);
    expect((await checkIn(b.serial, b.token, goodCheckIn(null))).status).toBe(201);
    const adoption = await adoptionOf((await getRelease({ releaseId }))!);
    expect(adoption).toMatchObject({ target: 2, staged: 2, running: 1 });
    expect(adoption.history).toEqual([{ day: new Date().toISOString().slice(0, 10), controllers: 1 }]);
  });
});

describe("fleet status", () => {
  it("shows drift until a controller reports the assigned configuration, with its latest counters", async () => {
    const { GET: listRoute } = await import("@/app/api/v1/controllers/route");
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const c = await registerController(doorModelId);
    await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 });
    const row = async () => ((await (await listRoute(jsonRequest("/api/v1/controllers", admin.cookie, "GET"), {})).json()).controllers as { serial: string; drift: boolean; doorCycles: number | null }[]).find((x) => x.serial === c.serial)!;
    await checkIn(c.serial, c.token, goodCheckIn("b".repeat(64)));
    expect(await row()).toMatchObject({ drift: true, doorCycles: 12 });
    const served = await (await config(c.serial, c.token)).json();
    await checkIn(c.serial, c.token, { ...goodCheckIn(served.contentHash), counters: { ...goodCheckIn(null).counters, doorCycles: 14 } });
    expect(await row()).toMatchObject({ drift: false, doorCycles: 14 });
  });
});

describe("changing a controller", () => {
  it("lets a technician move a controller to another site, names wrong fields, and refuses viewers", async () => {
    const { PATCH: patchController } = await import("@/app/api/v1/controllers/[serial]/route");
    const tech = await signedInUser("technician");
    const viewer = await signedInUser("viewer");
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const other = await siteId("prairie-gate");
    const moved = await patchController(jsonRequest(`/api/v1/controllers/${c.serial}`, tech.cookie, "PATCH", { siteId: other, firmwareVersion: "1.5.0" }), params("serial", c.serial));
    expect(moved.status).toBe(200);
    expect((await moved.json()).controller).toMatchObject({ siteId: other, firmwareVersion: "1.5.0" });
    const bad = await patchController(jsonRequest(`/api/v1/controllers/${c.serial}`, tech.cookie, "PATCH", { firmwareVersion: "one" }), params("serial", c.serial));
    expect((await bad.json()).issues[0].path).toBe("/firmwareVersion");
    expect((await patchController(jsonRequest(`/api/v1/controllers/${c.serial}`, viewer.cookie, "PATCH", { siteId: other }), params("serial", c.serial))).status).toBe(403);
    expect((await patchController(jsonRequest("/api/v1/controllers/NOPE-9", tech.cookie, "PATCH", { siteId: other }), params("serial", "NOPE-9"))).status).toBe(404);
  });
});
