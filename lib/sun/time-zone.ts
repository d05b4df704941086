// Wall time in an IANA zone through Intl alone. ICU carries the zone history, including
// local-mean-time offsets with seconds before 1900-ish, so offsets are handled in seconds.

export type WallTime = { year: number; month: number; day: number; hour: number; minute: number; second: number };

const formatters = new Map<string, Intl.DateTimeFormat>();
let supported: Set<string> | null = null;

// IANA names are Area/Location words; this keeps out offset strings ("+01:00") that newer
// engines would also accept as a zone.
const IANA_NAME = /^[A-Za-z][A-Za-z0-9_+-]*(\/[A-Za-z0-9_+-]+)*$/;

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

function supportedZones(): Set<string> {
  if (!supported) {
    const list = typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : [];
    supported = new Set([...list, "UTC"]);
  }
  return supported;
}

/** The zone's usual spelling if this runtime knows it (canonical names and aliases such as "UTC"), else null. */
export function resolveTimeZone(name: string): string | null {
  if (supportedZones().has(name)) return name;
  if (!IANA_NAME.test(name)) return null;
  try {
    const resolved = new Intl.DateTimeFormat("en-US", { timeZone: name }).resolvedOptions().timeZone;
    // Keep an alias as typed (the engine may map "Europe/Kyiv" to an older name); fix only letter case.
    return resolved.toLowerCase() === name.toLowerCase() ? resolved : name;
  } catch {
    return null;
  }
}

/** Time-zone names for pickers: the runtime's canonical list plus "UTC", sorted. */
export function listTimeZones(): string[] {
  return [...supportedZones()].sort();
}

// format() is about three times faster than formatToParts(); en-US with h23 renders
// "06/21/2026, 04:43:00", and the parts route stays as a fallback for anything else.
const EN_US = /^(\d{2})\/(\d{2})\/(\d{4}), (\d{2}):(\d{2}):(\d{2})$/;

/** Wall-clock date and time of an instant (Unix ms) in a zone. */
export function wallTime(ms: number, timeZone: string): WallTime {
  const f = formatter(timeZone);
  const m = EN_US.exec(f.format(new Date(ms)));
  if (m) return { year: Number(m[3]), month: Number(m[1]), day: Number(m[2]), hour: Number(m[4]), minute: Number(m[5]), second: Number(m[6]) };
  const parts = f.formatToParts(new Date(ms));
  const get = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value ?? NaN);
  return { year: get("year"), month: get("month"), day: get("day"), hour: get("hour"), minute: get("minute"), second: get("second") };
}

function wallAsUtcMs(w: WallTime): number {
  const d = new Date(Date.UTC(2000, w.month - 1, w.day, w.hour, w.minute, w.second));
  d.setUTCFullYear(w.year);
  return d.getTime();
}

/** Wall time and UTC offset (seconds, east positive) of an instant, from one formatting call. */
export function localParts(ms: number, timeZone: string): { wall: WallTime; offsetSeconds: number } {
  const whole = Math.floor(ms / 1000) * 1000;
  const wall = wallTime(whole, timeZone);
  return { wall, offsetSeconds: Math.round((wallAsUtcMs(wall) - whole) / 1000) };
}

/** The zone's offset from UTC at an instant, in seconds (east positive). */
export function offsetSeconds(ms: number, timeZone: string): number {
  return localParts(ms, timeZone).offsetSeconds;
}

/** An offset as ISO-8601 "+01:00" ("+00:19:32" only for historical local mean time). */
export function formatOffset(seconds: number): string {
  const sign = seconds < 0 ? "-" : "+";
  const abs = Math.abs(seconds);
  const hh = String(Math.floor(abs / 3600)).padStart(2, "0");
  const mm = String(Math.floor((abs % 3600) / 60)).padStart(2, "0");
  const ss = abs % 60;
  return `${sign}${hh}:${mm}${ss ? ":" + String(ss).padStart(2, "0") : ""}`;
}

const pad = (n: number, width = 2) => String(n).padStart(width, "0");

/** "YYYY-MM-DD" of a wall time. */
export function isoDate(w: Pick<WallTime, "year" | "month" | "day">): string {
  return `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}`;
}

/** Local ISO-8601 with offset, to the second, from wall time and offset: "2026-06-21T04:43:00+01:00". */
export function isoWithOffset(wall: WallTime, offset: number): string {
  return `${isoDate(wall)}T${pad(wall.hour)}:${pad(wall.minute)}:${pad(wall.second)}${formatOffset(offset)}`;
}

/** An instant as local ISO-8601 with offset, to the second. */
export function formatLocalIso(ms: number, timeZone: string): string {
  const { wall, offsetSeconds: off } = localParts(ms, timeZone);
  return isoWithOffset(wall, off);
}

/** The instant whose local wall time is the nearest whole minute to `ms` (DST-safe). */
export function roundToLocalMinute(ms: number, timeZone: string): number {
  const off = offsetSeconds(ms, timeZone) * 1000;
  return Math.round((ms + off) / 60_000) * 60_000 - off;
}

/** Approximate instant of 12:00 local time on a date; good to the hour around DST changes. */
export function localNoonMs(date: { year: number; month: number; day: number }, timeZone: string): number {
  const wall = wallAsUtcMs({ ...date, hour: 12, minute: 0, second: 0 });
  const first = wall - offsetSeconds(wall, timeZone) * 1000;
  return wall - offsetSeconds(first, timeZone) * 1000;
}
