import { formatNumber as f } from "./eng-notation";
import type { TravelInput } from "./inputs";
import { COMMON_PRACTICE, type DriveWarning } from "./warnings";
import { distanceForTurns, layerDiameterMm, layerRows, turnsForCordLength, turnsPerLayerOf, type LayerRow, type Winding } from "./winding";

// Plausibility limits for small geared DC door drives (common practice, not a standard).
export const MOTOR_RPM_MIN = 500;
export const MOTOR_RPM_MAX = 20_000;
export const DOOR_SPEED_MAX_MM_S = 100;
export const COUNTS_PER_MM_MIN = 1;
/** Expected travel time above this share of the timeout leaves little room for a slow, cold drive. */
export const TIMEOUT_MARGIN = 0.8;

/** Encoder counts per motor-shaft revolution: PPR × decoding (×1 one edge of A, ×2 both of A, ×4 both of A and B). */
export function countsPerMotorRev(ppr: number, decoding: number): number {
  return ppr * decoding;
}

/** Motor-shaft speed (rpm) from a measured count rate (counts/s). */
export function motorRpmFromCountRate(countsPerSecond: number, ppr: number, decoding: number): number {
  return (countsPerSecond * 60) / countsPerMotorRev(ppr, decoding);
}

/** Count rate (counts/s) at a motor-shaft speed (rpm). */
export function countRateFromMotorRpm(motorRpm: number, ppr: number, decoding: number): number {
  return (motorRpm / 60) * countsPerMotorRev(ppr, decoding);
}

export type SpeedCase = {
  motorRpm: number;
  spoolRpm: number;
  countRateCps: number;
  travelTimeS: number;
  doorSpeedMmS: { mean: number; max: number };
};

export type TravelResult = {
  model: "single-layer" | "multi-layer";
  turnsPerLayer: number | null;
  countsPerMotorRev: number;
  countsPerSpoolRev: number;
  spoolTurns: number;
  layersUsed: number;
  counts: number;
  countsRounded: number;
  diameterMm: { first: number; last: number };
  countsPerMm: { mean: number; min: number; max: number };
  mmPerCount: { mean: number; max: number };
  layers: (LayerRow & { countsPerMm: number })[];
  fromCounts: { counts: number; fromOpenMm: number; fromClosedMm: number; beyondTravel: boolean } | null;
  atMotorRpm: SpeedCase | null;
  atMeasuredRate: SpeedCase | null;
  timeoutS: number | null;
  warnings: DriveWarning[];
};

/** Encoder counts, resolution, travel time and door speed for a door's travel, with plausibility warnings. */
export function computeTravel(input: TravelInput): TravelResult {
  const turnsPerLayer = turnsPerLayerOf(input);
  const w: Winding = { spoolMm: input.spoolMm, cordMm: input.cordMm, turnsPerLayer };
  const perMotorRev = countsPerMotorRev(input.ppr, input.decoding);
  const perSpoolRev = perMotorRev * input.gearRatio;
  const spoolTurns = turnsForCordLength(w, input.travelMm);
  const counts = spoolTurns * perSpoolRev;
  const rows = layerRows(w, spoolTurns).map((r) => ({ ...r, countsPerMm: perSpoolRev / (Math.PI * r.diameterMm) }));
  const layersUsed = turnsPerLayer === null ? 1 : Math.max(1, Math.ceil(spoolTurns / turnsPerLayer - 1e-9));
  const first = layerDiameterMm(w, 0);
  const last = layerDiameterMm(w, layersUsed - 1);
  const countsPerMm = { mean: counts / input.travelMm, min: perSpoolRev / (Math.PI * last), max: perSpoolRev / (Math.PI * first) };

  const speedCase = (motorRpm: number): SpeedCase => {
    const spoolRpm = motorRpm / input.gearRatio;
    const travelTimeS = (spoolTurns * 60) / spoolRpm;
    return {
      motorRpm,
      spoolRpm,
      countRateCps: countRateFromMotorRpm(motorRpm, input.ppr, input.decoding),
      travelTimeS,
      doorSpeedMmS: { mean: input.travelMm / travelTimeS, max: (spoolRpm / 60) * Math.PI * last },
    };
  };
  const atMotorRpm = input.motorRpm === undefined ? null : speedCase(input.motorRpm);
  const atMeasuredRate =
    input.measuredCps === undefined ? null : speedCase(motorRpmFromCountRate(input.measuredCps, input.ppr, input.decoding));

  let fromCounts: TravelResult["fromCounts"] = null;
  if (input.counts !== undefined) {
    const turns = input.counts / perSpoolRev;
    fromCounts = { counts: input.counts, ...distanceForTurns(w, spoolTurns, turns), beyondTravel: turns > spoolTurns * (1 + 1e-9) };
  }

  const result: TravelResult = {
    model: turnsPerLayer === null ? "single-layer" : "multi-layer",
    turnsPerLayer,
    countsPerMotorRev: perMotorRev,
    countsPerSpoolRev: perSpoolRev,
    spoolTurns,
    layersUsed,
    counts,
    countsRounded: Math.round(counts),
    diameterMm: { first, last },
    countsPerMm,
    mmPerCount: { mean: 1 / countsPerMm.mean, max: 1 / countsPerMm.min },
    layers: rows,
    fromCounts,
    atMotorRpm,
    atMeasuredRate,
    timeoutS: input.timeoutS ?? null,
    warnings: [],
  };
  result.warnings = travelWarnings(result);
  return result;
}

