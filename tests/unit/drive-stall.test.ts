import { describe, expect, it } from "vitest";
import { fieldErrors, stallInputSchema } from "@/lib/drive/inputs";
import { ASSUMED_RAMP_MS, computeStall } from "@/lib/drive/stall";

const base = { nominalCps: "2400", fraction: "0.5", windowMs: "50" };
const stall = (over: Record<string, string> = {}) => computeStall(stallInputSchema.parse({ ...base, ...over }));
const codes = (over: Record<string, string>) => stall(over).warnings.map((w) => w.code);

describe("stall threshold", () => {
  it("scales the nominal velocity by the fraction, per second and per window", () => {
    // Hand-worked: 0.5 × 2400 = 1200 counts/s; × 0.050 s = 60 counts per window (120 at nominal).
    const r = stall();
    expect(r.thresholdCps).toBe(1200);
    expect(r.thresholdCountsPerWindow).toBeCloseTo(60, 9);
    expect(r.nominalCountsPerWindow).toBeCloseTo(120, 9);
  });

  it("blanks start-up for the ramp to the threshold speed plus one window (common practice)", () => {
    // Linear ramp of 200 ms to nominal: half speed after 100 ms; + one 50 ms window = 150 ms.
    const r = stall({ rampMs: "200" });
    expect(r.timeToThresholdMs).toBeCloseTo(100, 9);
    expect(r.blankingMs).toBeCloseTo(150, 9);
    expect(r.rampAssumed).toBe(false);
  });

  it("assumes a ramp time when none is given, and says so", () => {
    const r = stall();
    expect(r.rampMs).toBe(ASSUMED_RAMP_MS);
    expect(r.rampAssumed).toBe(true);
  });

  it("gives the reaction distance as one window plus latency at nominal speed", () => {
    // Hand-worked: (50 + 10) ms × 2400 counts/s = 144 counts; at 20 counts/mm = 7.2 mm.
    const r = stall({ latencyMs: "10", countsPerMm: "20" });
    expect(r.reaction.timeMs).toBe(60);
    expect(r.reaction.counts).toBeCloseTo(144, 9);
    expect(r.reaction.mm).toBeCloseTo(7.2, 9);
    // A gradually slowing door: (1 + 0.5) × 50 + 10 = 85 ms at most → 204 counts = 10.2 mm.
    expect(r.slowingWorstCase.counts).toBeCloseTo(204, 9);
    expect(r.slowingWorstCase.mm).toBeCloseTo(10.2, 9);
  });

  it("leaves the distance in mm out when counts per mm are not given", () => {
    expect(stall().reaction.mm).toBeNull();
  });
});

describe("stall warnings", () => {
  it("gives none for a sensible check", () => {
    expect(stall().warnings).toEqual([]);
  });

  it("flags fewer than about 4 counts per window at the threshold", () => {
    // 200 counts/s × 0.5 × 0.030 s = 3 counts.
    expect(codes({ nominalCps: "200", windowMs: "30" })).toEqual(["window-short"]);
  });

  it("flags a window that holds less than one count even at full speed", () => {
    expect(codes({ nominalCps: "20", windowMs: "20" })).toContain("window-empty");
  });

  it("flags a fraction so low that a door pressing on a bird keeps moving", () => {
    expect(stall({ fraction: "0.2" }).warnings).toContainEqual(expect.objectContaining({ code: "fraction-low", severity: "bad" }));
  });

  it("flags a fraction so high that normal speed variation trips it", () => {
    expect(codes({ fraction: "0.9" })).toContain("fraction-high");
  });
});

describe("stall input", () => {
  const errors = (over: Record<string, string>) => {
    const parsed = stallInputSchema.safeParse({ ...base, ...over });
    return parsed.success ? {} : fieldErrors(parsed.error);
  };

  it("refuses a fraction outside (0, 1), naming the field", () => {
    expect(errors({ fraction: "0" })).toEqual({ fraction: "must be greater than 0" });
    expect(errors({ fraction: "1" })).toEqual({ fraction: "must be less than 1" });
    expect(errors({ fraction: "1.5" })).toEqual({ fraction: "must be less than 1" });
  });

  it("refuses a zero window and a non-numeric velocity", () => {
    expect(errors({ windowMs: "0" })).toEqual({ windowMs: "must be greater than 0" });
    expect(errors({ nominalCps: "fast" })).toEqual({ nominalCps: "must be a number" });
  });

  it("accepts a zero ramp and refuses a negative one", () => {
    expect(errors({ rampMs: "0" })).toEqual({});
    expect(errors({ rampMs: "-5" })).toEqual({ rampMs: "must be 0 or more" });
  });
});
