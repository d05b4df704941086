import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkInIntervalOf, classifyNotSeen, DEFAULT_CHECK_IN_INTERVAL_S, firstOf, isOverdue, listDrift, MISSED_INTERVALS, TIME_FIX_LIMIT_S } from "@/lib/dashboard/fleet-health";

const NOW = new Date("2026-12-02T12:00:00Z");
const before = (seconds: number) => new Date(NOW.getTime() - seconds * 1000);

describe("check-in interval", () => {
  it("takes the default from both parameter-set schemas, which agree on 900 s", () => {
    for (const v of [1, 2]) {
      const schema = JSON.parse(readFileSync(new URL(`../../schemas/door-params-v${v}.schema.json`, import.meta.url), "utf8"));
      expect(schema.properties.checkInIntervalS.default).toBe(DEFAULT_CHECK_IN_INTERVAL_S);
    }
    expect(DEFAULT_CHECK_IN_INTERVAL_S).toBe(900);
  });

  it("reads an effective configuration's own interval and falls back to the default without one", () => {
    expect(checkInIntervalOf({ checkInIntervalS: 3600 })).toBe(3600);
    expect(checkInIntervalOf({})).toBe(900);
    expect(checkInIntervalOf(null)).toBe(900);
    expect(checkInIntervalOf({ checkInIntervalS: "600" })).toBe(900);
    expect(checkInIntervalOf({ checkInIntervalS: 0 })).toBe(900);
  });

  it("flags a day without a time fix, half the controller's own default alarm time", () => {
    const schema = JSON.parse(readFileSync(new URL("../../schemas/door-params-v2.schema.json", import.meta.url), "utf8"));
    expect(schema.properties.clock.properties.alarmAfterHoursWithoutFix.default).toBe(48);
    expect(TIME_FIX_LIMIT_S).toBe(24 * 3600);
  });
});

describe("not seen", () => {
  it("counts a controller as not seen only once more than two intervals have passed", () => {
    expect(MISSED_INTERVALS).toBe(2);
    expect(isOverdue(before(1800), 900, NOW)).toBe(false);
    expect(isOverdue(before(1801), 900, NOW)).toBe(true);
    expect(isOverdue(before(7000), 3600, NOW)).toBe(false);
    expect(isOverdue(before(7201), 3600, NOW)).toBe(true);
  });

  it("judges each controller by its own interval, lists the longest silence first and counts the never-seen apart", () => {
    const result = classifyNotSeen(
      [
        { serial: "A", siteName: "Lindenhof", lastSeenAt: before(2000), intervalS: 900 },
        { serial: "B", siteName: "Lindenhof", lastSeenAt: before(2000), intervalS: 3600 },
        { serial: "C", siteName: "Corrie Brae", lastSeenAt: before(90_000), intervalS: 900 },
        { serial: "D", siteName: "Corrie Brae", lastSeenAt: null, intervalS: 900 },
        { serial: "E", siteName: "Corrie Brae", lastSeenAt: before(60), intervalS: 900 },
      ],
      NOW,
    );
    expect(result.overdue.map((n) => n.serial)).toEqual(["C", "A"]);
    expect(result.overdue[1]).toEqual({ serial: "A", siteName: "Lindenhof", lastSeenAt: before(2000), intervalS: 900, silentS: 2000 });
    expect(result.neverSeen).toBe(1);
  });

  it("does not count a check-in stamped slightly ahead of the server's clock as overdue", () => {
    expect(classifyNotSeen([{ serial: "F", siteName: "x", lastSeenAt: before(-5), intervalS: 900 }], NOW).overdue).toEqual([]);
  });
});

describe("drift", () => {
  const row = (serial: string, assignedHash: string | null, runningHash: string | null) => ({ serial, siteName: "Lindenhof", assignedHash, runningHash, drift: !!assignedHash && assignedHash !== runningHash, lastSeenAt: null });

  it("lists controllers running another configuration before those that have not reported one, each by serial", () => {
    const list = listDrift([row("Z", "a", "b"), row("Y", "a", null), row("X", "a", "a"), row("W", null, "b"), row("V", "a", "c")]);
    expect(list.map((d) => [d.serial, d.reason])).toEqual([
      ["V", "other"],
      ["Z", "other"],
      ["Y", "unreported"],
    ]);
  });
});

describe("capped lists", () => {
  it("shows the first ten and says how many more there are", () => {
    const items = Array.from({ length: 23 }, (_, i) => i);
    expect(firstOf(items)).toEqual({ shown: items.slice(0, 10), more: 13 });
    expect(firstOf([1, 2], 10)).toEqual({ shown: [1, 2], more: 0 });
  });
});
