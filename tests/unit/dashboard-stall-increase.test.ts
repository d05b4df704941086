import { describe, expect, it } from "vitest";
import { counterIncrease, STALL_WINDOW_DAYS, stallWindowStart } from "@/lib/dashboard/stall-increase";

describe("weekly stall increase from a running counter", () => {
  it("is the rise from the week's first reading to its last", () => {
    expect(counterIncrease([10, 12, 12, 13, 15])).toBe(5);
  });

  it("counts nothing for a counter that did not move, a single reading or none", () => {
    expect(counterIncrease([7, 7, 7])).toBe(0);
    expect(counterIncrease([4])).toBe(0);
    expect(counterIncrease([])).toBe(0);
  });

  it("counts a counter that restarted after a reboot from zero", () => {
    // 10 → 12 (+2), reboot, 1 (+1 since the restart), 3 (+2)
    expect(counterIncrease([10, 12, 1, 3])).toBe(5);
  });

  it("counts a restart to zero as no stall, and what follows it", () => {
    expect(counterIncrease([40, 0, 2])).toBe(2);
  });

  it("handles several restarts in one week", () => {
    // +3, restart to 2 (+2), +1, restart to 0 (+0), +4
    expect(counterIncrease([5, 8, 2, 3, 0, 4])).toBe(10);
  });

  it("looks back seven days", () => {
    expect(STALL_WINDOW_DAYS).toBe(7);
    expect(stallWindowStart(new Date("2026-12-08T06:30:00Z")).toISOString()).toBe("2026-12-01T06:30:00.000Z");
  });
});
