// DCF77 minute frames. Layout per PTB's description of the DCF77 time code (bits 0–58, no pulse
// in second 59); the frame sent during one minute names the civil time (CET/CEST) of the next
// minute mark.
import { bcdBits, evenParityBit, slice, span } from "./bcd";
import { civilAt, europeanChangeAhead, isEuropeanSummerTime, isoUtc, isoWeekday } from "./calendar";
import { buildRows, check, civilValid, dayExistsCheck, fieldName, instantOf, readField, yearFromTwoDigits, type FieldDef } from "./frame-report";
import { MINUTE_MS, type Check, type EncodeOptions, type EncodedFrame, type FrameDecode } from "./types";

const MIN_W = [1, 2, 4, 8, 10, 20, 40] as const;
const HOUR_W = [1, 2, 4, 8, 10, 20] as const;
const DAY_W = [1, 2, 4, 8, 10, 20] as const;
const WDAY_W = [1, 2, 4] as const;
const MONTH_W = [1, 2, 4, 8, 10] as const;
const YEAR_W = [1, 2, 4, 8, 10, 20, 40, 80] as const;

export const DCF77_LAYOUT: readonly FieldDef[] = [
  { from: 0, to: 0, name: "start of minute (always 0)" },
  { from: 1, to: 14, name: "civil warning / weather" },
  { from: 15, to: 15, name: "call bit" },
  { from: 16, to: 16, name: "A1 zone change announced" },
  { from: 17, to: 17, name: "Z1 CEST" },
  { from: 18, to: 18, name: "Z2 CET" },
  { from: 19, to: 19, name: "A2 leap second announced" },
  { from: 20, to: 20, name: "start of time (always 1)" },
  { from: 21, to: 27, name: "minutes", weights: MIN_W },
  { from: 28, to: 28, name: "P1 minute parity" },
  { from: 29, to: 34, name: "hours", weights: HOUR_W },
  { from: 35, to: 35, name: "P2 hour parity" },
  { from: 36, to: 41, name: "day of month", weights: DAY_W },
  { from: 42, to: 44, name: "day of week", weights: WDAY_W },
  { from: 45, to: 49, name: "month", weights: MONTH_W },
  { from: 50, to: 57, name: "year", weights: YEAR_W },
  { from: 58, to: 58, name: "P3 date parity" },
  { from: 59, to: 59, name: "leap second (0)" },
];

/** Encodes the DCF77 frame that names the minute containing `atMs` (UTC ms); sent the minute before. */
export function encodeDcf77(atMs: number, opts: EncodeOptions = {}): EncodedFrame {
  const t = Math.floor(atMs / MINUTE_MS) * MINUTE_MS;
  const summer = isEuropeanSummerTime(t);
  const c = civilAt(t, summer ? 120 : 60);
  const b: (0 | 1)[] = new Array(59).fill(0);
  b[15] = opts.callBit ? 1 : 0;
  // A1 stays set through the hour before the change, so the last frame with it names the changed time (from memory).
  b[16] = europeanChangeAhead(t, 60) ? 1 : 0;
  b[17] = summer ? 1 : 0;
  b[18] = summer ? 0 : 1;
  b[19] = opts.leapSecondWarning ? 1 : 0;
  b[20] = 1;
  const put = (from: number, bits: (0 | 1)[]) => bits.forEach((v, i) => (b[from + i] = v));
  put(21, bcdBits(c.minute, MIN_W));
  b[28] = evenParityBit(b.slice(21, 28));
  put(29, bcdBits(c.hour, HOUR_W));
  b[35] = evenParityBit(b.slice(29, 35));
  put(36, bcdBits(c.day, DAY_W));
  put(42, bcdBits(isoWeekday(c.year, c.month, c.day), WDAY_W));
  put(45, bcdBits(c.month, MONTH_W));
  put(50, bcdBits(c.year % 100, YEAR_W));
  b[58] = evenParityBit(b.slice(36, 58));
  return { standard: "dcf77", utc: isoUtc(t), sentFrom: isoUtc(t - MINUTE_MS), bits: b.join("") };
}

