// The travel timeout and the close travel against the door's measured or modelled travel.
import { num, pct, sec } from "./format";
import * as L from "./limits";
import { countsPerMm, expectedTravelTime, modelTravel } from "./reference";
import { finding } from "./rules";
import type { RuleCheck } from "./types";

/** RL-NO-REFERENCE: neither a calibration nor a door model, so the drive values go unchecked. */
export const checkNoReference: RuleCheck = ({ ctx }) =>
  ctx.calibration || ctx.doorModel
    ? []
    : [
        finding(
          "RL-NO-REFERENCE",
          "warning",
          ["/stall/thresholdCps", "/travelTimeoutMs", "/closeTravelCounts"],
          "No calibration run and no door model: the stall threshold, travel timeout and close travel could not be checked against the door's speed and travel. Calibrate the door on site and check again.",
        ),
      ];

/** RL-TIMEOUT-MARGIN: the timeout between 1.2 × and 4 × the expected travel time. */
export const checkTimeoutMargin: RuleCheck = ({ doc, ctx }) => {
  const travel = expectedTravelTime(ctx, doc.closeTravelCounts);
  if (!travel) return [];
  const timeout = doc.travelTimeoutMs;
  const factor = timeout / travel.ms;
  const lead = `Travel timeout ${sec(timeout)} is ${num(factor, 2)} × the expected travel time of ${sec(travel.ms)} (${travel.source})`;
  const detail = { timeoutMs: timeout, expectedMs: travel.ms, factor };
  if (factor < L.TIMEOUT_MIN_FACTOR) {
    const min = Math.ceil((travel.ms * L.TIMEOUT_MIN_FACTOR) / 100) * 100;
    return [
      finding("RL-TIMEOUT-MARGIN", "error", ["/travelTimeoutMs"], `${lead}; under ${L.TIMEOUT_MIN_FACTOR} × a cold or low-voltage drive stops before the end and raises an alarm. Set at least ${sec(min)}.`, detail),
    ];
  }
  if (factor > L.TIMEOUT_MAX_FACTOR) {
    return [
      finding(
        "RL-TIMEOUT-MARGIN",
        "warning",
        ["/travelTimeoutMs"],
        `${lead}; over ${L.TIMEOUT_MAX_FACTOR} × a stuck or jammed door keeps pulling for ${sec(timeout)} before it is stopped. Stall detection is a second line of defence, not a guarantee.`,
        detail,
      ),
    ];
  }
  return [];
};

/** RL-CLOSE-TRAVEL: close travel no more than the calibrated travel and not far short of it. */
export const checkCloseTravel: RuleCheck = ({ doc, ctx }) => {
  const close = doc.closeTravelCounts;
  const paths = ["/closeTravelCounts"];
  const perMm = countsPerMm(ctx);
  const mm = (counts: number) => (perMm ? ` (about ${num(counts / perMm)} mm)` : "");
  if (ctx.calibration) {
    const full = ctx.calibration.fullTravelCounts;
    const detail = { closeTravelCounts: close, fullTravelCounts: full, calibrated: true };
    if (close > full) {
      return [
        finding(
          "RL-CLOSE-TRAVEL",
          "error",
          paths,
          `Close travel ${num(close)} counts is ${num(close - full)} counts${mm(close - full)} more than the calibrated full travel of ${num(full)} counts: the motor drives past the closed end, slackening the cord until it winds back the other way.`,
          detail,
        ),
      ];
    }
    if (close < full * (1 - L.CLOSE_SHORT_OF_CALIBRATED)) {
      return [
        finding(
          "RL-CLOSE-TRAVEL",
          "warning",
          paths,
          `Close travel ${num(close)} counts stops ${num(full - close)} counts${mm(full - close)} short of the calibrated full travel of ${num(full)} counts (${pct((full - close) / full)}, more than ${pct(L.CLOSE_SHORT_OF_CALIBRATED)}): the door stops above the sill and leaves a gap a fox can open.`,
          detail,
        ),
      ];
    }
    return [];
  }
  if (!ctx.doorModel) return [];
  const model = modelTravel(ctx.doorModel);
  const ratio = close / model.counts;
  const lead = `No calibration yet: close travel ${num(close)} counts is ${pct(Math.abs(ratio - 1))}`;
  const detail = { closeTravelCounts: close, modelCounts: model.counts, calibrated: false };
  const about = `the door model's ${num(model.counts)} counts for ${num(ctx.doorModel.doorTravelMm)} mm of travel`;
  if (ratio > 1 + L.CLOSE_MODEL_TOLERANCE) {
    return [finding("RL-CLOSE-TRAVEL", "warning", paths, `${lead} more than ${about}: it may drive past the closed end. Calibrate the door before approving.`, detail)];
  }
  if (ratio < 1 - L.CLOSE_MODEL_TOLERANCE) {
    return [finding("RL-CLOSE-TRAVEL", "warning", paths, `${lead} less than ${about}: the door may stop short and leave a gap. Calibrate the door before approving.`, detail)];
  }
  return [];
};
