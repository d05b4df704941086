// What a calibration run says about the door: its full travel, running speed, ramp and travel times.
//
// Convention (the firmware's): counts increase while the door closes, from the open end stop. The
// open end is told by the open sensor when the run has one; without it the lower end of the counts is
// taken as the open end. A travel time runs from the last sample within 2 counts of one end to the
// first within 2 counts of the other, so it reads a few tens of milliseconds short of the motor's
// on-time (the first and last counts of the ramps); the timeout suggested from it doubles it anyway.
import { num } from "@/lib/profiles/safety/format";
import type { CalibrationSample } from "./csv";
import { deriveVelocities, median, quantile, thinSeries, type SeriesPoint } from "./series";

/**
 * Samples at or above this share of the peak speed in their direction are steady running; the rest
 * are ramps (common practice). Per direction, as a door may open much slower than it closes.
 */
export const STEADY_SHARE = 0.8;
/** The peak is this quantile of speeds, not the maximum, so a single glitch cannot set it. */
export const PEAK_QUANTILE = 0.99;
/** A ramp ends when the door is within 5 % of its running speed (the usual 5 % settling band of control engineering). */
export const SETTLED_SHARE = 0.95;
/** An encoder resting on an edge flickers by a count; within this many counts of an end the door is at that end. */
export const END_TOLERANCE_COUNTS = 2;
/** Fewer counts than this end to end is not a door movement (the schema's smallest close travel). */
export const MIN_TRAVEL_COUNTS = 100;
/** Open-sensor edges farther than this share of the travel from the open end suggest a misplaced sensor (common practice). */
export const SENSOR_EDGE_SHARE = 0.02;
/** Leaving an end by more than this share of the travel and coming back is an abandoned movement worth a remark. */
export const EXCURSION_SHARE = 0.05;
/** Closing and opening speeds differing by more than this share are worth a remark (common practice). */
export const DIRECTION_SPEED_SPREAD = 0.15;
export const SERIES_MAX_POINTS = 1000;

export type Direction = "closing" | "opening";

export type Move = {
  direction: Direction;
  /** Last sample at the starting end, and first sample at the other end. */
  leftEndMs: number;
  reachedEndMs: number;
  travelTimeMs: number;
  /** Median speed (counts/s, positive) of the move's steady samples. */
  steadyVelocityCps: number | null;
  /** From leaving the end until first within 5 % of the steady speed. */
  rampMs: number | null;
};

export type RunAnalysis = {
  sampleCount: number;
  durationMs: number;
  velocitySource: "velocity column" | "derived from counts";
  closingCountsUp: boolean;
  directionSource: "open sensor" | "convention";
  openEndCounts: number;
  closedEndCounts: number;
  fullTravelCounts: number;
  /** Counts from the open end at which the open sensor switched, when the run has the sensor. */
  sensorEdgeCounts: number[];
  /** Peak speed (counts/s, positive) per direction, and the speed from which running counts as steady. */
  peakVelocityCps: Record<Direction, number | null>;
  steadyFromCps: Record<Direction, number | null>;
  velocityCps: Record<Direction, number | null>;
  /** The closing speed when measured (trapping happens while closing), else the opening speed. */
  nominalVelocityCps: number;
  nominalDirection: Direction;
  moves: Move[];
  /** Longest complete move per direction, and over both. */
  travelTimeMs: Record<Direction, number | null> & { longest: number; longestDirection: Direction };
  /** Longest ramp over the complete moves. */
  rampMs: number;
  series: SeriesPoint[];
  warnings: string[];
};

export type RunAnalysisResult = { ok: true; analysis: RunAnalysis } | { ok: false; errors: string[] };

const s1 = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

