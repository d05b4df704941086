import { formatNumber as f } from "./eng-notation";
import type { DebounceInput } from "./inputs";
import { COMMON_PRACTICE, type DriveWarning } from "./warnings";

// Circuit: Vcc — R1 — X;  the contact from X to ground;  X — R2 — Y;  C from Y to ground;  Y drives a
// Schmitt-trigger input (no input current). Contact closed: C discharges through R2 alone, since X is held
// at ground. Contact open: C charges from Vcc through R1 + R2. Both delays assume C had settled first.
//   t_close = R2 · C · ln(Vcc / VT−)
//   t_open  = (R1 + R2) · C · ln(Vcc / (Vcc − VT+))

/** Contact bounce, from a published measurement of many switches (from memory): most settle within ~10 ms, a few take tens of ms. */
export const BOUNCE_MOST_MS = 10;
/** Above this a button feels sluggish (common practice). */
export const SLUGGISH_MS = 100;
/** Above this the Schmitt input's leakage current shifts the node noticeably (common practice). */
export const MAX_CHARGE_PATH_OHM = 1e6;
/** A contact held closed for hours (an end stop at rest) should draw less than this from a battery (common practice). */
export const MAX_HOLD_CURRENT_A = 1e-3;

/** IEC 60063 preferred-number series. */
export const E6 = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8] as const;
export const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2] as const;

/** The smallest value of a preferred-number series that is at least `value`. */
export function nextPreferredUp(value: number, series: readonly number[]): number {
  const decade = Math.floor(Math.log10(value));
  const mantissa = value / 10 ** decade;
  const step = series.find((s) => s >= mantissa * (1 - 1e-9));
  return Number(((step ?? 10) * 10 ** decade).toPrecision(3));
}

/** Delay (s) for C to discharge from Vcc through R to the falling threshold VT−. */
export function dischargeDelayS(rOhm: number, cFarad: number, vcc: number, vtMinus: number): number {
  return rOhm * cFarad * Math.log(vcc / vtMinus);
}

/** Delay (s) for C to charge from 0 V through R to the rising threshold VT+. */
export function chargeDelayS(rOhm: number, cFarad: number, vcc: number, vtPlus: number): number {
  return rOhm * cFarad * Math.log(vcc / (vcc - vtPlus));
}

/** Node voltage (V) t seconds after the contact closes (discharge) or opens (charge). */
export function nodeVoltage(input: DebounceInput, edge: "close" | "open", tS: number): number {
  if (edge === "close") return input.vcc * Math.exp(-tS / (input.r2Ohm * input.cFarad));
  return input.vcc * (1 - Math.exp(-tS / ((input.r1Ohm + input.r2Ohm) * input.cFarad)));
}

export type DebounceResult = {
  tauCloseS: number;
  tauOpenS: number;
  closeDelayS: number;
  openDelayS: number;
  holdCurrentA: number;
  peakDischargeA: number;
  design: {
    targetS: number;
    cForCloseF: number;
    cForOpenF: number;
    r2ForCloseOhm: number;
    r1ForOpenOhm: number | null;
    cPreferredF: number;
    closeDelayWithPreferredS: number;
    openDelayWithPreferredS: number;
  } | null;
  software: { samplePeriodMs: number; stableSamples: number; acceptMs: number; shortestStableMs: number } | null;
  warnings: DriveWarning[];
};

/** RC + Schmitt-trigger debounce delays, component values for a wanted delay, and software sampling. */
export function computeDebounce(input: DebounceInput): DebounceResult {
  const { r1Ohm, r2Ohm, cFarad, vcc, vtPlus, vtMinus } = input;
  const kClose = Math.log(vcc / vtMinus);
  const kOpen = Math.log(vcc / (vcc - vtPlus));
  let design: DebounceResult["design"] = null;
  if (input.targetMs !== undefined) {
    const t = input.targetMs / 1000;
    const cForCloseF = t / (r2Ohm * kClose);
    const cForOpenF = t / ((r1Ohm + r2Ohm) * kOpen);
    const r1 = t / (cFarad * kOpen) - r2Ohm;
    // One capacitor for both edges: the larger requirement, rounded up to a stocked E6 value.
    const cPreferredF = nextPreferredUp(Math.max(cForCloseF, cForOpenF), E6);
    design = {
      targetS: t,
      cForCloseF,
      cForOpenF,
      r2ForCloseOhm: t / (cFarad * kClose),
      r1ForOpenOhm: r1 > 0 ? r1 : null,
      cPreferredF,
      closeDelayWithPreferredS: dischargeDelayS(r2Ohm, cPreferredF, vcc, vtMinus),
      openDelayWithPreferredS: chargeDelayS(r1Ohm + r2Ohm, cPreferredF, vcc, vtPlus),
    };
  }
  const software =
    input.samplePeriodMs !== undefined && input.stableSamples !== undefined
      ? {
          samplePeriodMs: input.samplePeriodMs,
          stableSamples: input.stableSamples,
          acceptMs: input.samplePeriodMs * input.stableSamples,
          shortestStableMs: input.samplePeriodMs * (input.stableSamples - 1),
        }
      : null;
  const result: DebounceResult = {
    tauCloseS: r2Ohm * cFarad,
    tauOpenS: (r1Ohm + r2Ohm) * cFarad,
    closeDelayS: dischargeDelayS(r2Ohm, cFarad, vcc, vtMinus),
    openDelayS: chargeDelayS(r1Ohm + r2Ohm, cFarad, vcc, vtPlus),
    holdCurrentA: vcc / r1Ohm,
    peakDischargeA: vcc / r2Ohm,
    design,
    software,
    warnings: [],
  };
  result.warnings = debounceWarnings(result, input);
  return result;
}

function delayWarnings(label: string, ms: number): DriveWarning[] {
  if (ms < BOUNCE_MOST_MS) {
    return [{
      code: "delay-short",
      severity: "warn",
      message: `${label} of ${f(ms, 3)} ms is shorter than many switches bounce (most settle within ~${BOUNCE_MOST_MS} ms, a few take tens of ms).`,
      basis: "published switch-bounce measurements, from memory",
    }];
  }
  if (ms > SLUGGISH_MS) {
    return [{ code: "delay-long", severity: "warn", message: `${label} of ${f(ms, 3)} ms makes a button feel sluggish.`, basis: COMMON_PRACTICE }];
  }
  return [];
}

/** Warnings for delays that let bounce through or feel slow, and for awkward component values. */
export function debounceWarnings(r: DebounceResult, input: DebounceInput): DriveWarning[] {
  const out = [...delayWarnings("The closing delay", r.closeDelayS * 1000), ...delayWarnings("The opening delay", r.openDelayS * 1000)];
  if (r.software) out.push(...delayWarnings("The software debounce time", r.software.acceptMs));
  if (input.r1Ohm + input.r2Ohm > MAX_CHARGE_PATH_OHM) {
    out.push({
      code: "high-impedance",
      severity: "warn",
      message: `R1 + R2 is ${f((input.r1Ohm + input.r2Ohm) / 1e6, 3)} MΩ: the input's leakage current shifts the node voltage; use a smaller R and a larger C.`,
      basis: COMMON_PRACTICE,
    });
  }
  if (r.holdCurrentA > MAX_HOLD_CURRENT_A) {
    out.push({
      code: "hold-current",
      severity: "warn",
      message: `A closed contact draws ${f(r.holdCurrentA * 1000, 3)} mA through R1: a drain on a battery when an end-stop contact stays closed for hours.`,
      basis: COMMON_PRACTICE,
    });
  }
  return out;
}
