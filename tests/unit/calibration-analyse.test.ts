import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { analyseRun, SERIES_MAX_POINTS, type RunAnalysis } from "@/lib/calibration/analyse";
import { parseCalibrationCsv, type CalibrationSample } from "@/lib/calibration/csv";
import { deriveVelocities, median, quantile, thinSeries } from "@/lib/calibration/series";
import { EXAMPLE, exampleRun } from "../fixtures/calibration/generate";

const { samples: generated, truth } = exampleRun();

function fromFixture(): CalibrationSample[] {
  const r = parseCalibrationCsv(readFileSync(new URL("../fixtures/calibration/example-run.csv", import.meta.url), "utf8"));
  if (!r.ok) throw new Error(r.errors[0]?.message);
  return r.samples;
}

function analysed(samples: readonly CalibrationSample[]): RunAnalysis {
  const r = analyseRun(samples);
  if (!r.ok) throw new Error(r.errors.join("; "));
  return r.analysis;
}

/** 10 ms samples: at rest at 0, `speed` counts/s to `full`, rest, back to 0, rest. No ramps, so every number can be worked by hand. */
function squareRun(full: number, speed: number, sensor = false): CalibrationSample[] {
  const moveMs = (full / speed) * 1000;
  const at = (t: number): number => {
    if (t <= 100) return 0;
    if (t <= 100 + moveMs) return ((t - 100) * speed) / 1000;
    if (t <= 300 + moveMs) return full;
    if (t <= 300 + 2 * moveMs) return full - ((t - 300 - moveMs) * speed) / 1000;
    return 0;
  };
  const out: CalibrationSample[] = [];
  for (let t = 0; t <= 500 + 2 * moveMs; t += 10) {
    const counts = Math.round(at(t));
    out.push(sensor ? { tMs: t, counts, openSensor: counts === 0 ? 1 : 0 } : { tMs: t, counts });
  }
  return out;
}

describe("the example run against the generator's truth", () => {
  const a = analysed(fromFixture());

  it("measures the full travel from the open to the closed end", () => {
    expect(a.fullTravelCounts).toBe(EXAMPLE.fullTravelCounts);
    expect(a).toMatchObject({ openEndCounts: 0, closedEndCounts: 17_100, closingCountsUp: true, directionSource: "open sensor" });
  });

  it("finds the steady closing and opening speeds within 1 %", () => {
    expect(a.velocityCps.closing! / truth.closing.steadyCps).toBeCloseTo(1, 2);
    expect(a.velocityCps.opening! / truth.opening.steadyCps).toBeCloseTo(1, 2);
    expect(a.nominalDirection).toBe("closing");
    expect(a.nominalVelocityCps).toBe(a.velocityCps.closing);
  });

  it("measures each travel time within 50 ms, a little short because the door is 'at an end' within 2 counts", () => {
    const [close, open] = a.moves;
    expect(a.moves.map((m) => m.direction)).toEqual(["closing", "opening"]);
    expect(close!.travelTimeMs).toBeGreaterThan(truth.closing.travelMs - 50);
    expect(close!.travelTimeMs).toBeLessThanOrEqual(truth.closing.travelMs);
    expect(open!.travelTimeMs).toBeGreaterThan(truth.opening.travelMs - 50);
    expect(open!.travelTimeMs).toBeLessThanOrEqual(truth.opening.travelMs);
    expect(close!.leftEndMs).toBeGreaterThanOrEqual(truth.closing.startMs);
    expect(a.travelTimeMs).toMatchObject({ closing: close!.travelTimeMs, opening: open!.travelTimeMs, longest: open!.travelTimeMs, longestDirection: "opening" });
  });

  it("measures the ramp within 40 ms of the generator's 250 ms", () => {
    expect(a.rampMs).toBeGreaterThan(EXAMPLE.rampMs - 40);
    expect(a.rampMs).toBeLessThanOrEqual(EXAMPLE.rampMs);
  });

  it("finds the open sensor switching within 45 counts of the open end, with no warnings", () => {
    expect(a.sensorEdgeCounts).toHaveLength(2);
    for (const d of a.sensorEdgeCounts) expect(d).toBeLessThanOrEqual(EXAMPLE.sensorWithinCounts + 1);
    expect(a.warnings).toEqual([]);
  });

  it("gives the same answers when velocity is derived from counts and time", () => {
    const b = analysed(fromFixture().map(({ velocityCps: _, ...s }) => s));
    expect(b.velocitySource).toBe("derived from counts");
    expect(b.velocityCps.closing! / truth.closing.steadyCps).toBeCloseTo(1, 2);
    expect(b.velocityCps.opening! / truth.opening.steadyCps).toBeCloseTo(1, 2);
    expect(b.travelTimeMs).toEqual(a.travelTimeMs);
    expect(Math.abs(b.rampMs - a.rampMs)).toBeLessThan(20);
  });

  it("thins the plot series to at most 1,000 points in time order, first and last sample kept", () => {
    expect(a.series.length).toBeLessThanOrEqual(SERIES_MAX_POINTS);
    expect(a.series.length).toBeGreaterThan(SERIES_MAX_POINTS / 2);
    expect(a.series.every((p, i) => i === 0 || p.tMs > a.series[i - 1]!.tMs)).toBe(true);
    expect(a.series[0]?.tMs).toBe(0);
    expect(a.series.map((p) => p.velocityCps)).toContain(Math.max(...generated.map((s) => s.velocityCps!)));
  });
});