/** Travel, speeds, ramps and travel times of a run that starts at rest at one end and runs to the other (and back). */
export function analyseRun(samples: readonly CalibrationSample[]): RunAnalysisResult {
  if (samples.length < 3) return { ok: false, errors: ["the run needs at least 3 samples"] };
  const t = samples.map((s) => s.tMs);
  const c = samples.map((s) => s.counts);
  // A loop, not Math.min(...c): 200,000 arguments overflow the call stack.
  let lo = c[0]!;
  let hi = c[0]!;
  for (const x of c) {
    if (x < lo) lo = x;
    if (x > hi) hi = x;
  }
  if (hi - lo < MIN_TRAVEL_COUNTS) {
    return { ok: false, errors: [`the counts span only ${hi - lo} (from ${lo} to ${hi}): the door did not move from one end to the other`] };
  }
  const warnings: string[] = [];
  const dir = detectDirection(samples, lo, hi, warnings);
  // Both extremes are "ends", so the run always holds at least one complete move between them.
  const spans = findMoves(t, c, lo, hi, warnings);
  const atEnd = (x: number) => x <= lo + END_TOLERANCE_COUNTS || x >= hi - END_TOLERANCE_COUNTS;
  if (!atEnd(c[0]!) || !atEnd(c[c.length - 1]!)) {
    warnings.push(`The run ${atEnd(c[0]!) ? "ends" : "starts"} between the end stops: record from rest at an end stop to rest at an end stop, or the travel measured may fall short of the door's.`);
  }

  const { v, source } = velocities(samples, t, c, spans, warnings);
  const directionOf = (m: Span): Direction => (m.up === dir.closingCountsUp ? "closing" : "opening");
  const speedsBy: Record<Direction, number[]> = { closing: [], opening: [] };
  for (const m of spans) for (let i = m.from; i <= m.to; i++) speedsBy[directionOf(m)].push(Math.abs(v[i]!));
  const peakOf = (d: Direction) => quantile(speedsBy[d].sort((a, b) => a - b), PEAK_QUANTILE);
  const peak = { closing: peakOf("closing"), opening: peakOf("opening") };
  const steadyFrom = { closing: peak.closing === null ? null : STEADY_SHARE * peak.closing, opening: peak.opening === null ? null : STEADY_SHARE * peak.opening };

  const moves: Move[] = [];
  const steadyBy: Record<Direction, number[]> = { closing: [], opening: [] };
  for (const m of spans) {
    const direction = directionOf(m);
    const sign = m.up ? 1 : -1;
    const from = steadyFrom[direction]!;
    const steady: number[] = [];
    for (let i = m.from; i <= m.to; i++) if (sign * v[i]! >= from) steady.push(sign * v[i]!);
    for (const x of steady) steadyBy[direction].push(x);
    const speed = median(steady);
    let rampMs: number | null = null;
    if (speed !== null) {
      for (let i = m.from; i <= m.to; i++) {
        if (sign * v[i]! >= SETTLED_SHARE * speed) {
          rampMs = t[i]! - t[m.from]!;
          break;
        }
      }
    }
    moves.push({ direction, leftEndMs: t[m.from]!, reachedEndMs: t[m.to]!, travelTimeMs: t[m.to]! - t[m.from]!, steadyVelocityCps: speed, rampMs });
  }

  const velocityCps = { closing: median(steadyBy.closing), opening: median(steadyBy.opening) };
  const nominalDirection: Direction = velocityCps.closing !== null ? "closing" : "opening";
  const nominal = velocityCps[nominalDirection];
  if (nominal === null || nominal <= 0) return { ok: false, errors: ["the door never reached a steady running speed"] };
  if (velocityCps.closing !== null && velocityCps.opening !== null) {
    const spread = Math.abs(velocityCps.closing - velocityCps.opening) / Math.max(velocityCps.closing, velocityCps.opening);
    if (spread > DIRECTION_SPEED_SPREAD) {
      warnings.push(`The door closes at ${num(velocityCps.closing)} counts/s and opens at ${num(velocityCps.opening)} counts/s, ${Math.round(spread * 100)} % apart: the stall threshold follows the closing speed, so check it does not trip while opening.`);
    }
  }
  const longestBy = (d: Direction) => {
    const times = moves.filter((m) => m.direction === d).map((m) => m.travelTimeMs);
    return times.length ? times.reduce((a, b) => Math.max(a, b)) : null;
  };
  const travelTimeMs = { closing: longestBy("closing"), opening: longestBy("opening") };
  for (const d of ["closing", "opening"] as const) {
    if (travelTimeMs[d] === null) warnings.push(`The run has no complete ${d} movement: record the door closing and opening so both travel times are measured.`);
  }
  const longest = moves.reduce((a, b) => (b.travelTimeMs > a.travelTimeMs ? b : a));
  const ramps = moves.map((m) => m.rampMs).filter((r): r is number => r !== null);

  const openEnd = dir.closingCountsUp ? lo : hi;
  const full = hi - lo;
  const sensorEdgeCounts = sensorEdges(samples).map((e) => Math.abs(e - openEnd));
  const far = sensorEdgeCounts.filter((d) => d > SENSOR_EDGE_SHARE * full);
  if (far.length) {
    warnings.push(`The open sensor switched ${num(far.reduce((a, b) => Math.max(a, b)))} counts from the open end (more than ${SENSOR_EDGE_SHARE * 100} % of the ${num(full)}-count travel): check the sensor's position and its target.`);
  }

  const points = samples.map((s, i) => ({ tMs: s.tMs, counts: s.counts, velocityCps: v[i]! }));
  return {
    ok: true,
    analysis: {
      sampleCount: samples.length,
      durationMs: t[t.length - 1]! - t[0]!,
      velocitySource: source,
      closingCountsUp: dir.closingCountsUp,
      directionSource: dir.source,
      openEndCounts: openEnd,
      closedEndCounts: dir.closingCountsUp ? hi : lo,
      fullTravelCounts: full,
      sensorEdgeCounts,
      peakVelocityCps: peak,
      steadyFromCps: steadyFrom,
      velocityCps,
      nominalVelocityCps: nominal,
      nominalDirection,
      moves,
      travelTimeMs: { ...travelTimeMs, longest: longest.travelTimeMs, longestDirection: longest.direction },
      rampMs: ramps.reduce((a, b) => Math.max(a, b), 0),
      series: thinSeries(points, SERIES_MAX_POINTS),
      warnings,
    },
  };
}

