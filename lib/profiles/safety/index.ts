// Safety rules a JSON Schema cannot express: the drive values against the door, the schedule against
// the site's sun, the clock against its source. An error blocks approval; a warning needs an
// acknowledgement with a reason (handled elsewhere).
import { wallTime } from "@/lib/sun/time-zone";
import { migrateV1toV2 } from "../migrate";
import { isValidParams, type DoorParamsV2 } from "../schemas";
import { checkNoSite, checkRtcOnly, checkTimeSourceRange, checkTimeZone } from "./clock-rules";
import { pathsFor } from "./paths";
import { checkHomingOff, checkPowerUpOpen } from "./power-rules";
import { SAFETY_RULES } from "./rules";
import { checkFixedOrder, checkScheduleGrid } from "./schedule-rules";
import { checkStallBlanking, checkStallFraction, checkStallReopen, checkStallWindow } from "./stall-rules";
import { checkSunSchedule } from "./sun-rules";
import { checkCloseTravel, checkNoReference, checkTimeoutMargin } from "./travel-rules";
import type { RuleCheck, SafetyContext, SafetyFinding, SafetyRule } from "./types";

export type { Calibration, DoorModel, SafetyContext, SafetyFinding, SafetyRule, Severity, Site } from "./types";
export { SAFETY_RULES };

const CHECKS: readonly RuleCheck[] = [
  checkNoReference,
  checkStallFraction,
  checkStallWindow,
  checkStallBlanking,
  checkStallReopen,
  checkTimeoutMargin,
  checkCloseTravel,
  checkScheduleGrid,
  checkFixedOrder,
  checkNoSite,
  checkTimeZone,
  checkSunSchedule,
  checkTimeSourceRange,
  checkRtcOnly,
  checkPowerUpOpen,
  checkHomingOff,
];

function asV2(version: 1 | 2, params: unknown): DoorParamsV2 {
  if (version === 1) return migrateV1toV2(params);
  if (!isValidParams(2, params)) throw new TypeError("checkSafety needs a schema-valid version 2 document; validate it first");
  return params;
}

/** Every safety finding for a schema-valid document of `version`, errors first, with paths in that version. */
export function checkSafety(version: 1 | 2, params: unknown, ctx: SafetyContext): SafetyFinding[] {
  const doc = asV2(version, params);
  const year = ctx.year ?? wallTime(ctx.now.getTime(), ctx.site?.timeZone ?? doc.timeZone).year;
  const findings = CHECKS.flatMap((check) => check({ doc, ctx, year }));
  const out: SafetyFinding[] = [];
  for (const f of findings) {
    const paths = pathsFor(version, f.paths);
    if (paths.length) out.push({ ...f, paths });
  }
  // Stable sort: errors first, each severity in the order the rules run.
  return out.sort((a, b) => (a.severity === b.severity ? 0 : a.severity === "error" ? -1 : 1));
}

/** The rule catalog with paths in a given version (rules about v2-only parameters are left out for v1). */
export function safetyRulesFor(version: 1 | 2): SafetyRule[] {
  return SAFETY_RULES.map((r) => ({ ...r, paths: pathsFor(version, r.paths) })).filter((r) => r.paths.length > 0);
}
