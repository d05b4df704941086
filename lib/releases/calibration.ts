import { z } from "zod";
import { getCalibrationRun, insertCalibrationRun } from "@/db/queries/calibrations";
import { getControllerBySerial } from "@/db/queries/controllers";
import { createProfile, findBaseProfile, getRevision, saveRevision } from "@/db/queries/profiles";
import { db } from "@/db/client";
import { controllers, profiles } from "@/db/schema";
import { and, eq } from "drizzle-orm";
import type { SessionUser } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { analyseRun, type RunAnalysis } from "@/lib/calibration/analyse";
import { parseCalibrationCsv } from "@/lib/calibration/csv";
import { calibrationContext, suggestParameters, type SuggestedParameters } from "@/lib/calibration/suggest";

export const CALIBRATION_MAX_BYTES = 5 * 1024 * 1024;

export const uploadSchema = z.object({
  fileName: z.string().trim().min(1, "Name the file").max(191),
  csv: z.string().min(1, "The file is empty"),
  stallFraction: z.number().min(0.3, "At least 0.3").max(0.85, "At most 0.85").optional(),
});

export type StoredAnalysis = { analysis: RunAnalysis; suggested: SuggestedParameters; calibration: ReturnType<typeof calibrationContext> };

/** Parses, analyses and stores a calibration run; 400 naming the rows when the file is wrong (nothing stored). */
export async function uploadCalibration({ actor, serial, input }: { actor: SessionUser; serial: string; input: z.infer<typeof uploadSchema> }) {
  const controller = await getControllerBySerial({ serial });
  if (!controller) throw new AppError("not_found", "No such controller.");
  const parsed = parseCalibrationCsv(input.csv);
  if (!parsed.ok) {
    throw new AppError("invalid_request", `The run could not be read: row ${parsed.errors[0]?.row}: ${parsed.errors[0]?.message}.`, {
      issues: parsed.errors.map((e) => ({ path: `/rows/${e.row}${e.column ? `/${e.column}` : ""}`, message: e.message })),
    });
  }
  const result = analyseRun(parsed.samples);
  if (!result.ok) throw new AppError("invalid_request", `The run could not be analysed: ${result.errors.join("; ")}.`, { issues: result.errors.map((m) => ({ path: "/csv", message: m })) });
  const suggested = suggestParameters(result.analysis, input.stallFraction ? { stallFraction: input.stallFraction } : {});
  const stored: StoredAnalysis = { analysis: result.analysis, suggested, calibration: calibrationContext(result.analysis) };
  const { runId } = await insertCalibrationRun({ controllerId: controller.id, serial, fileName: input.fileName, csv: input.csv, analysis: stored as unknown as Record<string, unknown>, uploadedBy: actor.id });
  return { runId, warnings: [...parsed.warnings.map((w) => `row ${w.row}: ${w.message}`), ...result.analysis.warnings], suggested, calibration: stored.calibration, series: result.analysis.series };
}

/**
 * Turns a run's suggestion into a draft controller overlay (new profile, or a new revision of the
 * controller's overlay), which then goes through review like any revision.
 */
export async function draftOverlayFromRun({ actor, runId }: { actor: SessionUser; runId: number }) {
  const run = await getCalibrationRun({ runId });
  if (!run) throw new AppError("not_found", "No such calibration run.");
  const { suggested } = run.analysis as unknown as StoredAnalysis;
  const [controller] = await db.select().from(controllers).where(eq(controllers.id, run.controllerId)).limit(1);
  if (!controller) throw new AppError("not_found", "No such controller.");
  const base = await findBaseProfile({ doorModelId: controller.doorModelId });
  if (!base) throw new AppError("conflict", "The door model has no base profile yet; the overlay would have nothing to sit on.");
  if (base.schemaVersion !== 2) throw new AppError("conflict", "The base profile uses parameter set 1; migrate it to 2 first.");
  const content = { closeTravelCounts: suggested.closeTravelCounts, travelTimeoutMs: suggested.travelTimeoutMs, stall: { thresholdCps: suggested.stall.thresholdCps, windowMs: suggested.stall.windowMs, startupBlankingMs: suggested.stall.startupBlankingMs } };
  const message = `From calibration run ${runId} (${run.fileName})`;
  const [existing] = await db.select().from(profiles).where(and(eq(profiles.layer, "controller"), eq(profiles.controllerSerial, controller.serial)));
  if (existing?.headRevisionId) {
    const head = await getRevision({ revisionId: existing.headRevisionId });
    const { revisionId } = await saveRevision({ actorId: actor.id, profileId: existing.id, parentRevisionId: existing.headRevisionId, content: { ...(head?.content ?? {}), ...content }, message });
    return { profileId: existing.id, revisionId };
  }
  return createProfile({ actorId: actor.id, layer: "controller", name: `${controller.serial} calibrated`, schemaVersion: 2, doorModelId: controller.doorModelId, controllerSerial: controller.serial, content, message });
}
