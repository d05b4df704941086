// Julian Day numbers (Meeus, Astronomical Algorithms, ch. 7). Dates before 1582 October 15 are
// read in the Julian calendar, as in the book, so its worked examples can be reproduced.

const MS_PER_DAY = 86_400_000;
/** JD of the Unix epoch, 1970-01-01 00:00 UT. */
const JD_UNIX_EPOCH = 2_440_587.5;
/** JD of J2000.0, 2000 January 1.5 TD. */
export const J2000 = 2_451_545.0;

/** Julian Day of a calendar date; `day` may carry a fraction (4.81 = 4th at 19:26:24). */
export function julianDay(year: number, month: number, day: number): number {
  let y = year;
  let m = month;
  if (m <= 2) {
    y -= 1;
    m += 12;
  }
  const gregorian = year > 1582 || (year === 1582 && (month > 10 || (month === 10 && day >= 15)));
  const a = Math.floor(y / 100);
  const b = gregorian ? 2 - a + Math.floor(a / 4) : 0;
  return Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * (m + 1)) + day + b - 1524.5;
}

/** Calendar date (day with fraction) of a Julian Day; the inverse of `julianDay` (Meeus ch. 7). */
export function calendarDate(jd: number): { year: number; month: number; day: number } {
  const shifted = jd + 0.5;
  const z = Math.floor(shifted);
  const f = shifted - z;
  let a = z;
  if (z >= 2_299_161) {
    const alpha = Math.floor((z - 1_867_216.25) / 36_524.25);
    a = z + 1 + alpha - Math.floor(alpha / 4);
  }
  const b = a + 1524;
  const c = Math.floor((b - 122.1) / 365.25);
  const d = Math.floor(365.25 * c);
  const e = Math.floor((b - d) / 30.6001);
  const day = b - d - Math.floor(30.6001 * e) + f;
  const month = e < 14 ? e - 1 : e - 13;
  const year = month > 2 ? c - 4716 : c - 4715;
  return { year, month, day };
}

/** Julian Day of an instant given as Unix milliseconds (UT). */
export function julianDayFromMs(ms: number): number {
  return ms / MS_PER_DAY + JD_UNIX_EPOCH;
}

/** Unix milliseconds of a Julian Day (UT). */
export function msFromJulianDay(jd: number): number {
  return (jd - JD_UNIX_EPOCH) * MS_PER_DAY;
}
