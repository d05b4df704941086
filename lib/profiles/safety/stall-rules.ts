// The stall check against the door's running speed, its window and its start-up blanking.
import { computeStall } from "@/lib/drive/stall";
import { num, pct, sec } from "./format";
import * as L from "./limits";
import { countsPerMm, expectedTravelTime, nominalVelocity } from "./reference";
import { finding } from "./rules";
import type { RuleCheck, SafetyFinding } from "./types";

const CAUTION = "Stall detection is a second line of defence, not a guarantee.";

/** RL-STALL-FRACTION: the threshold as a share of the nominal velocity. */
export const checkStallFraction: RuleCheck = ({ doc, ctx }) => {
  const ref = nominalVelocity(ctx);
  if (!ref) return [];
  const t = doc.stall.thresholdCps;
  const share = t / ref.nominalCps;
  const lead = `Stall threshold ${num(t)} counts/s is ${pct(share)} of the nominal ${num(ref.nominalCps)} counts/s (${ref.nominalSource})`;
  const detail = { thresholdCps: t, nominalCps: ref.nominalCps, share, calibrated: ref.calibrated };
  const paths = ["/stall/thresholdCps"];
  if (share < L.STALL_FRACTION_ERROR) {
    return [finding("RL-STALL-FRACTION", "error", paths, `${lead}; below ${pct(L.STALL_FRACTION_ERROR)} the door keeps pressing on an obstacle. ${CAUTION}`, detail)];
  }
  if (share >= L.STALL_FRACTION_MAX) {
    return [finding("RL-STALL-FRACTION", "error", paths, `${lead}; at or above the running speed the check trips on every run and the door never completes a movement.`, detail)];
  }
  if (share > L.STALL_FRACTION_WARN) {
    return [finding("RL-STALL-FRACTION", "warning", paths, `${lead}; above ${pct(L.STALL_FRACTION_WARN)} supply sag, cold grease or a fuller spool trip it without an obstacle.`, detail)];
  }
  return [];
};

/** RL-STALL-WINDOW: enough counts per window at the threshold, and a window short enough to react. */
export const checkStallWindow: RuleCheck = ({ doc, ctx }) => {
  const { thresholdCps, windowMs } = doc.stall;
  const out: SafetyFinding[] = [];
  const perWindow = (thresholdCps * windowMs) / 1000;
  if (perWindow < L.STALL_MIN_COUNTS_PER_WINDOW) {
    out.push(
      finding(
        "RL-STALL-WINDOW",
        "warning",
        ["/stall/windowMs", "/stall/thresholdCps"],
        `At the threshold of ${num(thresholdCps)} counts/s a ${num(windowMs)} ms window holds ${num(perWindow, 2)} counts, fewer than ${L.STALL_MIN_COUNTS_PER_WINDOW}: one count more or less moves the reading by ${pct(1 / perWindow)}, so the check is noisy. Lengthen the window.`,
        { countsPerWindow: perWindow },
      ),
    );
  }
  if (windowMs > L.STALL_WINDOW_LONG_MS) {
    const ref = nominalVelocity(ctx);
    const perMm = countsPerMm(ctx);
    const share = ref ? Math.min(thresholdCps / ref.nominalCps, 1) : 1;
    // A door slowing gradually can pass one window just above the threshold and trip only on the next.
    const worstMs = (1 + share) * windowMs;
    const distance = ref && perMm ? ` and move up to ${num((ref.nominalCps * worstMs) / 1000 / perMm)} mm` : "";
    out.push(
      finding(
        "RL-STALL-WINDOW",
        "warning",
        ["/stall/windowMs"],
        `A ${num(windowMs)} ms stall window is longer than ${L.STALL_WINDOW_LONG_MS} ms: a door pressing on an obstacle can run for up to ${num(worstMs)} ms${distance} before the motor is cut. ${CAUTION}`,
        { windowMs, worstCaseMs: worstMs },
      ),
    );
  }
  return out;
};

/** RL-STALL-BLANKING: the unguarded start of each run, and blanking too short to get up to speed. */
export const checkStallBlanking: RuleCheck = ({ doc, ctx }) => {
  const { startupBlankingMs: blank, windowMs, thresholdCps } = doc.stall;
  const out: SafetyFinding[] = [];
  const paths = ["/stall/startupBlankingMs"];
  const ref = nominalVelocity(ctx);
  const travel = expectedTravelTime(ctx, doc.closeTravelCounts);
  const perMm = countsPerMm(ctx);
  const unguarded = ref && perMm ? `, about ${num((ref.nominalCps * blank) / 1000 / perMm)} mm of travel` : "";
  if (blank > L.BLANKING_MAX_MS) {
    out.push(finding("RL-STALL-BLANKING", "warning", paths, `Start-up blanking of ${sec(blank)} is longer than ${sec(L.BLANKING_MAX_MS)}: the stall check is off for the first ${sec(blank)} of every run${unguarded}. ${CAUTION}`, { blankingMs: blank }));
  } else if (travel && blank > L.BLANKING_MAX_TRAVEL_SHARE * travel.ms) {
    out.push(
      finding(
        "RL-STALL-BLANKING",
        "warning",
        paths,
        `Start-up blanking of ${sec(blank)} is ${pct(blank / travel.ms)} of the ${sec(travel.ms)} travel time (${travel.source}), more than ${pct(L.BLANKING_MAX_TRAVEL_SHARE)}: the stall check is off for much of the run${unguarded}. ${CAUTION}`,
        { blankingMs: blank, travelTimeMs: travel.ms },
      ),
    );
  }
  if (ref) {
    const share = thresholdCps / ref.nominalCps;
    if (share > 0 && share < 1) {
      const needed = computeStall({ nominalCps: ref.nominalCps, fraction: share, windowMs, latencyMs: 0 });
      if (blank < needed.blankingMs) {
        const reopen = doc.stall.reopenOnStall ? " With reopening after a stall the door would then never close." : "";
        out.push(
          finding(
            "RL-STALL-BLANKING",
            "warning",
            paths,
            `Start-up blanking of ${num(blank)} ms is shorter than the ${num(needed.blankingMs)} ms the door needs to reach the threshold speed (${pct(share)} of an assumed ${num(needed.rampMs)} ms start-up ramp) plus one ${num(windowMs)} ms window: the check may trip at every start.${reopen}`,
            { blankingMs: blank, neededMs: needed.blankingMs, rampAssumed: needed.rampAssumed },
          ),
        );
      }
    }
  }
  return out;
};

/** RL-STALL-REOPEN: after a stall while closing, the door should let go of what it caught. */
export const checkStallReopen: RuleCheck = ({ doc }) =>
  doc.stall.reopenOnStall
    ? []
    : [
        finding(
          "RL-STALL-REOPEN",
          "warning",
          ["/stall/reopenOnStall"],
          `Reopening after a stall is off: a door that stalls on a bird while closing only stops, and may rest on it until someone comes. ${CAUTION}`,
        ),
      ];
