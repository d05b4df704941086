// Drive parameters suggested from a calibration run, each with the reason in words and numbers, and
// the calibration as the safety rules take it. Suggestions are a starting point for a reviewed
// parameter set, checked on the door before use.
import { computeStall, FRACTION_HIGH } from "@/lib/drive/stall";
import { COMMON_PRACTICE, TRAPPING_CAUTION, type DriveWarning } from "@/lib/drive/warnings";
import { num } from "@/lib/profiles/safety/format";
import { BLANKING_MAX_TRAVEL_SHARE, STALL_WINDOW_LONG_MS } from "@/lib/profiles/safety/limits";
import type { Calibration } from "@/lib/profiles/safety/types";
import type { RunAnalysis } from "./analyse";

/** About half the running speed (common practice, as the parameter schema says). */
export const DEFAULT_STALL_FRACTION = 0.5;
/** Close travel stops this share short of the measured travel (common practice). */
export const DEFAULT_CLOSE_MARGIN_SHARE = 0.005;
/** Counts a stall window should hold at the threshold: ±1 count is then at most 12.5 % (common practice). */
export const WINDOW_MIN_COUNTS = 8;
export const WINDOW_STEP_MS = 10;
/** Shorter windows gain little reaction time and react to gear ripple (common practice). */
export const WINDOW_MIN_MS = 50;
export const WINDOW_MAX_MS = STALL_WINDOW_LONG_MS;
export const BLANKING_STEP_MS = 50;
/** Timeout = travel time × 2, at least travel + 2 s, rounded up to 1 s (common practice). */
export const TIMEOUT_FACTOR = 2;
export const TIMEOUT_MIN_EXTRA_MS = 2000;
export const TIMEOUT_STEP_MS = 1000;

// The parameter schema's ranges (schemas/door-params-v2.schema.json).
const RANGE = {
  closeTravelCounts: [100, 200_000],
  travelTimeoutMs: [1000, 300_000],
  "stall.thresholdCps": [10, 20_000],
  "stall.windowMs": [10, 2000],
  "stall.startupBlankingMs": [0, 5000],
} as const;

export type SuggestedParameter = keyof typeof RANGE;

export type Suggestion = { parameter: SuggestedParameter; path: string; value: number; unit: "counts" | "counts/s" | "ms"; reason: string; basis: string };

export type SuggestOptions = { stallFraction?: number; closeMarginShare?: number };

export type SuggestedParameters = {
  closeTravelCounts: number;
  travelTimeoutMs: number;
  stall: { thresholdCps: number; windowMs: number; startupBlankingMs: number };
  suggestions: Suggestion[];
  warnings: DriveWarning[];
  caution: string;
};

const up = (x: number, step: number) => Math.ceil(x / step - 1e-9) * step;
const sec = (ms: number) => `${num(ms / 1000, 2)} s`;