describe("hand-worked runs", () => {
  it("analyses a 1,000-count run at 1,000 counts/s sampled every 10 ms", () => {
    // At rest at 0 until 100 ms, 1 count/ms to 1,000 counts at 1,100 ms, rest to 1,300 ms, back to 0 at
    // 2,300 ms. Derived velocity over ±10 ms is 1,000 counts/s in steady running; the last sample at 0 is
    // at 100 ms and the first at 1,000 is at 1,100 ms, so the closing travel takes 1,000 ms; at 110 ms the
    // ±10 ms difference (20 − 0) / 20 ms is already 1,000 counts/s, so the ramp is 10 ms.
    const a = analysed(squareRun(1000, 1000));
    expect(a).toMatchObject({ fullTravelCounts: 1000, nominalVelocityCps: 1000, peakVelocityCps: { closing: 1000, opening: 1000 }, steadyFromCps: { closing: 800, opening: 800 }, rampMs: 10, directionSource: "convention" });
    expect(a.moves).toEqual([
      { direction: "closing", leftEndMs: 100, reachedEndMs: 1100, travelTimeMs: 1000, steadyVelocityCps: 1000, rampMs: 10 },
      { direction: "opening", leftEndMs: 1300, reachedEndMs: 2300, travelTimeMs: 1000, steadyVelocityCps: 1000, rampMs: 10 },
    ]);
  });

  it("detects an encoder counting down while closing from the open sensor, and says how to fix it", () => {
    const run = squareRun(1000, 1000, true).map((s) => ({ ...s, counts: s.counts === 0 ? 0 : -s.counts }));
    const a = analysed(run);
    expect(a).toMatchObject({ closingCountsUp: false, directionSource: "open sensor", openEndCounts: 0, closedEndCounts: -1000, fullTravelCounts: 1000 });
    expect(a.moves.map((m) => m.direction)).toEqual(["closing", "opening"]);
    expect(a.warnings.join(" ")).toContain("Swap the encoder's A and B channels");
  });

  it("falls back to the convention and warns when the open sensor never comes on", () => {
    const a = analysed(squareRun(1000, 1000, true).map((s) => ({ ...s, openSensor: 0 as const })));
    expect(a.directionSource).toBe("convention");
    expect(a.warnings.join(" ")).toContain("The open sensor was never on");
  });

  it("warns about an abandoned movement and does not use it", () => {
    const aborted: CalibrationSample[] = [0, 10, 20, 30, 40, 50, 60].map((t, i) => ({ tMs: t, counts: [0, 0, 200, 400, 200, 0, 0][i]! }));
    const full = squareRun(1000, 1000).map((s) => ({ ...s, tMs: s.tMs + 70 }));
    const a = analysed([...aborted, ...full]);
    expect(a.moves).toHaveLength(2);
    expect(a.warnings[0]).toBe("The door left an end stop at 0.01 s and came back to it at 0.05 s without reaching the other end (a stall or a reversal?); that movement is not used.");
  });

  it("warns when only one direction was recorded", () => {
    const a = analysed(squareRun(1000, 1000).filter((s) => s.tMs <= 1200));
    expect(a.travelTimeMs).toMatchObject({ closing: 1000, opening: null, longest: 1000 });
    expect(a.warnings).toEqual(["The run has no complete opening movement: record the door closing and opening so both travel times are measured."]);
  });

  it("refuses a run where the door barely moves", () => {
    expect(analyseRun([0, 10, 20, 30].map((t) => ({ tMs: t, counts: t })))).toEqual({ ok: false, errors: ["the counts span only 30 (from 0 to 30): the door did not move from one end to the other"] });
  });

  it("warns when the run starts between the end stops", () => {
    const a = analysed(squareRun(1000, 1000).filter((s) => s.tMs >= 600));
    expect(a.fullTravelCounts).toBe(1000);
    expect(a.warnings).toContain("The run starts between the end stops: record from rest at an end stop to rest at an end stop, or the travel measured may fall short of the door's.");
  });
});

