// MSF minute frames with their A and B bits. Layout per NPL's "MSF 60 kHz time and date code":
// fields most significant bit first, odd parity in 54B–57B, UK civil time (GMT/BST) of the
// following minute.
import { bcdBits, oddParityBit, slice, span } from "./bcd";
import { civilAt, europeanChangeAhead, isEuropeanSummerTime, isoUtc, isoWeekday } from "./calendar";
import { buildRows, check, civilValid, dayExistsCheck, fieldName, instantOf, patternCheck, readField, yearFromTwoDigits, type FieldDef } from "./frame-report";
import { MINUTE_MS, type Check, type EncodeOptions, type EncodedFrame, type FrameDecode } from "./types";

const YEAR_W = [80, 40, 20, 10, 8, 4, 2, 1] as const;
const MONTH_W = [10, 8, 4, 2, 1] as const;
const DAY_W = [20, 10, 8, 4, 2, 1] as const;
const WDAY_W = [4, 2, 1] as const;
const HOUR_W = [20, 10, 8, 4, 2, 1] as const;
const MIN_W = [40, 20, 10, 8, 4, 2, 1] as const;

export const MSF_MARKER_A = "01111110";

export const MSF_LAYOUT_A: readonly FieldDef[] = [
  { from: 0, to: 0, name: "minute marker" },
  { from: 1, to: 16, name: "spare" },
  { from: 17, to: 24, name: "year", weights: YEAR_W },
  { from: 25, to: 29, name: "month", weights: MONTH_W },
  { from: 30, to: 35, name: "day of month", weights: DAY_W },
  { from: 36, to: 38, name: "day of week", weights: WDAY_W },
  { from: 39, to: 44, name: "hour", weights: HOUR_W },
  { from: 45, to: 51, name: "minute", weights: MIN_W },
  { from: 52, to: 59, name: "minute identifier 01111110" },
];

export const MSF_LAYOUT_B: readonly FieldDef[] = [
  { from: 0, to: 0, name: "minute marker" },
  { from: 1, to: 8, name: "DUT1 positive" },
  { from: 9, to: 16, name: "DUT1 negative" },
  { from: 53, to: 53, name: "summer time warning" },
  { from: 54, to: 54, name: "year parity (odd)" },
  { from: 55, to: 55, name: "month and day parity (odd)" },
  { from: 56, to: 56, name: "day of week parity (odd)" },
  { from: 57, to: 57, name: "time parity (odd)" },
  { from: 58, to: 58, name: "BST in effect" },
];

/** Encodes the MSF A and B bits naming the minute containing `atMs` (UTC ms); sent the minute before. */
export function encodeMsf(atMs: number, opts: EncodeOptions = {}): EncodedFrame {
  const t = Math.floor(atMs / MINUTE_MS) * MINUTE_MS;
  const bst = isEuropeanSummerTime(t);
  const c = civilAt(t, bst ? 60 : 0);
  const a: (0 | 1)[] = new Array(60).fill(0);
  const b: (0 | 1)[] = new Array(60).fill(0);
  // Second 0 is 500 ms off, so both the A and the B window read as off.
  a[0] = 1;
  b[0] = 1;
  const tenths = Math.round(Math.abs(opts.dut1 ?? 0) * 10);
  for (let i = 0; i < tenths; i++) b[((opts.dut1 ?? 0) > 0 ? 1 : 9) + i] = 1;
  const put = (from: number, bits: (0 | 1)[]) => bits.forEach((v, i) => (a[from + i] = v));
  put(17, bcdBits(c.year % 100, YEAR_W));
  put(25, bcdBits(c.month, MONTH_W));
  put(30, bcdBits(c.day, DAY_W));
  put(36, bcdBits(isoWeekday(c.year, c.month, c.day) % 7, WDAY_W));
  put(39, bcdBits(c.hour, HOUR_W));
  put(45, bcdBits(c.minute, MIN_W));
  put(52, [...MSF_MARKER_A].map((x) => (x === "1" ? 1 : 0)));
  // 53B is set through the 61 minutes before a change, so frames naming the change minute carry it (from memory).
  b[53] = europeanChangeAhead(t, 61) ? 1 : 0;
  b[54] = oddParityBit(a.slice(17, 25));
  b[55] = oddParityBit(a.slice(25, 36));
  b[56] = oddParityBit(a.slice(36, 39));
  b[57] = oddParityBit(a.slice(39, 52));
  b[58] = bst ? 1 : 0;
  return { standard: "msf", utc: isoUtc(t), sentFrom: isoUtc(t - MINUTE_MS), bitsA: a.join(""), bitsB: b.join("") };
}

