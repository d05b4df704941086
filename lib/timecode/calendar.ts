// Calendar and daylight-saving rules the encoders need; all arithmetic on UTC milliseconds.

export type Civil = { year: number; month: number; day: number; hour: number; minute: number };

const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

/** Gregorian leap year. */
export const isLeapYear = (y: number) => (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;

/** Days in a month (1–12) of a year. */
export function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** ISO weekday of a date: 1 = Monday … 7 = Sunday. */
export function isoWeekday(year: number, month: number, day: number): number {
  const d = new Date(Date.UTC(year, month - 1, day)).getUTCDay();
  return d === 0 ? 7 : d;
}

/** Day of the year, 1 = 1 January. */
export function dayOfYear(year: number, month: number, day: number): number {
  return Math.round((Date.UTC(year, month - 1, day) - Date.UTC(year, 0, 1)) / DAY_MS) + 1;
}

/** Month and day for a day of the year, or null when the year has no such day. */
export function dateOfDayOfYear(year: number, doy: number, leap = isLeapYear(year)): { month: number; day: number } | null {
  if (doy < 1 || doy > (leap ? 366 : 365)) return null;
  const days = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  let rest = doy;
  for (let m = 0; m < 12; m++) {
    const n = days[m]!;
    if (rest <= n) return { month: m + 1, day: rest };
    rest -= n;
  }
  return null;
}

/** Civil fields of a UTC instant shifted by an offset in minutes. */
export function civilAt(utcMs: number, offsetMinutes: number): Civil {
  const d = new Date(utcMs + offsetMinutes * 60_000);
  return { year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate(), hour: d.getUTCHours(), minute: d.getUTCMinutes() };
}

/** The UTC instant of civil fields at an offset in minutes. */
export function utcOf(c: Civil, offsetMinutes: number): number {
  return Date.UTC(c.year, c.month - 1, c.day, c.hour, c.minute) - offsetMinutes * 60_000;
}

const lastSunday = (year: number, month: number) => {
  const last = daysInMonth(year, month);
  return last - (isoWeekday(year, month, last) % 7);
};
const nthSunday = (year: number, month: number, n: number) => {
  const first = isoWeekday(year, month, 1) % 7;
  return 1 + ((7 - first) % 7) + 7 * (n - 1);
};

/**
 * EU and UK summer time starts and ends of a year (UTC ms): last Sunday of March and of October at
 * 01:00 UTC. Directive 2000/84/EC Art. 2–3; the UK Summer Time Order 2002 keeps the same instants
 * (from memory).
 */
export function europeanChanges(year: number): [number, number] {
  return [Date.UTC(year, 2, lastSunday(year, 3), 1), Date.UTC(year, 9, lastSunday(year, 10), 1)];
}

/** Whether EU/UK summer time is in effect at a UTC instant. */
export function isEuropeanSummerTime(utcMs: number): boolean {
  const [start, end] = europeanChanges(new Date(utcMs).getUTCFullYear());
  return utcMs >= start && utcMs < end;
}

/** Whether a summer-time change falls at or after `utcMs` and less than `windowMinutes` later. */
export function europeanChangeAhead(utcMs: number, windowMinutes: number): boolean {
  const year = new Date(utcMs).getUTCFullYear();
  return [...europeanChanges(year), ...europeanChanges(year + 1)].some((c) => c >= utcMs && c < utcMs + windowMinutes * 60_000);
}

/**
 * Whether US daylight time is in effect at the end of a local date (after its 02:00 change).
 * From 2007: second Sunday of March to first Sunday of November (Energy Policy Act of 2005 §110);
 * before: first Sunday of April to last Sunday of October (Uniform Time Act as amended 1986). From memory.
 */
export function usDstAtEndOf(year: number, month: number, day: number): boolean {
  const [sm, sd, em, ed] = year >= 2007 ? [3, nthSunday(year, 3, 2), 11, nthSunday(year, 11, 1)] : [4, nthSunday(year, 4, 1), 10, lastSunday(year, 10)];
  const k = month * 100 + day;
  return k >= sm * 100 + sd && k < em * 100 + ed;
}

/** The date before a date. */
export function previousDate(year: number, month: number, day: number): { year: number; month: number; day: number } {
  const d = new Date(Date.UTC(year, month - 1, day) - DAY_MS);
  return { year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate() };
}

const pad = (n: number, w = 2) => String(n).padStart(w, "0");

/** ISO-8601 of a UTC instant at an offset: "2026-03-29T03:00:00+02:00" (or "…Z" at offset 0 when `z`). */
export function isoWithOffset(utcMs: number, offsetMinutes: number, z = false): string {
  const c = civilAt(utcMs, offsetMinutes);
  const sign = offsetMinutes < 0 ? "-" : "+";
  const abs = Math.abs(offsetMinutes);
  const suffix = z && offsetMinutes === 0 ? "Z" : `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
  return `${pad(c.year, 4)}-${pad(c.month)}-${pad(c.day)}T${pad(c.hour)}:${pad(c.minute)}:00${suffix}`;
}

/** ISO-8601 UTC without milliseconds: "2026-03-29T01:00:00Z". */
export const isoUtc = (utcMs: number) => isoWithOffset(utcMs, 0, true);

export { HOUR_MS, DAY_MS };