describe("series helpers", () => {
  it("derives velocity as a central difference over ±10 ms", () => {
    // Samples 0, 5, …, 40 ms at 2 counts/ms: every difference is 2,000 counts/s.
    const t = [0, 5, 10, 15, 20, 25, 30, 35, 40];
    expect(deriveVelocities(t, t.map((x) => 2 * x))).toEqual(t.map(() => 2000));
  });

  it("uses the neighbours where samples are farther apart than the span", () => {
    expect(deriveVelocities([0, 100, 200], [0, 50, 150])).toEqual([500, 750, 1000]);
  });

  it("takes nearest-rank quantiles and medians of odd and even counts", () => {
    expect(quantile([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.99)).toBe(10);
    expect(quantile([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.5)).toBe(5);
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([])).toBeNull();
  });

  it("keeps a one-sample dip that plain striding would skip", () => {
    const points = Array.from({ length: 5000 }, (_, i) => ({ tMs: i, counts: i, velocityCps: i === 2501 ? 0 : 1000 }));
    const thin = thinSeries(points, 1000);
    expect(thin.length).toBeLessThanOrEqual(1000);
    expect(thin.some((p) => p.velocityCps === 0)).toBe(true);
  });
});

describe("remarks on a run", () => {
  it("derives velocity when the velocity column has no sign, and says so", () => {
    const run = squareRun(1000, 1000).map((s, i, all) => {
      const prev = all[i - 1] ?? s;
      return { ...s, velocityCps: Math.abs(s.counts - prev.counts) * 100 };
    });
    const a = analysed(run);
    expect(a.velocitySource).toBe("derived from counts");
    expect(a.velocityCps).toEqual({ closing: 1000, opening: 1000 });
    expect(a.warnings.join(" ")).toContain("The velocity column has the direction of the counts in only");
  });

  it("remarks on closing and opening speeds more than 15 % apart", () => {
    const close = squareRun(1000, 1000).filter((s) => s.tMs <= 1300);
    const open = squareRun(1000, 500).filter((s) => s.tMs > 2300).map((s) => ({ ...s, tMs: s.tMs - 1000 }));
    const a = analysed([...close, ...open]);
    expect(a.velocityCps).toEqual({ closing: 1000, opening: 500 });
    expect(a.warnings).toEqual(["The door closes at 1,000 counts/s and opens at 500 counts/s, 50 % apart: the stall threshold follows the closing speed, so check it does not trip while opening."]);
  });

  it("remarks on an open sensor that switches far from the open end", () => {
    const run = squareRun(1000, 1000, true).map((s) => ({ ...s, openSensor: s.counts <= 100 ? (1 as const) : (0 as const) }));
    // The edge lies between the samples at 100 and 110 counts: 105.
    expect(analysed(run).warnings).toEqual(["The open sensor switched 105 counts from the open end (more than 2 % of the 1,000-count travel): check the sensor's position and its target."]);
  });
});
