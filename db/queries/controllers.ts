import { randomBytes } from "node:crypto";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { checkIns, controllers, controllerTokens, doorModels, sites } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { sha256Hex } from "@/lib/profiles/canonical";
import { recordAudit } from "./audit";

/** SHA-256 hex of a device token; only this is stored. */
export const hashToken = (token: string): string => sha256Hex(token);

function newToken(): string {
  return `rlc_${randomBytes(32).toString("base64url")}`;
}

export type NewController = { actorId: string; serial: string; doorModelId: number; siteId: number; firmwareVersion: string; parameterSetVersion: 1 | 2 };

/** Registers a controller and returns its first token, which is shown once and never stored. Pass `outer` to join a bulk import's transaction. */
export async function createController(input: NewController, outer?: Tx): Promise<{ controllerId: number; token: string }> {
  const run = <T>(fn: (tx: Tx) => Promise<T>) => (outer ? fn(outer) : db.transaction(fn));
  return run(async (tx) => {
    const [dup] = await tx.select({ id: controllers.id }).from(controllers).where(eq(controllers.serial, input.serial)).for("update");
    if (dup) throw new AppError("conflict", `A controller with serial ${input.serial} is already registered.`, { issues: [{ path: "/serial", message: "Already registered" }] });
    const [model] = await tx.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.id, input.doorModelId));
    if (!model) throw new AppError("invalid_request", "No such door model.", { issues: [{ path: "/doorModelId", message: "No such door model" }] });
    const [site] = await tx.select({ id: sites.id }).from(sites).where(eq(sites.id, input.siteId));
    if (!site) throw new AppError("invalid_request", "No such site.", { issues: [{ path: "/siteId", message: "No such site" }] });
    const [row] = await tx
      .insert(controllers)
      .values({ serial: input.serial, doorModelId: input.doorModelId, siteId: input.siteId, firmwareVersion: input.firmwareVersion, parameterSetVersion: input.parameterSetVersion })
      .$returningId();
    const token = newToken();
    await tx.insert(controllerTokens).values({ controllerId: row!.id, tokenHash: hashToken(token), hint: token.slice(-4), createdBy: input.actorId });
    await recordAudit({ actorId: input.actorId, action: "controller.registered", subjectType: "controller", subjectId: input.serial }, tx);
    return { controllerId: row!.id, token };
  });
}

/** Locks the controller and revokes its live tokens; returns its serial (404 when missing). */
async function lockAndRevoke(tx: Tx, controllerId: number): Promise<string> {
  const [c] = await tx.select({ serial: controllers.serial }).from(controllers).where(eq(controllers.id, controllerId)).for("update");
  if (!c) throw new AppError("not_found", "No such controller.");
  await tx.update(controllerTokens).set({ revokedAt: new Date() }).where(and(eq(controllerTokens.controllerId, controllerId), isNull(controllerTokens.revokedAt)));
  return c.serial;
}

/** Revokes every live token of a controller and issues a new one (shown once). */
export async function rotateToken({ actorId, controllerId }: { actorId: string; controllerId: number }): Promise<{ token: string }> {
  return db.transaction(async (tx) => {
    const serial = await lockAndRevoke(tx, controllerId);
    const token = newToken();
    await tx.insert(controllerTokens).values({ controllerId, tokenHash: hashToken(token), hint: token.slice(-4), createdBy: actorId });
    await recordAudit({ actorId, action: "controller.token_rotated", subjectType: "controller", subjectId: serial }, tx);
    return { token };
  });
}

/** Revokes every live token of a controller; its next request gets 401. */
export async function revokeTokens({ actorId, controllerId }: { actorId: string; controllerId: number }) {
  await db.transaction(async (tx) => {
    const serial = await lockAndRevoke(tx, controllerId);
    await recordAudit({ actorId, action: "controller.token_revoked", subjectType: "controller", subjectId: serial }, tx);
  });
}

/** Every controller with its site and door model names. */
export async function listControllers() {
  return db
    .select({
      id: controllers.id,
      serial: controllers.serial,
      firmwareVersion: controllers.firmwareVersion,
      parameterSetVersion: controllers.parameterSetVersion,
      runningHash: controllers.runningHash,
      lastSeenAt: controllers.lastSeenAt,
      siteId: controllers.siteId,
      siteName: sites.name,
      doorModelId: controllers.doorModelId,
      doorModelName: doorModels.name,
    })
    .from(controllers)
    .innerJoin(sites, eq(sites.id, controllers.siteId))
    .innerJoin(doorModels, eq(doorModels.id, controllers.doorModelId))
    .orderBy(asc(controllers.serial));
}

/** One controller by serial, or null. */
export async function getControllerBySerial({ serial }: { serial: string }) {
  const [row] = await db.select().from(controllers).where(eq(controllers.serial, serial)).limit(1);
  return row ?? null;
}

export type CheckInInput = {
  appliedHash: string | null;
  refusedReason: string | null;
  firmwareVersion: string;
  uptimeS: number;
  doorCycles: number;
  lastOpenCounts: number | null;
  lastCloseCounts: number | null;
  lastTravelMs: number | null;
  stallEvents: number;
  timeFixAgeS: number | null;
};

/** Stores a check-in and updates what the controller reports running, in one transaction. */
export async function recordCheckIn({ controllerId, input }: { controllerId: number; input: CheckInInput }) {
  await db.transaction(async (tx) => {
    await tx.insert(checkIns).values({ controllerId, ...input });
    await tx
      .update(controllers)
      .set({ lastSeenAt: new Date(), firmwareVersion: input.firmwareVersion, ...(input.appliedHash ? { runningHash: input.appliedHash } : {}) })
      .where(eq(controllers.id, controllerId));
  });
}

/** The newest check-ins of a controller. */
export async function listCheckIns({ controllerId, limit = 200 }: { controllerId: number; limit?: number }) {
  return db.select().from(checkIns).where(eq(checkIns.controllerId, controllerId)).orderBy(desc(checkIns.id)).limit(limit);
}

/** Changes where a controller is or what it is; its next poll gets the configuration that follows from it. */
export async function updateController({ actorId, controllerId, serial, change }: { actorId: string; controllerId: number; serial: string; change: { siteId?: number; doorModelId?: number; firmwareVersion?: string; parameterSetVersion?: 1 | 2 } }) {
  await db.transaction(async (tx) => {
    if (change.siteId) {
      const [s] = await tx.select({ id: sites.id }).from(sites).where(eq(sites.id, change.siteId));
      if (!s) throw new AppError("invalid_request", "No such site.", { issues: [{ path: "/siteId", message: "No such site" }] });
    }
    if (change.doorModelId) {
      const [m] = await tx.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.id, change.doorModelId));
      if (!m) throw new AppError("invalid_request", "No such door model.", { issues: [{ path: "/doorModelId", message: "No such door model" }] });
    }
    await tx.update(controllers).set(change).where(eq(controllers.id, controllerId));
    await recordAudit({ actorId, action: "controller.updated", subjectType: "controller", subjectId: serial, detail: change }, tx);
  });
}
