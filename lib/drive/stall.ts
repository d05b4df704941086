import { formatNumber as f } from "./eng-notation";
import type { StallInput } from "./inputs";
import { COMMON_PRACTICE, type DriveWarning } from "./warnings";

// The check modelled here: counts are totalled over fixed, back-to-back windows; at the end of each
// window the total is compared with the threshold and the drive is cut when it falls short.

/** Ramp time assumed when none is given: a small gear motor with a soft start (common practice). */
export const ASSUMED_RAMP_MS = 250;
/** Below this many counts per window at the threshold, ±1 count of quantisation makes the check noisy. */
export const MIN_THRESHOLD_COUNTS = 4;
/** A door pressing on a bird can keep running above this share of its speed. */
export const FRACTION_LOW = 0.3;
/** Supply sag, cold grease and the cord's layers vary the speed this much without any obstacle. */
export const FRACTION_HIGH = 0.85;

export type Reach = { timeMs: number; counts: number; mm: number | null };

export type StallResult = {
  thresholdCps: number;
  thresholdCountsPerWindow: number;
  nominalCountsPerWindow: number;
  quantisationShare: number;
  rampMs: number;
  rampAssumed: boolean;
  timeToThresholdMs: number;
  blankingMs: number;
  latencyMs: number;
  reaction: Reach;
  slowingWorstCase: Reach;
  warnings: DriveWarning[];
};

/** Stall threshold, start-up blanking and reaction distance for a window-count stall check. */
export function computeStall(input: StallInput): StallResult {
  const { nominalCps, fraction, windowMs, latencyMs } = input;
  const thresholdCps = nominalCps * fraction;
  const thresholdCountsPerWindow = (thresholdCps * windowMs) / 1000;
  const rampMs = input.rampMs ?? ASSUMED_RAMP_MS;
  // Linear ramp from rest: the threshold speed is reached after fraction × ramp; the first window that
  // is judged must lie wholly after that, hence one more window of blanking (common practice).
  const timeToThresholdMs = fraction * rampMs;
  const reach = (timeMs: number): Reach => {
    const counts = (nominalCps * timeMs) / 1000;
    return { timeMs, counts, mm: input.countsPerMm === undefined ? null : counts / input.countsPerMm };
  };
  const result: StallResult = {
    thresholdCps,
    thresholdCountsPerWindow,
    nominalCountsPerWindow: (nominalCps * windowMs) / 1000,
    quantisationShare: thresholdCountsPerWindow > 0 ? 1 / thresholdCountsPerWindow : Number.POSITIVE_INFINITY,
    rampMs,
    rampAssumed: input.rampMs === undefined,
    timeToThresholdMs,
    blankingMs: timeToThresholdMs + windowMs,
    latencyMs,
    // One window at full speed plus the time to evaluate, cut the drive and coast.
    reaction: reach(windowMs + latencyMs),
    // A door that slows gradually can pass one window just above the threshold and only trip on the
    // next, which it covers at up to the threshold speed: (1 + fraction) windows at full speed bound it.
    slowingWorstCase: reach((1 + fraction) * windowMs + latencyMs),
    warnings: [],
  };
  result.warnings = stallWarnings(result, fraction);
  return result;
}

/** Warnings for a stall check that is noisy, too lax or prone to nuisance trips. */
export function stallWarnings(r: StallResult, fraction: number): DriveWarning[] {
  const out: DriveWarning[] = [];
  if (r.nominalCountsPerWindow < 1) {
    out.push({
      code: "window-empty",
      severity: "bad",
      message: `Even at full speed a window holds only ${f(r.nominalCountsPerWindow, 3)} counts: the check cannot tell running from stalled. Lengthen the window.`,
      basis: "from the inputs",
    });
  } else if (r.thresholdCountsPerWindow < MIN_THRESHOLD_COUNTS) {
    out.push({
      code: "window-short",
      severity: "warn",
      message: `At the threshold a window holds ${f(r.thresholdCountsPerWindow, 3)} counts (fewer than ${MIN_THRESHOLD_COUNTS}): one count more or less moves the reading by ${f(r.quantisationShare * 100, 2)} %, so the check is noisy. Lengthen the window or use finer decoding.`,
      basis: COMMON_PRACTICE,
    });
  }
  if (fraction < FRACTION_LOW) {
    out.push({
      code: "fraction-low",
      severity: "bad",
      message: `A threshold of ${f(fraction * 100, 3)} % of nominal speed is lax: a door pressing on a bird can keep moving faster than that and never trip the check.`,
      basis: COMMON_PRACTICE,
    });
  } else if (fraction > FRACTION_HIGH) {
    out.push({
      code: "fraction-high",
      severity: "warn",
      message: `A threshold of ${f(fraction * 100, 3)} % of nominal speed is close to normal running: supply sag, cold grease or a fuller spool can trip it without an obstacle.`,
      basis: COMMON_PRACTICE,
    });
  }
  return out;
}
