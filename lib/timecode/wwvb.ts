// WWVB amplitude-code minute frames. Layout per NIST Special Publication 432 ("NIST Time and
// Frequency Services") and NIST's "WWVB Time Code Format": markers every ten seconds, UTC of the
// current minute (the on-time marker at second 0).
import { bcdBits, slice, span } from "./bcd";
import { civilAt, dateOfDayOfYear, dayOfYear, isLeapYear, isoUtc, previousDate, usDstAtEndOf } from "./calendar";
import { buildRows, check, civilValid, fieldName, instantOf, readField, type FieldDef } from "./frame-report";
import { MINUTE_MS, type Check, type EncodeOptions, type EncodedFrame, type FrameDecode, type FrameFlags } from "./types";

export const WWVB_MARKERS = [0, 9, 19, 29, 39, 49, 59] as const;
const UNUSED = [4, 10, 11, 14, 20, 21, 24, 34, 35, 44, 54] as const;
// Weight 0 stands for an unused second or a marker inside a BCD run.
const MIN_W = [40, 20, 10, 0, 8, 4, 2, 1] as const;
const HOUR_W = [20, 10, 0, 8, 4, 2, 1] as const;
const DOY_W = [200, 100, 0, 80, 40, 20, 10, 0, 8, 4, 2, 1] as const;
const DUT_W = [8, 4, 2, 1] as const;
const YEAR_W = [80, 40, 20, 10, 0, 8, 4, 2, 1] as const;

export const WWVB_LAYOUT: readonly FieldDef[] = [
  ...WWVB_MARKERS.map((m) => ({ from: m, to: m, name: m === 0 ? "frame reference marker" : "position marker" })),
  { from: 1, to: 3, name: "minutes", weights: [40, 20, 10] },
  { from: 5, to: 8, name: "minutes", weights: [8, 4, 2, 1] },
  { from: 12, to: 13, name: "hours", weights: [20, 10] },
  { from: 15, to: 18, name: "hours", weights: [8, 4, 2, 1] },
  { from: 22, to: 23, name: "day of year", weights: [200, 100] },
  { from: 25, to: 28, name: "day of year", weights: [80, 40, 20, 10] },
  { from: 30, to: 33, name: "day of year", weights: [8, 4, 2, 1] },
  { from: 36, to: 36, name: "DUT1 sign +" },
  { from: 37, to: 37, name: "DUT1 sign −" },
  { from: 38, to: 38, name: "DUT1 sign +" },
  { from: 40, to: 43, name: "DUT1 tenths", weights: DUT_W },
  { from: 45, to: 48, name: "year", weights: [80, 40, 20, 10] },
  { from: 50, to: 53, name: "year", weights: [8, 4, 2, 1] },
  { from: 55, to: 55, name: "leap year indicator" },
  { from: 56, to: 56, name: "leap second warning" },
  { from: 57, to: 57, name: "DST at 24:00 UTC today" },
  { from: 58, to: 58, name: "DST at 00:00 UTC today" },
];

/** Encodes the WWVB frame for the UTC minute containing `atMs`; it is sent during that minute. */
export function encodeWwvb(atMs: number, opts: EncodeOptions = {}): EncodedFrame {
  const t = Math.floor(atMs / MINUTE_MS) * MINUTE_MS;
  const c = civilAt(t, 0);
  const s: string[] = new Array(60).fill("0");
  for (const m of WWVB_MARKERS) s[m] = "M";
  const put = (from: number, bits: (0 | 1)[], weights: readonly number[]) =>
    bits.forEach((v, i) => {
      if (weights[i] !== 0) s[from + i] = String(v);
    });
  put(1, bcdBits(c.minute, MIN_W), MIN_W);
  put(12, bcdBits(c.hour, HOUR_W), HOUR_W);
  put(22, bcdBits(dayOfYear(c.year, c.month, c.day), DOY_W), DOY_W);
  const dut1 = opts.dut1 ?? 0;
  // Zero is sent with the positive sign.
  [s[36], s[37], s[38]] = dut1 < 0 ? ["0", "1", "0"] : ["1", "0", "1"];
  put(40, bcdBits(Math.round(Math.abs(dut1) * 10), DUT_W), DUT_W);
  put(45, bcdBits(c.year % 100, YEAR_W), YEAR_W);
  s[55] = isLeapYear(c.year) ? "1" : "0";
  s[56] = opts.leapSecondWarning ? "1" : "0";
  const prev = previousDate(c.year, c.month, c.day);
  s[57] = usDstAtEndOf(c.year, c.month, c.day) ? "1" : "0";
  s[58] = usDstAtEndOf(prev.year, prev.month, prev.day) ? "1" : "0";
  return { standard: "wwvb", utc: isoUtc(t), sentFrom: isoUtc(t), bits: s.join("") };
}

