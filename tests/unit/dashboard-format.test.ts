import { describe, expect, it } from "vitest";
import { adoptionProgress, ago, formatDuration } from "@/lib/dashboard/format";

describe("durations", () => {
  it("reads at a glance, from seconds to days", () => {
    expect(formatDuration(0)).toBe("0 s");
    expect(formatDuration(59.9)).toBe("59 s");
    expect(formatDuration(900)).toBe("15 min");
    expect(formatDuration(3600)).toBe("1 h");
    expect(formatDuration(12_000)).toBe("3 h 20 min");
    expect(formatDuration(86_400)).toBe("24 h");
    expect(formatDuration(47 * 3600 + 59 * 60)).toBe("47 h 59 min");
    expect(formatDuration(2 * 86_400)).toBe("2 d");
    expect(formatDuration(4 * 86_400 + 6 * 3600 + 59)).toBe("4 d 6 h");
    expect(formatDuration(-5)).toBe("0 s");
  });

  it("says how long ago", () => {
    expect(ago(new Date("2026-12-02T09:00:00Z"), new Date("2026-12-02T12:20:00Z"))).toBe("3 h 20 min ago");
  });
});

describe("release adoption as a progress bar", () => {
  it("is controllers running the release out of those in its stage", () => {
    expect(adoptionProgress({ running: 3, staged: 4 })).toEqual({ value: 3, max: 4, percent: 75, text: "3 of 4 staged controllers run it (75 %)" });
  });

  it("shows 100 % only when every staged controller runs it", () => {
    expect(adoptionProgress({ running: 199, staged: 200 }).percent).toBe(99);
    expect(adoptionProgress({ running: 1, staged: 1 })).toMatchObject({ percent: 100, text: "1 of 1 staged controller runs it (100 %)" });
  });

  it("is an empty bar with a valid range when no controller is in the stage yet", () => {
    expect(adoptionProgress({ running: 0, staged: 0 })).toEqual({ value: 0, max: 1, percent: 0, text: "No controller in this stage yet" });
  });
});
