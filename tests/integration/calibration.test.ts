import { readFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as listRuns, POST as uploadRoute } from "@/app/api/v1/controllers/[serial]/calibrations/route";
import { POST as draftRoute } from "@/app/api/v1/calibrations/[runId]/draft/route";
import { db } from "@/db/client";
import { calibrationRuns, profileRevisions, profiles } from "@/db/schema";
import { signedInUser } from "@/tests/support/auth";
import { approvedBase, registerController } from "@/tests/support/fleet";
import { jsonRequest, params } from "@/tests/support/profiles";

const fixture = (name: string) => readFileSync(`tests/fixtures/calibration/${name}`, "utf8");

describe("calibration runs", () => {
  it("analyses an uploaded run, suggests parameters and turns them into a draft controller overlay", async () => {
    const tech = await signedInUser("technician");
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const res = await uploadRoute(jsonRequest(`/api/v1/controllers/${c.serial}/calibrations`, tech.cookie, "POST", { fileName: "example-run.csv", csv: fixture("example-run.csv") }), params("serial", c.serial));
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.calibration.fullTravelCounts).toBeGreaterThan(16000);
    expect(body.suggested.stall.thresholdCps).toBeGreaterThan(0);
    const runs = await (await listRuns(jsonRequest(`/api/v1/controllers/${c.serial}/calibrations`, tech.cookie, "GET"), params("serial", c.serial))).json();
    expect(runs.runs).toHaveLength(1);

    const draft = await draftRoute(jsonRequest(`/api/v1/calibrations/${body.runId}/draft`, tech.cookie, "POST"), params("runId", body.runId));
    expect(draft.status).toBe(201);
    const { profileId, revisionId } = await draft.json();
    const [p] = await db.select().from(profiles).where(eq(profiles.id, profileId));
    expect(p).toMatchObject({ layer: "controller", controllerSerial: c.serial });
    const [rev] = await db.select().from(profileRevisions).where(eq(profileRevisions.id, revisionId));
    expect(rev).toMatchObject({ state: "draft" });
    expect((rev!.content as { closeTravelCounts: number }).closeTravelCounts).toBe(body.suggested.closeTravelCounts);
  });

  it("refuses a run with time going backwards, naming the row, and stores nothing", async () => {
    const tech = await signedInUser("technician");
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const res = await uploadRoute(jsonRequest(`/api/v1/controllers/${c.serial}/calibrations`, tech.cookie, "POST", { fileName: "bad.csv", csv: fixture("bad-non-monotonic-time.csv") }), params("serial", c.serial));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues[0].path).toMatch(/^\/rows\/\d+/);
    expect(await db.select().from(calibrationRuns).where(eq(calibrationRuns.controllerId, c.controllerId))).toHaveLength(0);
  });

  it("refuses viewers, unknown serials and oversized files", async () => {
    const viewer = await signedInUser("viewer");
    const tech = await signedInUser("technician");
    expect((await uploadRoute(jsonRequest("/api/v1/controllers/X-1/calibrations", viewer.cookie, "POST", { fileName: "a.csv", csv: "time_ms,counts\n0,0" }), params("serial", "X-1"))).status).toBe(403);
    expect((await uploadRoute(jsonRequest("/api/v1/controllers/NOPE-1/calibrations", tech.cookie, "POST", { fileName: "a.csv", csv: "time_ms,counts\n0,0" }), params("serial", "NOPE-1"))).status).toBe(404);
    const huge = JSON.stringify({ fileName: "big.csv", csv: "time_ms,counts\n" + "1,1\n".repeat(1_500_000) });
    expect((await uploadRoute(jsonRequest("/api/v1/controllers/NOPE-1/calibrations", tech.cookie, "POST", huge), params("serial", "NOPE-1"))).status).toBe(400);
  });
});

describe("controller overlays", () => {
  it("are checked at their controller's site, so no site warning needs acknowledging", async () => {
    const { GET: revisionRoute } = await import("@/app/api/v1/revisions/[revisionId]/route");
    const tech = await signedInUser("technician");
    const engineer = await signedInUser("engineer");
    const { doorModelId } = await approvedBase();
    const c = await registerController(doorModelId);
    const up = await (await uploadRoute(jsonRequest(`/api/v1/controllers/${c.serial}/calibrations`, tech.cookie, "POST", { fileName: "run.csv", csv: fixture("example-run.csv") }), params("serial", c.serial))).json();
    const { revisionId } = await (await draftRoute(jsonRequest(`/api/v1/calibrations/${up.runId}/draft`, tech.cookie, "POST"), params("runId", up.runId))).json();
    const body = await (await revisionRoute(jsonRequest(`/api/v1/revisions/${revisionId}`, engineer.cookie, "GET"), params("revisionId", revisionId))).json();
    expect(body.checks.findings.map((f: { ruleId: string }) => f.ruleId)).not.toContain("RL-NO-SITE");
  });
});
