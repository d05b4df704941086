// Parameter set version 1 → 2: the stall check, the schedule step and the clock settings move into
// groups, the sun offsets are renamed, and v2's new reopen-after-stall setting takes its default.
import { childPointer, cloneJson, getOwn, isPlainObject, setOwn, type JsonObject, type JsonValue } from "./json";
import { FORM_TAG } from "./merge";
import { findParameter } from "./parameter-info";
import { validateParams, type DoorParamsV1, type DoorParamsV2, type ValidationIssue } from "./schemas";

export class MigrationError extends Error {
  constructor(
    message: string,
    readonly path: string,
    readonly issues: ValidationIssue[] = [],
  ) {
    super(message);
    this.name = "MigrationError";
  }
}

/** Where each v1 top-level parameter lives in v2. */
export const V1_TO_V2_PATHS: Readonly<Record<string, readonly string[]>> = {
  parameterSetVersion: ["parameterSetVersion"],
  closeTravelCounts: ["closeTravelCounts"],
  openSensorActiveLevel: ["openSensorActiveLevel"],
  homeOnPowerUp: ["homeOnPowerUp"],
  travelTimeoutMs: ["travelTimeoutMs"],
  stallThresholdCps: ["stall", "thresholdCps"],
  stallWindowMs: ["stall", "windowMs"],
  stallBlankingMs: ["stall", "startupBlankingMs"],
  debounceMs: ["debounceMs"],
  powerUpMode: ["powerUpMode"],
  schedule: ["schedule"],
  scheduleStepMin: ["schedule", "stepMinutes"],
  timeZone: ["timeZone"],
  timeSource: ["clock", "source"],
  noFixAlarmHours: ["clock", "alarmAfterHoursWithoutFix"],
  backlightTimeoutS: ["backlightTimeoutS"],
  checkInIntervalS: ["checkInIntervalS"],
};

/** v1 schedule keys → v2 schedule keys (the step joins the schedule separately). */
export const V1_TO_V2_SCHEDULE_KEYS: Readonly<Record<string, string>> = {
  kind: "kind",
  openAt: "openAt",
  closeAt: "closeAt",
  openOffsetMin: "sunriseOffsetMinutes",
  closeOffsetMin: "civilDuskOffsetMinutes",
};

function v2Default<T extends JsonValue>(path: string, type: "boolean" | "number" | "string"): T {
  const value = findParameter(2, path)?.default;
  if (typeof value !== type) throw new Error(`schema v2 has no ${type} default for ${path}`);
  return value as T;
}

/** Migrates a complete, valid v1 document; throws MigrationError (with the issues) when it is not valid v1. */
export function migrateV1toV2(document: unknown): DoorParamsV2 {
  const check = validateParams(1, document);
  if (!check.ok) throw new MigrationError("not a valid version 1 parameter document", "", check.issues);
  const v1 = document as DoorParamsV1;
  const s = v1.schedule;
  const schedule: DoorParamsV2["schedule"] =
    s.kind === "fixed"
      ? { kind: "fixed", openAt: s.openAt, closeAt: s.closeAt, stepMinutes: v1.scheduleStepMin }
      : { kind: "sun", sunriseOffsetMinutes: s.openOffsetMin, civilDuskOffsetMinutes: s.closeOffsetMin, stepMinutes: v1.scheduleStepMin };
  return {
    parameterSetVersion: 2,
    closeTravelCounts: v1.closeTravelCounts,
    openSensorActiveLevel: v1.openSensorActiveLevel,
    homeOnPowerUp: v1.homeOnPowerUp,
    travelTimeoutMs: v1.travelTimeoutMs,
    stall: {
      thresholdCps: v1.stallThresholdCps,
      windowMs: v1.stallWindowMs,
      startupBlankingMs: v1.stallBlankingMs,
      reopenOnStall: v2Default<boolean>("/stall/reopenOnStall", "boolean"),
    },
    debounceMs: v1.debounceMs,
    powerUpMode: v1.powerUpMode,
    schedule,
    timeZone: v1.timeZone,
    clock: { source: v1.timeSource, alarmAfterHoursWithoutFix: v1.noFixAlarmHours },
    backlightTimeoutS: v1.backlightTimeoutS,
    checkInIntervalS: v1.checkInIntervalS,
  };
}

function setPath(target: JsonObject, segments: readonly string[], value: JsonValue): void {
  let node = target;
  for (const segment of segments.slice(0, -1)) {
    let next = getOwn(node, segment);
    if (!isPlainObject(next)) {
      next = {};
      setOwn(node, segment, next);
    }
    node = next;
  }
  setOwn(node, segments[segments.length - 1]!, value);
}

function migrateSchedule(schedule: JsonValue): JsonObject {
  if (!isPlainObject(schedule)) throw new MigrationError("the schedule must be an object", "/schedule");
  const out: JsonObject = {};
  for (const [key, value] of Object.entries(schedule)) {
    const to = Object.hasOwn(V1_TO_V2_SCHEDULE_KEYS, key) ? V1_TO_V2_SCHEDULE_KEYS[key] : undefined;
    if (!to) throw new MigrationError(`"${key}" is not a version 1 schedule parameter`, childPointer("/schedule", key));
    setOwn(out, to, cloneJson(value));
  }
  return out;
}

export type OverlayMigrationOptions = {
  /** The effective v1 values beneath this overlay (base, or base ← site for a controller overlay). */
  below?: object;
};

/**
 * Migrates a partial v1 overlay to a partial v2 overlay. In v1 the schedule step sits beside the
 * schedule, in v2 inside it; an overlay that switches the schedule form replaces the v2 schedule whole,
 * so the step from beneath is carried into it (from `below`, required in that case).
 */
export function migrateOverlayV1toV2(overlay: object, options: OverlayMigrationOptions = {}): JsonObject {
  if (!isPlainObject(overlay)) throw new MigrationError("an overlay must be an object", "");
  const below = isPlainObject(options.below) ? options.below : undefined;
  const out: JsonObject = {};
  for (const [key, value] of Object.entries(overlay)) {
    const to = Object.hasOwn(V1_TO_V2_PATHS, key) ? V1_TO_V2_PATHS[key] : undefined;
    if (!to) throw new MigrationError(`"${key}" is not a version 1 parameter`, childPointer("", key));
    if (key === "parameterSetVersion") {
      if (value !== 1) throw new MigrationError("parameterSetVersion must be 1 in a version 1 overlay", "/parameterSetVersion");
      setPath(out, to, 2);
    } else if (key === "schedule") {
      const migrated = migrateSchedule(value);
      const existing = getOwn(out, "schedule");
      setOwn(out, "schedule", isPlainObject(existing) ? { ...migrated, ...existing } : migrated);
    } else {
      setPath(out, to, cloneJson(value));
    }
  }
  const schedule = getOwn(out, "schedule");
  if (isPlainObject(schedule) && Object.hasOwn(schedule, FORM_TAG) && !Object.hasOwn(schedule, "stepMinutes")) {
    const belowSchedule = below ? getOwn(below, "schedule") : undefined;
    const belowKind = isPlainObject(belowSchedule) ? getOwn(belowSchedule, FORM_TAG) : undefined;
    if (belowKind !== getOwn(schedule, FORM_TAG)) {
      const step = below ? getOwn(below, "scheduleStepMin") : undefined;
      if (typeof step !== "number") {
        throw new MigrationError(
          "this overlay may switch the schedule form; pass the version 1 values beneath it (below) so the schedule step carries over",
          "/schedule",
        );
      }
      setOwn(schedule, "stepMinutes", step);
    }
  }
  return out;
}
