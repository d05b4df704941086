import { describe, expect, it } from "vitest";
import { chargeDelayS, computeDebounce, dischargeDelayS, E12, E6, nextPreferredUp, nodeVoltage } from "@/lib/drive/debounce";
import { formatEngineering, parseEngineering } from "@/lib/drive/eng-notation";
import { debounceInputSchema, fieldErrors } from "@/lib/drive/inputs";

const base = { r1Ohm: "10k", r2Ohm: "10k", cFarad: "1u", vcc: "5", vtPlus: "3", vtMinus: "1.5" };
const debounce = (over: Record<string, string> = {}) => computeDebounce(debounceInputSchema.parse({ ...base, ...over }));

describe("RC delays", () => {
  // The capacitor equations V(t) = Vcc·e^(−t/RC) (discharge) and V(t) = Vcc·(1 − e^(−t/RC)) (charge) are
  // the first-order RC responses of any circuit-theory textbook; solved for the threshold crossing they
  // give t = RC·ln(Vcc/VT−) and t = RC·ln(Vcc/(Vcc − VT+)).
  it("gives the closing delay from the discharge through R2", () => {
    // Hand-worked: R2·C = 10 kΩ × 1 µF = 10 ms; ln(5 / 1.5) = 1.20397 → 12.040 ms.
    expect(dischargeDelayS(10e3, 1e-6, 5, 1.5)).toBeCloseTo(0.0120397, 7);
    expect(debounce().closeDelayS).toBeCloseTo(0.0120397, 7);
  });

  it("gives the opening delay from the charge through R1 + R2", () => {
    // Hand-worked: (R1 + R2)·C = 20 kΩ × 1 µF = 20 ms; ln(5 / (5 − 3)) = ln 2.5 = 0.91629 → 18.326 ms.
    expect(chargeDelayS(20e3, 1e-6, 5, 3)).toBeCloseTo(0.0183258, 7);
    expect(debounce().openDelayS).toBeCloseTo(0.0183258, 7);
  });

  it("charges to 63.2 % of Vcc after one time constant", () => {
    // 1 − 1/e = 0.63212: the textbook definition of the RC time constant. 5 V × 0.63212 = 3.1606 V.
    expect(nodeVoltage(debounceInputSchema.parse(base), "open", 0.02)).toBeCloseTo(3.16060, 4);
    expect(nodeVoltage(debounceInputSchema.parse(base), "close", 0.01)).toBeCloseTo(5 / Math.E, 9);
  });

  it("crosses exactly the threshold at the computed delay", () => {
    const input = debounceInputSchema.parse(base);
    const r = computeDebounce(input);
    expect(nodeVoltage(input, "close", r.closeDelayS)).toBeCloseTo(1.5, 9);
    expect(nodeVoltage(input, "open", r.openDelayS)).toBeCloseTo(3, 9);
  });
});

describe("component values for a wanted delay", () => {
  it("recovers the capacitor and resistors that give the delay", () => {
    const d = debounce({ targetMs: "12.0397280433" }).design!;
    expect(d.cForCloseF).toBeCloseTo(1e-6, 12);
    expect(d.r2ForCloseOhm).toBeCloseTo(10e3, 3);
    const open = debounce({ targetMs: "18.3258146375" }).design!;
    expect(open.cForOpenF).toBeCloseTo(1e-6, 12);
    expect(open.r1ForOpenOhm).toBeCloseTo(10e3, 3);
  });

  it("says R1 cannot reach a delay that R2 alone exceeds", () => {
    expect(debounce({ targetMs: "5" }).design?.r1ForOpenOhm).toBeNull();
  });

  it("rounds the capacitor up to an E6 value meeting both edges", () => {
    // 20 ms needs 1.66 µF for closing (the larger): next E6 value up is 2.2 µF.
    const d = debounce({ targetMs: "20" }).design!;
    expect(d.cPreferredF).toBeCloseTo(2.2e-6, 12);
    expect(d.closeDelayWithPreferredS).toBeGreaterThanOrEqual(0.02);
    expect(d.openDelayWithPreferredS).toBeGreaterThanOrEqual(0.02);
  });

  it("uses the IEC 60063 E6 and E12 series", () => {
    // IEC 60063 preferred numbers (E6: 1.0 1.5 2.2 3.3 4.7 6.8; E12 adds 1.2 1.8 2.7 3.9 5.6 8.2).
    expect([...E6]).toEqual([1.0, 1.5, 2.2, 3.3, 4.7, 6.8]);
    expect(E12).toHaveLength(12);
    expect(nextPreferredUp(4.7e-6, E6)).toBeCloseTo(4.7e-6, 15);
    expect(nextPreferredUp(7e-9, E6)).toBeCloseTo(1e-8, 15);
    expect(nextPreferredUp(11e3, E12)).toBe(12e3);
  });
});