const parityCheck = (id: string, label: string, a: string, b: string, from: number, to: number, at: number): Check => {
  const expected = oddParityBit(slice(a, from, to));
  const got = b[at] === "1" ? 1 : 0;
  const detail = got === expected ? `odd over ${from}A–${to}A and ${at}B` : `${at}B is ${got}; odd parity over ${from}A–${to}A needs ${expected}`;
  return check(id, label, got === expected, detail, [...span(from, to), at]);
};

function dut1Of(b: string): { value: number | null; check: Check } {
  const pos = slice(b, 1, 8);
  const neg = slice(b, 9, 16);
  const run = (xs: number[]) => {
    const n = xs.filter((x) => x === 1).length;
    return xs.every((x, i) => x === (i < n ? 1 : 0)) ? n : -1;
  };
  const p = run(pos);
  const n = run(neg);
  const ok = p >= 0 && n >= 0 && (p === 0 || n === 0);
  const value = ok ? (p - n) / 10 : null;
  const detail = ok ? `DUT1 ${value! >= 0 ? "+" : ""}${value!.toFixed(1)} s` : "ones must run from 1B (positive) or 9B (negative), not both";
  return { value, check: check("dut1", "DUT1 bits (1B–16B) code one value", ok, detail, span(1, 16)) };
}

/** Decodes an MSF frame from its A and B bit strings (second 0 first) with every check. */
export function decodeMsf(bitsA: string, bitsB: string): FrameDecode {
  const checks: Check[] = [];
  const marker0 = bitsA[0] === "1" && bitsB[0] === "1";
  checks.push(check("minute-marker", "Second 0 is the minute marker (A and B off)", marker0, `0A ${bitsA[0]}, 0B ${bitsB[0]}`, [0]));
  checks.push(patternCheck("marker-a", "Minute identifier 01111110 in 52A–59A", bitsA, 52, MSF_MARKER_A));
  checks.push(parityCheck("parity-year", "54B year parity", bitsA, bitsB, 17, 24, 54));
  checks.push(parityCheck("parity-date", "55B month and day parity", bitsA, bitsB, 25, 35, 55));
  checks.push(parityCheck("parity-weekday", "56B day of week parity", bitsA, bitsB, 36, 38, 56));
  checks.push(parityCheck("parity-time", "57B time parity", bitsA, bitsB, 39, 51, 57));
  const dut1 = dut1Of(bitsB);
  checks.push(dut1.check);
  const yy = readField(bitsA, { from: 17, to: 24, weights: YEAR_W, label: "Year", id: "year", min: 0, max: 99 }, checks);
  const month = readField(bitsA, { from: 25, to: 29, weights: MONTH_W, label: "Month", id: "month", min: 1, max: 12 }, checks);
  const day = readField(bitsA, { from: 30, to: 35, weights: DAY_W, label: "Day", id: "day", min: 1, max: 31 }, checks);
  const weekday = readField(bitsA, { from: 36, to: 38, weights: WDAY_W, label: "Weekday", id: "weekday", min: 0, max: 6 }, checks);
  const hour = readField(bitsA, { from: 39, to: 44, weights: HOUR_W, label: "Hour", id: "hour", min: 0, max: 23 }, checks);
  const minute = readField(bitsA, { from: 45, to: 51, weights: MIN_W, label: "Minute", id: "minute", min: 0, max: 59 }, checks);
  const year = yearFromTwoDigits(yy, month, day, weekday === 0 ? 7 : weekday);
  checks.push(dayExistsCheck(year, month, day, span(25, 35)));
  const fields = { year, month, day, hour, minute };
  const dateOk = civilValid(fields);
  const expectedWd = dateOk ? isoWeekday(year, month, day) % 7 : null;
  checks.push(
    check("weekday-date", "Weekday matches the date (0 = Sunday)", expectedWd === weekday, expectedWd === null ? "date is not valid" : `date is weekday ${expectedWd}; frame says ${weekday}`, span(17, 38)),
  );
  const bst = bitsB[58] === "1";
  const nameAt = (s: number) => {
    const bName = fieldName(MSF_LAYOUT_B, s);
    return bName === "unused" || s === 0 ? fieldName(MSF_LAYOUT_A, s) : `${fieldName(MSF_LAYOUT_A, s)} · B: ${bName}`;
  };
  return {
    standard: "msf",
    ok: checks.every((c) => c.ok),
    instant: instantOf(fields, bst ? "BST" : "GMT", bst ? 60 : 0, dateOk),
    names: "following minute",
    flags: { summerTimeWarning: bitsB[53] === "1", dut1Seconds: dut1.value },
    checks,
    rows: buildRows(60, (s) => `A${bitsA[s] ?? "?"} B${bitsB[s] ?? "?"}`, nameAt, checks),
  };
}
