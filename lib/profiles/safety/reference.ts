// The door's own numbers the parameters are judged against: from a calibration run when there has
// been one, otherwise estimated from the door model with the drive calculations.
import { ASSUMED_RAMP_MS } from "@/lib/drive/stall";
import { computeTravel, countRateFromMotorRpm, countsPerMotorRev } from "@/lib/drive/travel";
import { num } from "./format";
import { LOADED_SPEED_FACTOR } from "./limits";
import type { DoorModel, SafetyContext } from "./types";

const DECODING = { x1: 1, x2: 2, x4: 4 } as const;

export type Reference = {
  /** Running velocity in counts/s and where it comes from, in words. */
  nominalCps: number;
  nominalSource: string;
  calibrated: boolean;
};

/** The door's nominal running velocity: calibrated, or no-load rpm × loaded-speed factor × counts per motor rev / 60. */
export function nominalVelocity(ctx: SafetyContext): Reference | null {
  if (ctx.calibration) {
    return { nominalCps: ctx.calibration.nominalVelocityCps, nominalSource: "calibrated", calibrated: true };
  }
  const m = ctx.doorModel;
  if (!m) return null;
  const decoding = DECODING[m.encoderDecoding];
  const cps = countRateFromMotorRpm(m.motorNoLoadRpm * LOADED_SPEED_FACTOR, m.encoderPulsesPerRev, decoding);
  const perRev = countsPerMotorRev(m.encoderPulsesPerRev, decoding);
  return {
    nominalCps: cps,
    nominalSource: `estimated from the door model: ${num(m.motorNoLoadRpm)} rpm no-load × ${LOADED_SPEED_FACTOR} under load × ${num(perRev)} counts per motor revolution ÷ 60`,
    calibrated: false,
  };
}

/** Counts for the door model's whole travel and per millimetre (single-layer winding, as the model gives no layer data). */
export function modelTravel(m: DoorModel): { counts: number; countsPerMm: number } {
  const r = computeTravel({
    travelMm: m.doorTravelMm,
    spoolMm: m.spoolDiameterMm,
    cordMm: m.cordDiameterMm,
    gearRatio: m.gearboxRatio,
    ppr: m.encoderPulsesPerRev,
    decoding: DECODING[m.encoderDecoding],
  });
  return { counts: r.counts, countsPerMm: r.countsPerMm.mean };
}

/** Counts per millimetre of door travel when anything tells us: the door model, scaled to the calibration if both exist. */
export function countsPerMm(ctx: SafetyContext): number | null {
  if (!ctx.doorModel) return null;
  const model = modelTravel(ctx.doorModel);
  return ctx.calibration ? ctx.calibration.fullTravelCounts / ctx.doorModel.doorTravelMm : model.countsPerMm;
}

export type ExpectedTravel = { ms: number; source: string };

/**
 * How long one full movement normally takes: the calibrated time, or the close travel at the nominal
 * velocity plus half the assumed start-up ramp (a linear ramp from rest loses half its duration).
 */
export function expectedTravelTime(ctx: SafetyContext, closeTravelCounts: number): ExpectedTravel | null {
  if (ctx.calibration) return { ms: ctx.calibration.travelTimeMs, source: "calibrated" };
  const ref = nominalVelocity(ctx);
  if (!ref) return null;
  const ms = (closeTravelCounts / ref.nominalCps) * 1000 + ASSUMED_RAMP_MS / 2;
  return {
    ms,
    source: `estimated: ${num(closeTravelCounts)} counts at ${num(ref.nominalCps)} counts/s plus half a ${num(ASSUMED_RAMP_MS)} ms start-up ramp`,
  };
}