const DST_STATES: Record<string, NonNullable<FrameFlags["dst"]>> = {
  "00": "standard time",
  "10": "DST begins today",
  "11": "DST in effect",
  "01": "DST ends today",
};

/** Decodes a WWVB frame (60 symbols 0/1/M, second 0 first) with every check. */
export function decodeWwvb(bits: string): FrameDecode {
  const checks: Check[] = [];
  const markerSet = new Set<number>(WWVB_MARKERS);
  const wrongMarkers = WWVB_MARKERS.filter((m) => bits[m] !== "M");
  const stray = span(0, 59).filter((i) => !markerSet.has(i) && bits[i] === "M");
  const markersDetail = [wrongMarkers.length ? `no marker at ${wrongMarkers.join(", ")}` : "", stray.length ? `marker out of place at ${stray.join(", ")}` : ""].filter(Boolean).join("; ");
  checks.push(check("markers", "Markers at 0, 9, 19, 29, 39, 49, 59 only", !markersDetail, markersDetail || "all seven in place", [...WWVB_MARKERS, ...stray]));
  const setUnused = UNUSED.filter((i) => bits[i] === "1");
  checks.push(check("unused-zero", "Unused seconds are 0", setUnused.length === 0, setUnused.length ? `second ${setUnused.join(", ")} is 1` : "all 0", [...UNUSED]));
  const sign = bits.slice(36, 39);
  checks.push(check("dut1-sign", "DUT1 sign is 101 (+) or 010 (−)", sign === "101" || sign === "010", `bits 36–38 are ${sign}`, [36, 37, 38]));
  const minute = readField(bits, { from: 1, to: 8, weights: MIN_W, label: "Minute", id: "minute", min: 0, max: 59 }, checks);
  const hour = readField(bits, { from: 12, to: 18, weights: HOUR_W, label: "Hour", id: "hour", min: 0, max: 23 }, checks);
  const doy = readField(bits, { from: 22, to: 33, weights: DOY_W, label: "Day of year", id: "doy", min: 1, max: 366 }, checks);
  const tenths = readField(bits, { from: 40, to: 43, weights: DUT_W, label: "DUT1 tenths", id: "dut1", min: 0, max: 9 }, checks);
  const year = 2000 + readField(bits, { from: 45, to: 53, weights: YEAR_W, label: "Year", id: "year", min: 0, max: 99 }, checks);
  const lyi = bits[55] === "1";
  checks.push(check("leap-year", "Leap year indicator matches the year", lyi === isLeapYear(year), `${year} is ${isLeapYear(year) ? "" : "not "}a leap year; bit 55 is ${lyi ? 1 : 0}`, [55, ...span(45, 53)]));
  const date = dateOfDayOfYear(year, doy, lyi);
  checks.push(check("doy-valid", "Day of year exists in that year", date !== null, `day ${doy} of a ${lyi ? 366 : 365}-day year`, [...span(22, 33), 55]));
  const fields = { year, month: date?.month ?? 0, day: date?.day ?? 0, hour, minute };
  const valid = date !== null && civilValid(fields);
  const signOk = sign === "101" || sign === "010";
  const dut1Seconds = signOk ? (sign === "010" ? -tenths : tenths) / 10 : null;
  // Flags that depend on slice() treat a stray M as 0.
  const [dstToday, dstStart] = slice(bits, 57, 58);
  return {
    standard: "wwvb",
    ok: checks.every((c) => c.ok),
    instant: instantOf(fields, "UTC", 0, valid),
    names: "current minute",
    flags: { leapYear: lyi, leapSecondAnnounced: bits[56] === "1", dut1Seconds, dst: DST_STATES[`${dstToday}${dstStart}`] },
    checks,
    rows: buildRows(60, (s) => bits[s] ?? "", (s) => fieldName(WWVB_LAYOUT, s), checks),
  };
}
