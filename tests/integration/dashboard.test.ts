import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as createProfileRoute } from "@/app/api/v1/profiles/route";
import { loadFleet } from "@/components/dashboard/fleet-data";
import { db } from "@/db/client";
import { checkIns, controllers, profileRevisions } from "@/db/schema";
import { listApprovedLayers, listChangeRequests, listLiveReleaseSummaries, listTimeFixLost, listWeeklyStalls } from "@/db/queries/dashboard";
import { decideRevision, submitRevision } from "@/db/queries/reviews";
import { checkInIntervalOf, classifyNotSeen, listDrift, TIME_FIX_LIMIT_S } from "@/lib/dashboard/fleet-health";
import { stallWindowStart } from "@/lib/dashboard/stall-increase";
import { signedInUser } from "@/tests/support/auth";
import { approvedBase, registerController, release } from "@/tests/support/fleet";
import { baseDocument, createDoorModel, jsonRequest } from "@/tests/support/profiles";

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
// The test database holds other tests' controllers too: ask for every row and look for ours.
const ALL = 100_000;

async function reading(controllerId: number, at: Date, counters: { stallEvents?: number; timeFixAgeS?: number | null } = {}) {
  await db.insert(checkIns).values({
    controllerId,
    receivedAt: at,
    appliedHash: null,
    refusedReason: "test reading",
    firmwareVersion: "1.4.2",
    uptimeS: 3600,
    doorCycles: 10,
    stallEvents: counters.stallEvents ?? 0,
    timeFixAgeS: counters.timeFixAgeS === undefined ? 60 : counters.timeFixAgeS,
  });
}

describe("dashboard queries", () => {
  it("finds a lost time fix from each controller's newest check-in only, and counts those with no fix apart", async () => {
    const { doorModelId } = await approvedBase();
    const lost = await registerController(doorModelId);
    const recovered = await registerController(doorModelId);
    const none = await registerController(doorModelId);
    const now = Date.now();
    await reading(lost.controllerId, new Date(now - 2 * HOUR), { timeFixAgeS: 600 });
    await reading(lost.controllerId, new Date(now - HOUR), { timeFixAgeS: TIME_FIX_LIMIT_S + 7200 });
    await reading(recovered.controllerId, new Date(now - 2 * HOUR), { timeFixAgeS: 3 * TIME_FIX_LIMIT_S });
    await reading(recovered.controllerId, new Date(now - HOUR), { timeFixAgeS: 120 });
    await reading(none.controllerId, new Date(now - HOUR), { timeFixAgeS: null });

    const result = await listTimeFixLost({ thresholdS: TIME_FIX_LIMIT_S, limit: ALL });
    const serials = result.rows.map((r) => r.serial);
    expect(result.rows.find((r) => r.serial === lost.serial)).toMatchObject({ timeFixAgeS: TIME_FIX_LIMIT_S + 7200, siteName: "Lindenhof Co-op" });
    expect(serials).not.toContain(recovered.serial);
    expect(serials).not.toContain(none.serial);
    expect(result.total).toBe(result.rows.length);
    expect(result.noFix).toBeGreaterThanOrEqual(1);
    // Oldest fix first.
    const ages = result.rows.map((r) => r.timeFixAgeS);
    expect([...ages].sort((a, b) => b - a)).toEqual(ages);

    const capped = await listTimeFixLost({ thresholdS: TIME_FIX_LIMIT_S, limit: 1 });
    expect(capped.rows).toHaveLength(1);
    expect(capped.total).toBe(result.total);
  });

  it("adds up the week's stall increase per controller over its check-ins in the week, across a counter restart", async () => {
    const { doorModelId } = await approvedBase();
    const rebooted = await registerController(doorModelId);
    const newcomer = await registerController(doorModelId);
    const steady = await registerController(doorModelId);
    const now = new Date();
    const since = stallWindowStart(now);
    const at = (daysAgo: number) => new Date(now.getTime() - daysAgo * DAY);
    // Stored out of time order on purpose: the increase follows the time of each reading.
    await reading(rebooted.controllerId, at(1), { stallEvents: 5 });
    await reading(rebooted.controllerId, at(8), { stallEvents: 2 });
    await reading(rebooted.controllerId, at(6), { stallEvents: 10 });
    await reading(rebooted.controllerId, at(5), { stallEvents: 12 });
    await reading(rebooted.controllerId, at(3), { stallEvents: 1 });
    await reading(newcomer.controllerId, at(2), { stallEvents: 4 });
    await reading(newcomer.controllerId, at(1), { stallEvents: 6 });
    await reading(steady.controllerId, at(9), { stallEvents: 0 });
    await reading(steady.controllerId, at(8), { stallEvents: 5 });
    await reading(steady.controllerId, at(2), { stallEvents: 5 });
    await reading(steady.controllerId, at(1), { stallEvents: 5 });

    const result = await listWeeklyStalls({ since, limit: ALL });
    const bySerial = new Map(result.rows.map((r) => [r.serial, r.increase]));
    // In the week: 10 → 12 (+2), restart → 1 (+1), → 5 (+4); the 2 → 10 before the week is left out.
    expect(bySerial.get(rebooted.serial)).toBe(7);
    expect(bySerial.get(newcomer.serial)).toBe(2);
    expect(bySerial.has(steady.serial)).toBe(false);
    expect(result.total).toBe(result.rows.length);
    expect(result.events).toBe(result.rows.reduce((s, r) => s + r.increase, 0));
    const counts = result.rows.map((r) => r.increase);
    expect([...counts].sort((a, b) => b - a)).toEqual(counts);

    const capped = await listWeeklyStalls({ since, limit: 1 });
    expect(capped.rows).toHaveLength(1);
    expect(capped.total).toBe(result.total);
  });

  it("lists live releases with their names, and the newest approved base of each door model", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase();
    const res = await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 50 });
    expect(res.status).toBe(201);
    const { releaseId } = (await res.json()) as { releaseId: number };
    const live = await listLiveReleaseSummaries();
    const mine = live.find((r) => r.release.id === releaseId);
    expect(mine).toMatchObject({ revisionNumber: 1, siteName: null, release: { percent: 50, state: "active", doorModelId } });
    expect(mine?.doorModelName).toMatch(/^Test door /);
    const layers = (await listApprovedLayers()).filter((l) => l.doorModelId === doorModelId);
    expect(layers).toEqual([expect.objectContaining({ layer: "base", siteId: null, revisionId })]);
    expect(layers[0]?.content.closeTravelCounts).toBe(baseDocument().closeTravelCounts);
  });

  it("gives the newest request for changes on a revision with the reviewer's comment", async () => {
    const engineer = await signedInUser("engineer");
    const reviewer = await signedInUser("reviewer");
    const model = await createDoorModel();
    const res = await createProfileRoute(jsonRequest("/api/v1/profiles", engineer.cookie, "POST", { layer: "base", name: `Sent back ${model.code}`, doorModelId: model.id, schemaVersion: 2, content: baseDocument() }), {});
    const { revisionId } = (await res.json()) as { revisionId: number };
    await submitRevision({ actorId: engineer.id, revisionId, safetyRelevant: false, acknowledgements: [] });
    const [rev] = await db.select({ h: profileRevisions.contentHash }).from(profileRevisions).where(eq(profileRevisions.id, revisionId));
    await decideRevision({ reviewerId: reviewer.id, revisionId, decision: "request_changes", contentHash: rev!.h, comment: "Close half an hour later" });
    const requests = await listChangeRequests({ revisionIds: [revisionId] });
    expect(requests.get(revisionId)).toMatchObject({ reviewerName: "Test reviewer", comment: "Close half an hour later" });
    expect((await listChangeRequests({ revisionIds: [] })).size).toBe(0);
  });
});