describe("software debounce", () => {
  it("takes sample period × stable samples", () => {
    const s = debounce({ samplePeriodMs: "5", stableSamples: "4" }).software!;
    expect(s.acceptMs).toBe(20);
    expect(s.shortestStableMs).toBe(15);
  });

  it("warns when shorter than most measured contact bounce (about 10 ms, from memory)", () => {
    const w = debounce({ samplePeriodMs: "1", stableSamples: "5" }).warnings;
    expect(w).toContainEqual(expect.objectContaining({ code: "delay-short", message: expect.stringMatching(/software/) }));
  });
});

describe("debounce warnings", () => {
  it("gives none for a 10 kΩ / 1 µF circuit at 5 V", () => {
    expect(debounce().warnings).toEqual([]);
  });

  it("flags short and sluggish delays, high impedance and a draining hold current", () => {
    const codes = (over: Record<string, string>) => debounce(over).warnings.map((w) => w.code);
    expect(codes({ cFarad: "100n" })).toContain("delay-short");
    expect(codes({ cFarad: "10u" })).toContain("delay-long");
    expect(codes({ r1Ohm: "1M", cFarad: "10n" })).toContain("high-impedance");
    expect(codes({ r1Ohm: "1k" })).toContain("hold-current");
  });
});

describe("engineering notation", () => {
  it("reads SI prefixes, letter codes and units", () => {
    expect(parseEngineering("10k")).toBe(10e3);
    expect(parseEngineering("4k7")).toBeCloseTo(4700, 9);
    expect(parseEngineering("4R7")).toBeCloseTo(4.7, 9);
    expect(parseEngineering("100n")).toBeCloseTo(100e-9, 18);
    expect(parseEngineering("2.2 µF")).toBeCloseTo(2.2e-6, 15);
    expect(parseEngineering("1M")).toBe(1e6);
    expect(parseEngineering("1m")).toBe(1e-3);
    expect(parseEngineering("1e-6")).toBe(1e-6);
    expect(parseEngineering("ten")).toBeUndefined();
  });

  it("prints values with a prefix", () => {
    expect(formatEngineering(1.66e-6, "F")).toBe("1.66 µF");
    expect(formatEngineering(999.96, "Ω")).toBe("1.00 kΩ");
  });
});

describe("debounce input", () => {
  const errors = (over: Record<string, string>) => {
    const parsed = debounceInputSchema.safeParse({ ...base, ...over });
    return parsed.success ? {} : fieldErrors(parsed.error);
  };

  it("requires 0 < VT− < VT+ < Vcc", () => {
    expect(errors({ vtPlus: "5" })).toEqual({ vtPlus: "must be below Vcc" });
    expect(errors({ vtMinus: "3" })).toEqual({ vtMinus: "must be below VT+" });
    expect(errors({ vtMinus: "0" })).toEqual({ vtMinus: "must be greater than 0" });
  });

  it("refuses non-numeric and non-positive parts", () => {
    expect(errors({ cFarad: "lots" })).toEqual({ cFarad: "must be a number" });
    expect(errors({ r2Ohm: "0" })).toEqual({ r2Ohm: "must be greater than 0" });
  });

  it("needs both sample period and stable samples", () => {
    expect(errors({ samplePeriodMs: "5" })).toEqual({ stableSamples: "is required when a sample period is given" });
    expect(errors({ stableSamples: "2.5", samplePeriodMs: "5" })).toEqual({ stableSamples: "must be a whole number" });
  });
});

describe("debounce input with several faults", () => {
  it("reports the threshold order even while another field is wrong", () => {
    const parsed = debounceInputSchema.safeParse({ ...base, cFarad: "lots", vtMinus: "4" });
    expect(parsed.success).toBe(false);
    expect(fieldErrors(parsed.error!)).toEqual({ cFarad: "must be a number", vtMinus: "must be below VT+" });
  });
});
