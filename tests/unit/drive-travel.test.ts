import { describe, expect, it } from "vitest";
import { fieldErrors, travelInputSchema } from "@/lib/drive/inputs";
import { computeTravel, countRateFromMotorRpm, countsPerMotorRev, motorRpmFromCountRate } from "@/lib/drive/travel";
import { cordLengthForTurns, distanceForTurns, layerDiameterMm, turnsForCordLength, turnsPerLayerOf } from "@/lib/drive/winding";

const base = { travelMm: "300", spoolMm: "20", cordMm: "2", gearRatio: "30", ppr: "12", decoding: "4" };
const travel = (over: Record<string, string> = {}) => computeTravel(travelInputSchema.parse({ ...base, ...over }));
const codes = (r: { warnings: { code: string }[] }) => r.warnings.map((w) => w.code);

describe("quadrature decoding", () => {
  // X1 counts one edge of channel A per cycle, X2 both edges of A, X4 both edges of A and B: the encoding
  // modes described in instrument makers' counter documentation (e.g. National Instruments' encoder
  // measurement guide), from memory. A 500-line encoder therefore gives 500, 1000 and 2000 counts per turn.
  it("multiplies pulses per revolution by 1, 2 or 4", () => {
    expect(countsPerMotorRev(500, 1)).toBe(500);
    expect(countsPerMotorRev(500, 2)).toBe(1000);
    expect(countsPerMotorRev(500, 4)).toBe(2000);
  });

  it("converts motor speed to count rate and back", () => {
    // Hand-worked: 3000 rpm = 50 rev/s; 12 PPR × 4 = 48 counts/rev → 2400 counts/s.
    expect(countRateFromMotorRpm(3000, 12, 4)).toBeCloseTo(2400, 9);
    expect(motorRpmFromCountRate(2400, 12, 4)).toBeCloseTo(3000, 9);
  });
});

describe("single-layer winding", () => {
  it("uses spool plus cord as the effective diameter", () => {
    // Hand-worked: d = 20 + 2 = 22 mm, one turn = π·22 = 69.115 mm; 300 mm = 4.34059 turns;
    // 12 PPR × 4 × 30 = 1440 counts per spool turn → 6250.45 counts, 20.835 counts/mm.
    const r = travel();
    expect(r.model).toBe("single-layer");
    expect(r.diameterMm.first).toBe(22);
    expect(r.countsPerSpoolRev).toBe(1440);
    expect(r.spoolTurns).toBeCloseTo(4.340589, 5);
    expect(r.counts).toBeCloseTo(6250.449, 2);
    expect(r.countsRounded).toBe(6250);
    expect(r.countsPerMm.mean).toBeCloseTo(20.83483, 4);
    expect(r.countsPerMm.min).toBeCloseTo(r.countsPerMm.max, 9);
  });

  it("treats a cord of no thickness as winding on the bare core", () => {
    const r = travel({ cordMm: "0" });
    expect(r.spoolTurns).toBeCloseTo(300 / (Math.PI * 20), 9);
  });

  it("neglects the helix pitch, which lengthens a turn by about ½·(cord/(π·d))²", () => {
    // Pythagoras on the unrolled helix: turn length = √((π·d)² + pitch²); for d = 20 mm and a 2 mm pitch
    // that is 0.0506 % longer than π·d, matching the bound stated in the model's documentation.
    const exact = Math.hypot(Math.PI * 20, 2) / (Math.PI * 20) - 1;
    expect(exact).toBeCloseTo(0.5 * (2 / (Math.PI * 20)) ** 2, 6);
    expect(exact).toBeLessThan(0.0006);
  });

  it("gives travel time from the motor speed", () => {
    // Hand-worked: 3000 rpm ÷ 30 = 100 rpm at the spool; 4.34059 turns ÷ (100/60) turns/s = 2.6044 s.
    const r = travel({ motorRpm: "3000" });
    expect(r.atMotorRpm?.spoolRpm).toBeCloseTo(100, 9);
    expect(r.atMotorRpm?.travelTimeS).toBeCloseTo(2.60435, 4);
    expect(r.atMotorRpm?.doorSpeedMmS.mean).toBeCloseTo(300 / 2.60435, 2);
  });

  it("gives the motor speed from a measured count rate", () => {
    const r = travel({ measuredCps: "1200" });
    expect(r.atMeasuredRate?.motorRpm).toBeCloseTo(1500, 9);
  });
});

