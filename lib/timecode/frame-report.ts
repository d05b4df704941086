// Building blocks shared by the three decoders: field layouts, checks and the bit table.
import { decodeBcd, slice, span } from "./bcd";
import { daysInMonth, isoUtc, isoWeekday, isoWithOffset, utcOf } from "./calendar";
import type { BitRow, Check, DecodedInstant, Zone } from "./types";

/** A run of seconds with one meaning; `weights` for BCD fields, in transmission order. */
export type FieldDef = { from: number; to: number; name: string; weights?: readonly number[] };

/** The field name for a second ("minutes 40", "marker"), or "unused". */
export function fieldName(layout: readonly FieldDef[], second: number): string {
  const f = layout.find((d) => second >= d.from && second <= d.to);
  if (!f) return "unused";
  const w = f.weights?.[second - f.from];
  return w === undefined ? f.name : `${f.name} ${w}`;
}

/** A check result. */
export const check = (id: string, label: string, ok: boolean, detail: string, positions: number[]): Check => ({ id, label, ok, detail, positions });

/** Reads a BCD field and adds its digit and range checks. */
export function readField(
  bits: string,
  def: { from: number; to: number; weights: readonly number[]; label: string; id: string; min: number; max: number },
  checks: Check[],
): number {
  const read = decodeBcd(slice(bits, def.from, def.to), def.weights);
  const positions = span(def.from, def.to);
  checks.push(check(`${def.id}-bcd`, `${def.label}: BCD digits 0–9`, read.digitsOk, read.digitsOk ? "every digit is 0–9" : `digit ${read.badDigits.join(", ")} is above 9`, positions));
  const inRange = read.value >= def.min && read.value <= def.max;
  checks.push(check(`${def.id}-range`, `${def.label} ${def.min}–${def.max}`, inRange, `${def.label} is ${read.value}`, positions));
  return read.value;
}

/** The day-of-month check: the day exists in that month of that year. */
export function dayExistsCheck(year: number, month: number, day: number, positions: number[]): Check {
  const ok = month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month);
  const detail = month >= 1 && month <= 12 ? `${year}-${String(month).padStart(2, "0")} has ${daysInMonth(year, month)} days; day is ${day}` : "month out of range";
  return check("day-valid", "Day exists in that month", ok, detail, positions);
}

/** A check that a stretch of seconds holds the expected symbols. */
export function patternCheck(id: string, label: string, bits: string, from: number, expected: string): Check {
  const got = bits.slice(from, from + expected.length);
  return check(id, label, got === expected, got === expected ? `${expected} as expected` : `expected ${expected}, received ${got}`, span(from, from + expected.length - 1));
}

/** The decoded minute as ISO-8601; null strings when a field is out of range or the zone unknown. */
export function instantOf(fields: { year: number; month: number; day: number; hour: number; minute: number }, zone: Zone | null, offsetMinutes: number | null, valid: boolean): DecodedInstant {
  const base = { ...fields, zone };
  if (!valid) return { ...base, local: null, utc: null };
  if (zone === null || offsetMinutes === null) {
    const ms = utcOf(fields, 0);
    return { ...base, local: isoWithOffset(ms, 0).slice(0, 19), utc: null };
  }
  const utcMs = utcOf(fields, offsetMinutes);
  return { ...base, local: isoWithOffset(utcMs, offsetMinutes, zone === "UTC"), utc: isoUtc(utcMs) };
}

/**
 * The four-digit year for a two-digit one. The codes send no century; 20xx is assumed unless only
 * 19xx fits the weekday the frame sends (the weekday of a date shifts between centuries). 19xx is
 * considered only from 1973, when DCF77 began sending the date (from memory), so that a corrupted
 * weekday in a current frame is reported rather than read as a date a century back.
 */
export function yearFromTwoDigits(yy: number, month: number, day: number, isoWeekdaySent: number | null): number {
  if (isoWeekdaySent === null || yy < 73 || month < 1 || month > 12 || day < 1 || day > 31) return 2000 + yy;
  const fits = (y: number) => day <= daysInMonth(y, month) && isoWeekday(y, month, day) === isoWeekdaySent;
  return !fits(2000 + yy) && fits(1900 + yy) ? 1900 + yy : 2000 + yy;
}

/** Whether civil fields are in range for building a date. */
export const civilValid = (f: { month: number; day: number; hour: number; minute: number; year: number }) =>
  f.month >= 1 && f.month <= 12 && f.day >= 1 && f.day <= daysInMonth(f.year, f.month) && f.hour <= 23 && f.minute <= 59;

/** The bit table: one row per second, marked failed when any check covering it failed. */
export function buildRows(length: number, symbolsAt: (s: number) => string, nameAt: (s: number) => string, checks: readonly Check[]): BitRow[] {
  const state: (boolean | null)[] = new Array(length).fill(null);
  for (const c of checks) for (const p of c.positions) if (p < length) state[p] = (state[p] ?? true) && c.ok;
  return state.map((ok, second) => ({ second, symbols: symbolsAt(second), field: nameAt(second), ok }));
}
