// Which controllers need a look: silent for longer than their own check-in rhythm allows, running
// something other than assigned, or (from the check-in queries) without a time fix or stalling.
import { findParameter } from "@/lib/profiles/parameter-info";

/** A controller counts as not seen once this many of its check-in intervals have passed without one. */
export const MISSED_INTERVALS = 2;

const FALLBACK_INTERVAL_S = 900;

/**
 * The check-in interval assumed where no configuration is released: the schema's default for
 * `checkInIntervalS` (the same in parameter sets 1 and 2), 900 s should the schema ever lose it.
 */
export const DEFAULT_CHECK_IN_INTERVAL_S: number = (() => {
  const value = findParameter(2, "/checkInIntervalS")?.default;
  return typeof value === "number" && value > 0 ? value : FALLBACK_INTERVAL_S;
})();

/**
 * Reported time-fix age above which the clock counts as lost: 24 h. Long-wave time signals are often
 * received only at night, so a healthy receiver gets a fix about once a day; a whole day without one
 * means at least one night was missed, and the clock now runs on its crystal alone (common practice).
 * The controller's own alarm (clock.alarmAfterHoursWithoutFix) defaults to 48 h; flagging at 24 h
 * leaves a day to look before it goes off.
 */
export const TIME_FIX_LIMIT_S = 24 * 3600;

/** The check-in interval of an effective configuration, or the default when it has none. */
export function checkInIntervalOf(values: Record<string, unknown> | null | undefined): number {
  const v = values?.checkInIntervalS;
  return typeof v === "number" && Number.isFinite(v) && v > 0 ? v : DEFAULT_CHECK_IN_INTERVAL_S;
}

/** Whether a controller last seen at `lastSeenAt` has missed more than MISSED_INTERVALS check-ins by `now`. */
export function isOverdue(lastSeenAt: Date, intervalS: number, now: Date): boolean {
  return now.getTime() - lastSeenAt.getTime() > MISSED_INTERVALS * intervalS * 1000;
}

export type SeenInput = { serial: string; siteName: string; lastSeenAt: Date | null; intervalS: number };
export type NotSeen = { serial: string; siteName: string; lastSeenAt: Date; intervalS: number; silentS: number };

/**
 * Controllers overdue by their own interval, longest silence first, and how many never checked in
 * (registered but not yet installed or without a link: a different job from a door gone quiet).
 */
export function classifyNotSeen(rows: readonly SeenInput[], now: Date): { overdue: NotSeen[]; neverSeen: number } {
  const overdue: NotSeen[] = [];
  let neverSeen = 0;
  for (const r of rows) {
    if (!r.lastSeenAt) neverSeen++;
    else if (isOverdue(r.lastSeenAt, r.intervalS, now)) {
      overdue.push({ serial: r.serial, siteName: r.siteName, lastSeenAt: r.lastSeenAt, intervalS: r.intervalS, silentS: Math.floor((now.getTime() - r.lastSeenAt.getTime()) / 1000) });
    }
  }
  overdue.sort((a, b) => b.silentS - a.silentS || a.serial.localeCompare(b.serial));
  return { overdue, neverSeen };
}

export type DriftInput = { serial: string; siteName: string; assignedHash: string | null; runningHash: string | null; drift: boolean; lastSeenAt: Date | null };
export type Drift = { serial: string; siteName: string; reason: "other" | "unreported"; lastSeenAt: Date | null };

/**
 * Controllers whose running configuration is not the assigned one: those reporting another hash
 * first (a refusal or a missed poll), then those that have not reported any yet; each by serial.
 */
export function listDrift(rows: readonly DriftInput[]): Drift[] {
  return rows
    .filter((r) => r.drift && r.assignedHash !== null)
    .map((r): Drift => ({ serial: r.serial, siteName: r.siteName, reason: r.runningHash ? "other" : "unreported", lastSeenAt: r.lastSeenAt }))
    .sort((a, b) => (a.reason === b.reason ? a.serial.localeCompare(b.serial) : a.reason === "other" ? -1 : 1));
}

/** The first `max` items and how many were left off, for lists that end in "and N more". */
export function firstOf<T>(items: readonly T[], max = 10): { shown: T[]; more: number } {
  return { shown: items.slice(0, max), more: Math.max(0, items.length - max) };
}