/** Close travel, stall threshold, window and blanking, and travel timeout for the door the run was recorded on. */
export function suggestParameters(a: RunAnalysis, opts: SuggestOptions = {}): SuggestedParameters {
  const fraction = opts.stallFraction ?? DEFAULT_STALL_FRACTION;
  const marginShare = opts.closeMarginShare ?? DEFAULT_CLOSE_MARGIN_SHARE;
  if (!(fraction > 0 && fraction < 1)) throw new RangeError(`stallFraction must be between 0 and 1, got ${fraction}`);
  if (!(marginShare >= 0 && marginShare < 0.02)) throw new RangeError(`closeMarginShare must be at least 0 and below 0.02, got ${marginShare}`);
  const warnings: DriveWarning[] = [];
  const out: Suggestion[] = [];
  const push = (parameter: SuggestedParameter, unit: Suggestion["unit"], raw: number, reason: string, basis = COMMON_PRACTICE) => {
    const [min, max] = RANGE[parameter];
    const value = Math.min(max, Math.max(min, raw));
    const clamped = value === raw ? "" : ` That is outside the parameter's range of ${num(min)}–${num(max)}, so ${num(value)} is suggested: check the run.`;
    if (clamped) warnings.push({ code: "out-of-range", severity: "bad", message: `${parameter}: ${num(raw)} is outside ${num(min)}–${num(max)}.`, basis: "from the inputs" });
    out.push({ parameter, path: `/${parameter.replace(".", "/")}`, value, unit, reason: reason + clamped, basis });
    return value;
  };

  const full = a.fullTravelCounts;
  const margin = Math.round(full * marginShare);
  const close = push(
    "closeTravelCounts",
    "counts",
    full - margin,
    `The run measured a full travel of ${num(full)} counts; stopping ${num(margin)} counts (${num(marginShare * 100, 2)} %) short of it, at ${num(full - margin)} counts, keeps the motor from driving past the closed end and slackening the cord.`,
  );

  const nominal = a.nominalVelocityCps;
  const threshold = push(
    "stall.thresholdCps",
    "counts/s",
    Math.max(10, Math.round((fraction * nominal) / 10) * 10),
    `${num(fraction * 100, 1)} % of the door's ${a.nominalDirection} speed of ${num(nominal)} counts/s measured on this run, rounded to 10 counts/s. About half the running speed stops a door pressing on an obstacle without tripping on supply sag or cold grease.`,
  );

  const other = a.nominalDirection === "closing" ? a.velocityCps.opening : a.velocityCps.closing;
  if (other !== null && threshold > FRACTION_HIGH * other) {
    const otherDirection = a.nominalDirection === "closing" ? "opening" : "closing";
    warnings.push({
      code: "threshold-other-direction",
      severity: "bad",
      message: `The ${num(threshold)} counts/s threshold is ${num((threshold / other) * 100)} % of the ${num(other)} counts/s the door runs at while ${otherDirection}: the check may trip on every ${otherDirection === "opening" ? "opening" : "close"}. Find out why the door is so much slower that way before using it.`,
      basis: COMMON_PRACTICE,
    });
  }

  const neededMs = (WINDOW_MIN_COUNTS * 1000) / threshold;
  const windowRaw = Math.min(WINDOW_MAX_MS, Math.max(WINDOW_MIN_MS, up(neededMs, WINDOW_STEP_MS)));
  const stall = computeStall({ nominalCps: nominal, fraction: threshold / nominal, windowMs: windowRaw, latencyMs: 0, rampMs: a.rampMs });
  const held = `${num(stall.thresholdCountsPerWindow, 1)} counts at the threshold`;
  const windowWhy =
    neededMs > WINDOW_MAX_MS
      ? `At ${num(threshold)} counts/s a window needs ${num(neededMs)} ms to hold ${WINDOW_MIN_COUNTS} counts, longer than the ${WINDOW_MAX_MS} ms a stall check should take to react; ${WINDOW_MAX_MS} ms holds only ${held}.`
      : neededMs > WINDOW_MIN_MS
        ? `At ${num(threshold)} counts/s a window needs ${num(neededMs, 1)} ms to hold ${WINDOW_MIN_COUNTS} counts (one count more or less is then at most ${num(100 / WINDOW_MIN_COUNTS, 1)} %); rounded up to ${WINDOW_STEP_MS} ms that is ${windowRaw} ms, holding ${held}.`
        : `At ${num(threshold)} counts/s ${WINDOW_MIN_COUNTS} counts take only ${num(neededMs, 1)} ms, so the shortest suggested window, ${WINDOW_MIN_MS} ms, is used: it holds ${held} and reacts quickly.`;
  if (neededMs > WINDOW_MAX_MS) {
    warnings.push({ code: "window-few-counts", severity: "warn", message: `Even a ${WINDOW_MAX_MS} ms stall window holds only ${held}: the check is coarse. Use finer encoder decoding or a higher-PPR encoder.`, basis: COMMON_PRACTICE });
  }
  const windowMs = push("stall.windowMs", "ms", windowRaw, windowWhy);
  warnings.push(...stall.warnings);

  const blankingRaw = up(a.rampMs + windowMs, BLANKING_STEP_MS);
  const blanking = push(
    "stall.startupBlankingMs",
    "ms",
    blankingRaw,
    `The door took ${num(a.rampMs)} ms from rest to within 5 % of its running speed (the longer ramp of the run); one ${num(windowMs)} ms window more is ${num(a.rampMs + windowMs)} ms, rounded up to ${BLANKING_STEP_MS} ms. It passes the threshold speed after about ${num(stall.timeToThresholdMs)} ms, so the first judged window starts at full speed.`,
  );
  const travel = a.travelTimeMs.longest;
  if (blanking > BLANKING_MAX_TRAVEL_SHARE * travel) {
    warnings.push({ code: "blanking-share", severity: "warn", message: `Start-up blanking of ${num(blanking)} ms is more than ${num(BLANKING_MAX_TRAVEL_SHARE * 100)} % of the ${sec(travel)} travel: the stall check is off for much of each run.`, basis: COMMON_PRACTICE });
  }

  const doubled = TIMEOUT_FACTOR * travel;
  const plus = travel + TIMEOUT_MIN_EXTRA_MS;
  const timeoutWhy =
    doubled >= plus
      ? `The longest movement on the run took ${sec(travel)} (${a.travelTimeMs.longestDirection}); ${TIMEOUT_FACTOR} × that is ${sec(doubled)}, rounded up to a whole second, leaving room for a cold or low-voltage drive while stopping a jammed door within seconds.`
      : `The longest movement on the run took ${sec(travel)} (${a.travelTimeMs.longestDirection}); ${TIMEOUT_FACTOR} × that is only ${sec(doubled)}, so the travel time plus ${sec(TIMEOUT_MIN_EXTRA_MS)}, ${sec(plus)}, rounded up to a whole second, is used.`;
  const timeout = push("travelTimeoutMs", "ms", up(Math.max(doubled, plus), TIMEOUT_STEP_MS), timeoutWhy);

  return { closeTravelCounts: close, travelTimeoutMs: timeout, stall: { thresholdCps: threshold, windowMs, startupBlankingMs: blanking }, suggestions: out, warnings, caution: TRAPPING_CAUTION };
}

/** The run as the safety rules' calibration: full travel, nominal velocity and the longest travel time, rounded. */
export function calibrationContext(a: RunAnalysis): Calibration {
  return { fullTravelCounts: Math.round(a.fullTravelCounts), nominalVelocityCps: Math.round(a.nominalVelocityCps), travelTimeMs: Math.round(a.travelTimeMs.longest) };
}