describe("multi-layer winding", () => {
  const w = { spoolMm: 20, cordMm: 2, turnsPerLayer: 3 };

  it("adds two cord thicknesses to the diameter for each full layer", () => {
    expect([0, 1, 2].map((k) => layerDiameterMm(w, k))).toEqual([22, 26, 30]);
  });

  it("fills the first layer before starting the next", () => {
    // Hand-worked: layer 0 holds 3·π·22 = 207.345 mm; the other 92.655 mm lie on layer 1 (d = 26 mm):
    // 92.655 / (π·26) = 1.13434 turns, 4.13434 turns in all.
    const r = travel({ turnsPerLayer: "3" });
    expect(r.model).toBe("multi-layer");
    expect(r.layersUsed).toBe(2);
    expect(r.spoolTurns).toBeCloseTo(4.134345, 5);
    expect(r.layers.map((l) => l.diameterMm)).toEqual([22, 26]);
    expect(r.layers[0]?.lengthMm).toBeCloseTo(207.3451, 3);
    expect(r.countsPerMm.min).toBeCloseTo(1440 / (Math.PI * 26), 6);
    expect(r.countsPerMm.max).toBeCloseTo(1440 / (Math.PI * 22), 6);
  });

  it("inverts cord length and turns exactly, including on layer boundaries", () => {
    for (const turns of [0, 0.5, 3, 3.0000001, 6, 7.25, 30, 301.5]) {
      expect(turnsForCordLength(w, cordLengthForTurns(w, turns))).toBeCloseTo(turns, 6);
    }
    // Sum of the layers one by one equals the closed form N·π·m·(spool + cord·m).
    const byLayers = [0, 1, 2, 3].reduce((sum, k) => sum + 3 * Math.PI * layerDiameterMm(w, k), 0);
    expect(cordLengthForTurns(w, 12)).toBeCloseTo(byLayers, 9);
  });

  it("derives turns per layer from the spool width, rounded down", () => {
    expect(turnsPerLayerOf({ spoolWidthMm: 25, cordMm: 2 })).toBe(12);
    expect(turnsPerLayerOf({ cordMm: 2 })).toBeNull();
  });

  it("measures a count from the open end, where the outer layer unwinds first", () => {
    const r = travel({ turnsPerLayer: "3", counts: "1000" });
    // 1000 / 1440 = 0.69444 turns, all on the outer layer (d = 26 mm): 0.69444·π·26 = 56.723 mm.
    expect(r.fromCounts?.fromOpenMm).toBeCloseTo(56.7232, 3);
    expect(r.fromCounts?.fromClosedMm).toBeCloseTo(0.694444 * Math.PI * 22, 3);
    expect(distanceForTurns({ ...w, turnsPerLayer: null }, 4, 1).fromOpenMm).toBeCloseTo(Math.PI * 22, 9);
  });
});

describe("travel warnings", () => {
  it("gives none for a plausible drive", () => {
    expect(travel({ motorRpm: "2000", timeoutS: "10" }).warnings).toEqual([]);
  });

  it("flags a travel longer than the timeout, and one close to it", () => {
    const over = travel({ motorRpm: "2000", timeoutS: "3" });
    expect(over.warnings).toContainEqual(expect.objectContaining({ code: "timeout-exceeded", severity: "bad" }));
    expect(codes(travel({ motorRpm: "2000", timeoutS: "4.2" }))).toContain("timeout-margin");
  });

  it("flags motor speeds outside what small gear motors do", () => {
    expect(codes(travel({ motorRpm: "300" }))).toContain("motor-speed");
    expect(codes(travel({ motorRpm: "25000" }))).toContain("motor-speed");
  });

  it("flags a door faster than about 100 mm/s", () => {
    expect(codes(travel({ motorRpm: "3000" }))).toContain("door-speed");
  });

  it("flags fewer than one count per millimetre", () => {
    expect(codes(travel({ gearRatio: "1", ppr: "3", decoding: "1" }))).toContain("resolution");
  });

  it("flags a count beyond the whole travel", () => {
    expect(codes(travel({ counts: "7000" }))).toContain("counts-beyond-travel");
  });
});

describe("travel input", () => {
  const errors = (over: Record<string, string>) => {
    const parsed = travelInputSchema.safeParse({ ...base, ...over });
    return parsed.success ? {} : fieldErrors(parsed.error);
  };

  it("refuses zero or negative sizes and ratios, naming the field", () => {
    expect(errors({ spoolMm: "0" })).toEqual({ spoolMm: "must be greater than 0" });
    expect(errors({ gearRatio: "-2" })).toEqual({ gearRatio: "must be greater than 0" });
    expect(errors({ ppr: "0" })).toEqual({ ppr: "must be greater than 0" });
    expect(errors({ cordMm: "-1" })).toEqual({ cordMm: "must be 0 or more" });
  });

  it("refuses a decoding other than 1, 2 or 4", () => {
    expect(errors({ decoding: "3" })).toEqual({ decoding: "must be 1, 2 or 4" });
  });

  it("refuses text, hex and a fractional PPR", () => {
    expect(errors({ travelMm: "abc" })).toEqual({ travelMm: "must be a number" });
    expect(errors({ travelMm: "0x10" })).toEqual({ travelMm: "must be a number" });
    expect(errors({ ppr: "12.5" })).toEqual({ ppr: "must be a whole number" });
  });

  it("says which required field is missing and treats empty optional fields as not given", () => {
    expect(errors({ spoolMm: "" })).toEqual({ spoolMm: "is required" });
    expect(errors({ motorRpm: "", timeoutS: "" })).toEqual({});
    expect(travelInputSchema.parse({ ...base, decoding: "" }).decoding).toBe(4);
  });

  it("refuses a spool width together with turns per layer, or without a cord", () => {
    expect(errors({ spoolWidthMm: "25", turnsPerLayer: "4" })).toHaveProperty("spoolWidthMm");
    expect(errors({ spoolWidthMm: "25", cordMm: "0" })).toEqual({ cordMm: "must be greater than 0 when the spool width is given" });
  });

  it("refuses unknown fields", () => {
    expect(errors({ spoolmm: "20" })).toHaveProperty("");
  });
});
