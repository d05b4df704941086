import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkSafety, type SafetyFinding } from "@/lib/profiles/safety";
import type { DoorParamsV1, DoorParamsV2 } from "@/lib/profiles/schemas";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = <T>(name: string): T => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as T;
const NOW = new Date("2026-03-01T12:00:00Z");
// No site: these rules need none, and the sun rules stay out of the way.
const CTX = { now: NOW };

const withSchedule = (schedule: DoorParamsV2["schedule"]): DoorParamsV2 => ({ ...fixture<DoorParamsV2>("safety-v2-clean.json"), schedule });
const grid = (doc: unknown, version: 1 | 2 = 2): SafetyFinding[] => checkSafety(version, doc, CTX).filter((f) => f.ruleId === "RL-SCHEDULE-GRID");
const order = (doc: unknown): SafetyFinding[] => checkSafety(2, doc, CTX).filter((f) => f.ruleId === "RL-SCHEDULE-ORDER");

// 1440 = 2⁵ · 3² · 5, so its divisors up to 60 are exactly these (arithmetic).
const DIVISORS = [1, 2, 3, 4, 5, 6, 8, 9, 10, 12, 15, 16, 18, 20, 24, 30, 32, 36, 40, 45, 48, 60];

describe("RL-SCHEDULE-GRID", () => {
  it.each(Array.from({ length: 60 }, (_, i) => i + 1))("step %i min is refused exactly when it does not divide a day", (step) => {
    const found = grid(withSchedule({ kind: "fixed", openAt: "00:00", closeAt: "12:00", stepMinutes: step }));
    const divides = DIVISORS.includes(step);
    expect(found.some((f) => f.paths[0] === "/schedule/stepMinutes")).toBe(!divides);
    if (!divides) expect(found[0]?.severity).toBe("error");
  });

  it("refuses a fixed time off the grid and names the neighbouring grid times", () => {
    const found = grid(withSchedule({ kind: "fixed", openAt: "07:00", closeAt: "21:00", stepMinutes: 45 }));
    // The grid runs from midnight: 07:00 is 420 min, 420 / 45 = 9.33; 21:00 is 1260 = 28 × 45.
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ severity: "error", paths: ["/schedule/openAt", "/schedule/stepMinutes"] });
    expect(found[0]?.message).toBe("Open time 07:00 is not on the 45-minute grid: the nearest grid values are 06:45 and 07:30.");
  });

  it("accepts fixed times whose minutes after midnight are whole steps, even past the hour", () => {
    expect(grid(withSchedule({ kind: "fixed", openAt: "06:45", closeAt: "21:45", stepMinutes: 45 }))).toEqual([]);
    expect(grid(withSchedule({ kind: "fixed", openAt: "06:40", closeAt: "21:20", stepMinutes: 40 }))).toEqual([]);
  });

  it("refuses sun offsets that are not whole steps, negative ones included", () => {
    const found = grid(withSchedule({ kind: "sun", sunriseOffsetMinutes: -20, civilDuskOffsetMinutes: 20, stepMinutes: 15 }));
    expect(found.map((f) => f.paths[0])).toEqual(["/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"]);
    expect(found[0]?.message).toContain("the nearest grid values are -30 min and -15 min");
    expect(found[1]?.message).toContain("the nearest grid values are 15 min and 30 min");
    expect(grid(withSchedule({ kind: "sun", sunriseOffsetMinutes: -30, civilDuskOffsetMinutes: 0, stepMinutes: 15 }))).toEqual([]);
  });

  it("flags the shipped base profile, whose offsets of 15 and 20 min do not fit its 30-minute step", () => {
    expect(grid(fixture("v2-base-henhouse-350.json")).map((f) => f.paths[0])).toEqual(["/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"]);
  });

  it("reports version 1 paths for a version 1 document", () => {
    const v1 = fixture<DoorParamsV1>("safety-v1-clean.json");
    const found = grid({ ...v1, scheduleStepMin: 7 }, 1);
    expect(found).toMatchObject([{ paths: ["/scheduleStepMin"] }]);
    const offsets = grid({ ...v1, schedule: { kind: "sun", openOffsetMin: 10, closeOffsetMin: 30 } }, 1);
    expect(offsets).toMatchObject([{ paths: ["/schedule/openOffsetMin", "/scheduleStepMin"] }]);
  });
});

describe("RL-SCHEDULE-ORDER for fixed times", () => {
  it("refuses a close time before the open time, which would leave the door open overnight", () => {
    const [f] = order(withSchedule({ kind: "fixed", openAt: "20:00", closeAt: "06:00", stepMinutes: 30 }));
    expect(f).toMatchObject({ severity: "error", paths: ["/schedule/openAt", "/schedule/closeAt"] });
    expect(f?.message).toContain("open from 20:00 through the night until 06:00");
  });

  it("refuses equal open and close times", () => {
    expect(order(withSchedule({ kind: "fixed", openAt: "08:00", closeAt: "08:00", stepMinutes: 30 }))).toHaveLength(1);
  });

  it("accepts opening before closing", () => {
    expect(order(withSchedule({ kind: "fixed", openAt: "08:00", closeAt: "22:00", stepMinutes: 30 }))).toEqual([]);
  });
});