/**
 * The velocity column when it follows the counts, else velocity derived from them: a controller that
 * logs speed without sign (or with the opposite sign) would otherwise hide one direction's running.
 */
function velocities(samples: readonly CalibrationSample[], t: number[], c: number[], spans: Span[], warnings: string[]): { v: number[]; source: RunAnalysis["velocitySource"] } {
  if (!samples.every((s) => s.velocityCps !== undefined)) return { v: deriveVelocities(t, c), source: "derived from counts" };
  const v = samples.map((s) => s.velocityCps!);
  let inside = 0;
  let agreeing = 0;
  for (const m of spans) {
    for (let i = m.from; i <= m.to; i++) {
      inside++;
      if ((m.up ? v[i]! : -v[i]!) > 0) agreeing++;
    }
  }
  if (agreeing >= inside / 2) return { v, source: "velocity column" };
  warnings.push(`The velocity column has the direction of the counts in only ${agreeing} of ${inside} samples while the door moves (no sign, or the opposite sign?): velocity is derived from counts and time instead.`);
  return { v: deriveVelocities(t, c), source: "derived from counts" };
}

/** Which way counts run while closing: from the end where the open sensor is on, else by convention. */
function detectDirection(samples: readonly CalibrationSample[], lo: number, hi: number, warnings: string[]): { closingCountsUp: boolean; source: "open sensor" | "convention" } {
  if (!samples.every((s) => s.openSensor !== undefined)) return { closingCountsUp: true, source: "convention" };
  const shareOn = (atEnd: (c: number) => boolean) => {
    const at = samples.filter((s) => atEnd(s.counts));
    return at.length ? at.filter((s) => s.openSensor === 1).length / at.length : 0;
  };
  const onLo = shareOn((c) => c <= lo + END_TOLERANCE_COUNTS);
  const onHi = shareOn((c) => c >= hi - END_TOLERANCE_COUNTS);
  if (onLo > 0.5 && onHi < 0.5) return { closingCountsUp: true, source: "open sensor" };
  if (onHi > 0.5 && onLo < 0.5) {
    warnings.push(`The open sensor is on at the high end of the counts (${hi}), so the encoder counts down while closing; the firmware counts up from the open end stop. Swap the encoder's A and B channels and calibrate again.`);
    return { closingCountsUp: false, source: "open sensor" };
  }
  const seen = samples.some((s) => s.openSensor === 1) ? "did not tell one end from the other" : "was never on";
  warnings.push(`The open sensor ${seen}: check its wiring, position and the open end-stop active level. The lower counts are taken as the open end.`);
  return { closingCountsUp: true, source: "convention" };
}

/** Complete moves as sample index spans: the last sample at one end to the first at the other. */
type Span = { from: number; to: number; up: boolean };

function findMoves(t: readonly number[], c: readonly number[], lo: number, hi: number, warnings: string[]): Span[] {
  const tol = END_TOLERANCE_COUNTS;
  const moves: Span[] = [];
  let end: "lo" | "hi" | null = null;
  let at = -1;
  let farthest = 0;
  for (let i = 0; i < c.length; i++) {
    const x = c[i]!;
    const here = x <= lo + tol ? "lo" : x >= hi - tol ? "hi" : null;
    if (here === null) {
      if (end !== null) farthest = Math.max(farthest, Math.abs(x - (end === "lo" ? lo : hi)));
      continue;
    }
    if (end !== null && here !== end) moves.push({ from: at, to: i, up: here === "hi" });
    else if (end !== null && farthest > EXCURSION_SHARE * (hi - lo)) {
      warnings.push(`The door left an end stop at ${s1(t[at]!)} and came back to it at ${s1(t[i]!)} without reaching the other end (a stall or a reversal?); that movement is not used.`);
    }
    end = here;
    at = i;
    farthest = 0;
  }
  return moves;
}

/** Counts at each change of the open sensor (the mean of the two samples either side). */
function sensorEdges(samples: readonly CalibrationSample[]): number[] {
  const out: number[] = [];
  for (let i = 1; i < samples.length; i++) {
    const a = samples[i - 1]!;
    const b = samples[i]!;
    if (a.openSensor !== undefined && b.openSensor !== undefined && a.openSensor !== b.openSensor) out.push((a.counts + b.counts) / 2);
  }
  return out;
}