/** Warnings for a drive whose numbers look implausible or hazardous. */
export function travelWarnings(r: TravelResult): DriveWarning[] {
  const out: DriveWarning[] = [];
  const cases: [string, SpeedCase | null][] = [
    ["at the given motor speed", r.atMotorRpm],
    ["at the measured count rate", r.atMeasuredRate],
  ];
  for (const [label, c] of cases) {
    if (!c) continue;
    if (r.timeoutS !== null && c.travelTimeS > r.timeoutS) {
      out.push({
        code: "timeout-exceeded",
        severity: "bad",
        message: `The travel takes ${f(c.travelTimeS, 3)} s ${label}, longer than the ${f(r.timeoutS, 3)} s travel timeout: every run would stop early.`,
        basis: "from the inputs",
      });
    } else if (r.timeoutS !== null && c.travelTimeS > TIMEOUT_MARGIN * r.timeoutS) {
      out.push({
        code: "timeout-margin",
        severity: "warn",
        message: `The travel takes ${f(c.travelTimeS, 3)} s ${label}, over ${TIMEOUT_MARGIN * 100} % of the ${f(r.timeoutS, 3)} s timeout: a cold or low-voltage drive may time out.`,
        basis: COMMON_PRACTICE,
      });
    }
    if (c.motorRpm < MOTOR_RPM_MIN || c.motorRpm > MOTOR_RPM_MAX) {
      out.push({
        code: "motor-speed",
        severity: "warn",
        message: `A motor shaft speed of ${f(c.motorRpm)} rpm ${label} is outside what small DC gear motors do (about ${MOTOR_RPM_MIN}–${MOTOR_RPM_MAX.toLocaleString("en-US")} rpm): check the gear ratio, PPR and decoding.`,
        basis: COMMON_PRACTICE,
      });
    }
    if (c.doorSpeedMmS.max > DOOR_SPEED_MAX_MM_S) {
      out.push({
        code: "door-speed",
        severity: "bad",
        message: `The door moves at up to ${f(c.doorSpeedMmS.max, 3)} mm/s ${label}, faster than about ${DOOR_SPEED_MAX_MM_S} mm/s: a hazard to birds in the doorway.`,
        basis: COMMON_PRACTICE,
      });
    }
  }
  if (r.countsPerMm.min < COUNTS_PER_MM_MIN) {
    out.push({
      code: "resolution",
      severity: "warn",
      message: `Only ${f(r.countsPerMm.min, 3)} counts per mm${r.model === "multi-layer" ? " on the outermost layer" : ""}: the stop position is poorly resolved; use ×4 decoding, a higher-PPR encoder or more reduction.`,
      basis: COMMON_PRACTICE,
    });
  }
  if (r.fromCounts?.beyondTravel) {
    out.push({
      code: "counts-beyond-travel",
      severity: "warn",
      message: `${f(r.fromCounts.counts, 6)} counts is more than the ${f(r.counts, 6)} counts of the whole travel.`,
      basis: "from the inputs",
    });
  }
  return out;
}
