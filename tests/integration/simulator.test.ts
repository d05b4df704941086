import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Ajv2020 from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as configRoute } from "@/app/api/v1/controllers/[serial]/config/route";
import { POST as checkInRoute } from "@/app/api/v1/controllers/[serial]/check-ins/route";
import { GET as publicKeyRoute } from "@/app/api/v1/device/public-key/route";
import { db } from "@/db/client";
import { checkIns, controllers } from "@/db/schema";
import { checkInExample, openApiDocument } from "@/lib/api/openapi";
import { CliError } from "@/lib/cli/types";
import { runSimulation, type FetchLike } from "@/scripts/simulate";
import { signedInUser } from "@/tests/support/auth";
import { approvedBase, deviceRequest, registerController, release } from "@/tests/support/fleet";

const BASE = "http://127.0.0.1:3100";

/** A fetch that hands each request to the route handler its path names, as the server would. */
const routeFetch: FetchLike = async (url, init) => {
  const request = new Request(url, init);
  const path = new URL(url).pathname;
  if (path === "/api/v1/device/public-key") return publicKeyRoute(request, {});
  const m = /^\/api\/v1\/controllers\/([^/]+)\/(config|check-ins)$/.exec(path);
  if (!m) return Response.json({ error: "not_found", message: `no route for ${path}` }, { status: 404 });
  const ctx = { params: Promise.resolve({ serial: decodeURIComponent(m[1]!) }) };
  if (m[2] === "config" && request.method === "GET") return configRoute(request, ctx);
  if (m[2] === "check-ins" && request.method === "POST") return checkInRoute(request, ctx);
  return new Response(null, { status: 405 });
};

function tempFiles(fleet: { serial: string; token: string }[]) {
  const dir = mkdtempSync(join(tmpdir(), "roostline-sim-"));
  const tokens = join(dir, "controllers.json");
  writeFileSync(tokens, JSON.stringify(fleet.map(({ serial, token }) => ({ serial, token }))));
  return { tokens, state: join(dir, "state.json") };
}

const rowsOf = (ids: number[]) => db.select().from(checkIns).where(inArray(checkIns.controllerId, ids));

function documentedSchema(name: string) {
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  addFormats(ajv);
  ajv.addSchema({ ...openApiDocument, $id: "urn:roostline:openapi" });
  const validate = ajv.getSchema(`urn:roostline:openapi#/components/schemas/${name}`)!;
  return (value: unknown) => ({ ok: validate(value) as boolean, errors: validate.errors });
}

