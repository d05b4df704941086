import { desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { calibrationRuns, users } from "@/db/schema";
import { recordAudit } from "./audit";

/** Stores an uploaded run with what was computed from it. */
export async function insertCalibrationRun(input: { controllerId: number; serial: string; fileName: string; csv: string; analysis: Record<string, unknown>; uploadedBy: string }) {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(calibrationRuns).values({ controllerId: input.controllerId, fileName: input.fileName, csv: input.csv, analysis: input.analysis, uploadedBy: input.uploadedBy }).$returningId();
    await recordAudit({ actorId: input.uploadedBy, action: "calibration.uploaded", subjectType: "controller", subjectId: input.serial, detail: { runId: row!.id, fileName: input.fileName } }, tx);
    return { runId: row!.id };
  });
}

/** A controller's runs, newest first (without the CSV). */
export async function listCalibrationRuns({ controllerId }: { controllerId: number }) {
  return db
    .select({ id: calibrationRuns.id, fileName: calibrationRuns.fileName, analysis: calibrationRuns.analysis, createdAt: calibrationRuns.createdAt, uploadedByName: users.name })
    .from(calibrationRuns)
    .leftJoin(users, eq(users.id, calibrationRuns.uploadedBy))
    .where(eq(calibrationRuns.controllerId, controllerId))
    .orderBy(desc(calibrationRuns.id));
}

/** One run with its analysis, or null. */
export async function getCalibrationRun({ runId }: { runId: number }) {
  const [row] = await db.select({ id: calibrationRuns.id, controllerId: calibrationRuns.controllerId, analysis: calibrationRuns.analysis, fileName: calibrationRuns.fileName }).from(calibrationRuns).where(eq(calibrationRuns.id, runId));
  return row ?? null;
}
