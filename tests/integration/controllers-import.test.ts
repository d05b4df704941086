import { eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as importRoute } from "@/app/api/v1/controllers/import/route";
import { db } from "@/db/client";
import { controllers } from "@/db/schema";
import { signedInUser } from "@/tests/support/auth";
import { serialFor } from "@/tests/support/fleet";
import { jsonRequest } from "@/tests/support/profiles";

function csv(rows: string[][]) {
  return ["serial,door_model_code,site_slug,firmware_version,parameter_set_version", ...rows.map((r) => r.join(","))].join("\n");
}

describe("controller CSV import", () => {
  it("imports every row of a good file and returns each token once", async () => {
    const tech = await signedInUser("technician");
    const serials = [serialFor("I"), serialFor("I")];
    const res = await importRoute(jsonRequest("/api/v1/controllers/import", tech.cookie, "POST", { csv: csv(serials.map((s) => [s, "HM-350", "lindenhof", "1.4.2", "2"])) }), {});
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.imported.map((i: { serial: string }) => i.serial)).toEqual(serials);
    expect(body.imported[0].token).toMatch(/^rlc_/);
    expect(await db.select().from(controllers).where(inArray(controllers.serial, serials))).toHaveLength(2);
  });

  it("imports nothing when any row is wrong, naming each row and column", async () => {
    const tech = await signedInUser("technician");
    const good = serialFor("G");
    const res = await importRoute(
      jsonRequest("/api/v1/controllers/import", tech.cookie, "POST", { csv: csv([[good, "HM-350", "lindenhof", "1.4.2", "2"], ["bad serial!", "HM-999", "nowhere", "one", "7"]]) }),
      {},
    );
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.message).toMatch(/Nothing imported/);
    const paths = body.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["/rows/3/serial", "/rows/3/door_model_code", "/rows/3/site_slug", "/rows/3/firmware_version", "/rows/3/parameter_set_version"]));
    expect(await db.select().from(controllers).where(eq(controllers.serial, good))).toHaveLength(0);
  });

  it("imports only the good rows when asked, reporting the others", async () => {
    const tech = await signedInUser("technician");
    const good = serialFor("O");
    const res = await importRoute(jsonRequest("/api/v1/controllers/import", tech.cookie, "POST", { csv: csv([[good, "HM-350", "lindenhof", "1.4.2", "2"], [good, "HM-350", "lindenhof", "1.4.2", "2"]]), onlyGoodRows: true }), {});
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.imported).toHaveLength(1);
    expect(body.skipped[0].path).toMatch(/^\/rows\/3/);
  });

  it("refuses viewers and malformed bodies", async () => {
    const viewer = await signedInUser("viewer");
    const tech = await signedInUser("technician");
    expect((await importRoute(jsonRequest("/api/v1/controllers/import", viewer.cookie, "POST", { csv: "x" }), {})).status).toBe(403);
    expect((await importRoute(jsonRequest("/api/v1/controllers/import", tech.cookie, "POST", "{"), {})).status).toBe(400);
    const headerOnly = await importRoute(jsonRequest("/api/v1/controllers/import", tech.cookie, "POST", { csv: "serial,site" }), {});
    expect(headerOnly.status).toBe(400);
  });
});

describe("sites", () => {
  it("lets a technician add and change a site, naming wrong fields, and refuses viewers", async () => {
    const { POST: createSiteRoute } = await import("@/app/api/v1/sites/route");
    const { PATCH: patchSite } = await import("@/app/api/v1/sites/[siteId]/route");
    const { params } = await import("@/tests/support/profiles");
    const tech = await signedInUser("technician");
    const viewer = await signedInUser("viewer");
    const slug = `test-${Date.now()}`;
    const site = { slug, name: "Fell End", latitude: 54.4, longitude: -2.9, timeZone: "Europe/London" };
    const res = await createSiteRoute(jsonRequest("/api/v1/sites", tech.cookie, "POST", site), {});
    expect(res.status).toBe(201);
    const { siteId } = await res.json();
    expect((await createSiteRoute(jsonRequest("/api/v1/sites", tech.cookie, "POST", site), {})).status).toBe(409);
    const bad = await createSiteRoute(jsonRequest("/api/v1/sites", tech.cookie, "POST", { ...site, slug: `${slug}-b`, latitude: 95, timeZone: "Mars/Base" }), {});
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues.map((i: { path: string }) => i.path).sort()).toEqual(["/latitude", "/timeZone"]);
    expect((await createSiteRoute(jsonRequest("/api/v1/sites", viewer.cookie, "POST", site), {})).status).toBe(403);
    const changed = await patchSite(jsonRequest(`/api/v1/sites/${siteId}`, tech.cookie, "PATCH", { ...site, slug: undefined, name: "Fell End Farm" }), params("siteId", siteId));
    expect(changed.status).toBe(200);
  });
});