describe("the controller simulator", () => {
  it("downloads and verifies on the first round and gets 304 on the second, storing every check-in", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const fleet = [await registerController(doorModelId), await registerController(doorModelId), await registerController(doorModelId)];
    expect((await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 })).status).toBe(201);
    const files = tempFiles(fleet);
    const lines: string[] = [];
    const options = { controllers: 3, intervalS: 0.3, baseUrl: BASE, tokens: files.tokens, state: files.state, once: true, durationS: 30 };

    const first = await runSimulation(options, routeFetch, (l) => lines.push(l));
    expect(first).toMatchObject({ controllers: 3, ok: 3, verified: 3, refused: 0, notModified: 0, notFound: 0, checkIns: 3, errors: 0, exitCode: 0 });
    expect(first.requests).toBe(7);
    expect(first.p50Ms).not.toBeNull();
    expect(lines.at(-1)).toMatch(/done: .*requests 7 .*200 3 .*verified 3 .*p50 .*ms .*p99 .*ms/);

    const ids = fleet.map((c) => c.controllerId);
    const stored = await rowsOf(ids);
    expect(stored).toHaveLength(3);
    const running = await db.select({ id: controllers.id, runningHash: controllers.runningHash }).from(controllers).where(inArray(controllers.id, ids));
    const served = await (await configRoute(deviceRequest(`/api/v1/controllers/${fleet[0]!.serial}/config`, fleet[0]!.token), { params: Promise.resolve({ serial: fleet[0]!.serial }) })).json();
    for (const r of running) expect(r.runningHash).toBe(served.contentHash);
    for (const row of stored) {
      expect(row).toMatchObject({ appliedHash: served.contentHash, refusedReason: null, firmwareVersion: "1.4.2", stallEvents: expect.any(Number) });
      // The fixture's 17,112 close counts, two cycles of 0.02 % stretch later, at about 4,000 counts/s.
      expect(row.lastCloseCounts).toBe(Math.round(17112 * 1.0002 ** 2));
      expect(row.lastTravelMs! / 1000).toBeCloseTo(row.lastCloseCounts! / 4000, 0);
    }

    const second = await runSimulation(options, routeFetch, () => {});
    expect(second).toMatchObject({ ok: 0, notModified: 3, verified: 0, checkIns: 3, errors: 0, exitCode: 0 });
    const after = await rowsOf(ids);
    expect(after).toHaveLength(6);
    for (const row of after) expect(row.appliedHash).toBe(served.contentHash);
    const one = after.filter((r) => r.controllerId === ids[0]).sort((a, b) => a.id - b.id);
    expect(one[1]!.doorCycles - one[0]!.doorCycles).toBe(2);
    expect(one[1]!.lastCloseCounts).toBeGreaterThan(one[0]!.lastCloseCounts!);
  });

  it("checks in with no applied hash and 'nothing released' when nothing is released", async () => {
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const summary = await runSimulation({ controllers: 1, intervalS: 0.1, baseUrl: BASE, tokens: tempFiles([c]).tokens, once: true }, routeFetch, () => {});
    expect(summary).toMatchObject({ notFound: 1, checkIns: 1, errors: 0, exitCode: 0 });
    const [row] = await rowsOf([c.controllerId]);
    expect(row).toMatchObject({ appliedHash: null, refusedReason: "nothing released" });
  });

  it("refuses a tampered configuration, says why in its check-in and exits 1", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const c = await registerController(doorModelId);
    await release(admin, { baseRevisionId: revisionId, target: { kind: "controllers", serials: [c.serial] }, percent: 100 });
    const tampering: FetchLike = async (url, init) => {
      const res = await routeFetch(url, init);
      if (!url.endsWith("/config") || res.status !== 200) return res;
      const body = await res.json();
      body.parameters.closeTravelCounts += 500;
      return Response.json(body, { headers: { etag: res.headers.get("etag")! } });
    };
    const summary = await runSimulation({ controllers: 1, intervalS: 0.1, baseUrl: BASE, tokens: tempFiles([c]).tokens, once: true }, tampering, () => {});
    expect(summary).toMatchObject({ ok: 1, verified: 0, refused: 1, checkIns: 1, exitCode: 1 });
    const [row] = await rowsOf([c.controllerId]);
    expect(row).toMatchObject({ appliedHash: null, refusedReason: "the signature does not verify with the published key" });
  });

  it("counts other answers as errors and exits 1", async () => {
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const summary = await runSimulation({ controllers: 1, intervalS: 0.1, baseUrl: BASE, tokens: tempFiles([{ ...c, token: "rlc_" + "x".repeat(43) }]).tokens, once: true }, routeFetch, () => {});
    expect(summary).toMatchObject({ errors: 1, checkIns: 0, exitCode: 1 });
    expect(summary.errorSamples[0]).toMatch(/answered 401/);
  });

  it("refuses a base URL that is not a loopback address, and a missing tokens file, naming the option", async () => {
    await expect(runSimulation({ baseUrl: "http://example.com:3000", once: true }, routeFetch, () => {})).rejects.toThrow(/^--base-url: must be a loopback address/);
    await expect(runSimulation({ baseUrl: BASE, tokens: join(tmpdir(), "no-such-roostline-file.json") }, routeFetch, () => {})).rejects.toThrow(CliError);
    await expect(runSimulation({ baseUrl: BASE, controllers: 0 }, routeFetch, () => {})).rejects.toThrow("--controllers: must be at least 1");
  });
});

describe("the OpenAPI document against the running handlers", () => {
  it("accepts the documented check-in example with 201", async () => {
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const res = await checkInRoute(deviceRequest(`/api/v1/controllers/${c.serial}/check-ins`, c.token, { method: "POST", body: checkInExample }), { params: Promise.resolve({ serial: c.serial }) });
    expect(res.status).toBe(201);
  });

  it("describes the served configuration and public key as they are", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const c = await registerController(doorModelId);
    await release(admin, { baseRevisionId: revisionId, target: { kind: "controllers", serials: [c.serial] }, percent: 100 });
    const res = await configRoute(deviceRequest(`/api/v1/controllers/${c.serial}/config`, c.token), { params: Promise.resolve({ serial: c.serial }) });
    expect(documentedSchema("SignedConfiguration")(await res.json())).toEqual({ ok: true, errors: null });
    const key = await (await publicKeyRoute(new Request(`${BASE}/api/v1/device/public-key`), {})).json();
    expect(documentedSchema("PublicKey")(key)).toEqual({ ok: true, errors: null });
    const bad = await configRoute(deviceRequest(`/api/v1/controllers/${c.serial}/config`, null), { params: Promise.resolve({ serial: c.serial }) });
    expect(documentedSchema("Error")(await bad.json())).toEqual({ ok: true, errors: null });
  });
});