describe("fleet health from the fleet status", () => {
  it("judges silence by each controller's released check-in interval and lists drift by its reason", async () => {
    const admin = await signedInUser("admin");
    const { doorModelId, revisionId } = await approvedBase(baseDocument({ checkInIntervalS: 600 }));
    const quiet = await registerController(doorModelId);
    const onTime = await registerController(doorModelId);
    const other = await registerController(doorModelId);
    const unreleased = await registerController((await createDoorModel()).id);
    expect((await release(admin, { baseRevisionId: revisionId, target: { kind: "door_model" }, percent: 100 })).status).toBe(201);
    const now = new Date();
    const seenAgo = (s: number) => new Date(now.getTime() - s * 1000);
    await db.update(controllers).set({ lastSeenAt: seenAgo(1500) }).where(eq(controllers.id, quiet.controllerId));
    await db.update(controllers).set({ lastSeenAt: seenAgo(1000) }).where(eq(controllers.id, onTime.controllerId));
    await db.update(controllers).set({ lastSeenAt: seenAgo(60), runningHash: "0".repeat(64) }).where(eq(controllers.id, other.controllerId));
    // Nothing released to this one: the schema's 900 s applies, and 1,500 s is under two of those.
    await db.update(controllers).set({ lastSeenAt: seenAgo(1500) }).where(eq(controllers.id, unreleased.controllerId));

    const { rows, released } = await loadFleet();
    const ours = rows.filter((r) => [quiet, onTime, other, unreleased].some((c) => c.serial === r.serial));
    const intervals = new Map(ours.map((r) => [r.serial, checkInIntervalOf(r.assignedHash ? released.get(r.assignedHash)?.values : null)]));
    expect(intervals.get(quiet.serial)).toBe(600);
    expect(intervals.get(unreleased.serial)).toBe(900);
    expect(released.get(ours.find((r) => r.serial === quiet.serial)!.assignedHash!)?.releaseId).toBeGreaterThan(0);

    const seen = classifyNotSeen(ours.map((r) => ({ serial: r.serial, siteName: r.siteName, lastSeenAt: r.lastSeenAt, intervalS: intervals.get(r.serial)! })), now);
    expect(seen.overdue.map((n) => n.serial)).toEqual([quiet.serial]);

    const drift = listDrift(ours);
    expect(drift.find((d) => d.serial === other.serial)?.reason).toBe("other");
    expect(drift.find((d) => d.serial === quiet.serial)?.reason).toBe("unreported");
    expect(drift.some((d) => d.serial === unreleased.serial)).toBe(false);
  });
});