const parityCheck = (id: string, label: string, bits: string, from: number, to: number, at: number): Check => {
  const expected = evenParityBit(slice(bits, from, to));
  const got = bits[at] === "1" ? 1 : 0;
  return check(id, label, got === expected, got === expected ? `even over ${from}–${at}` : `bit ${at} is ${got}; even parity over ${from}–${to} needs ${expected}`, span(from, at));
};

/** Decodes a DCF77 frame (bit 0 first, 59 bits, or 60 in a leap-second minute) with every check. */
export function decodeDcf77(bits: string): FrameDecode {
  const at = (i: number) => (bits[i] === "1" ? 1 : 0);
  const checks: Check[] = [];
  checks.push(check("start-minute", "Bit 0 (start of minute) is 0", at(0) === 0, `bit 0 is ${at(0)}`, [0]));
  checks.push(check("start-time", "Bit 20 (start of time) is 1", at(20) === 1, `bit 20 is ${at(20)}`, [20]));
  const z1 = at(17);
  const z2 = at(18);
  const zoneOk = z1 + z2 === 1;
  checks.push(check("zone-bits", "Exactly one zone bit set (17 CEST, 18 CET)", zoneOk, `bits 17–18 are ${z1}${z2}`, [17, 18]));
  checks.push(parityCheck("parity-minute", "P1 minute parity (bit 28)", bits, 21, 27, 28));
  checks.push(parityCheck("parity-hour", "P2 hour parity (bit 35)", bits, 29, 34, 35));
  checks.push(parityCheck("parity-date", "P3 date parity (bit 58)", bits, 36, 57, 58));
  const minute = readField(bits, { from: 21, to: 27, weights: MIN_W, label: "Minute", id: "minute", min: 0, max: 59 }, checks);
  const hour = readField(bits, { from: 29, to: 34, weights: HOUR_W, label: "Hour", id: "hour", min: 0, max: 23 }, checks);
  const day = readField(bits, { from: 36, to: 41, weights: DAY_W, label: "Day", id: "day", min: 1, max: 31 }, checks);
  const weekday = readField(bits, { from: 42, to: 44, weights: WDAY_W, label: "Weekday", id: "weekday", min: 1, max: 7 }, checks);
  const month = readField(bits, { from: 45, to: 49, weights: MONTH_W, label: "Month", id: "month", min: 1, max: 12 }, checks);
  const yy = readField(bits, { from: 50, to: 57, weights: YEAR_W, label: "Year", id: "year", min: 0, max: 99 }, checks);
  const year = yearFromTwoDigits(yy, month, day, weekday);
  checks.push(dayExistsCheck(year, month, day, span(36, 49)));
  const fields = { year, month, day, hour, minute };
  const dateOk = civilValid(fields);
  const expectedWd = dateOk ? isoWeekday(year, month, day) : null;
  checks.push(
    check("weekday-date", "Weekday matches the date (1 = Monday)", expectedWd === weekday, expectedWd === null ? "date is not valid" : `date is weekday ${expectedWd}; frame says ${weekday}`, span(36, 57)),
  );
  if (bits.length === 60) {
    const ok = at(59) === 0 && at(19) === 1;
    checks.push(check("leap-second", "Bit 59 only in an announced leap-second minute, and 0", ok, `bit 59 is ${at(59)}; A2 is ${at(19)}`, [19, 59]));
  }
  const zone = zoneOk ? (z1 ? "CEST" : "CET") : null;
  return {
    standard: "dcf77",
    ok: checks.every((c) => c.ok),
    instant: instantOf(fields, zone, zone === "CEST" ? 120 : zone === "CET" ? 60 : null, dateOk),
    names: "following minute",
    flags: { callBit: at(15) === 1, zoneChangeAnnounced: at(16) === 1, leapSecondAnnounced: at(19) === 1 },
    checks,
    rows: buildRows(bits.length, (s) => bits[s] ?? "", (s) => fieldName(DCF77_LAYOUT, s), checks),
  };
}
