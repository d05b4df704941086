import { describe, expect, it } from "vitest";
import { calendarDate, julianDay, julianDayFromMs, msFromJulianDay } from "@/lib/sun/julian-day";
import { solarCoordinates } from "@/lib/sun/solar-position";

describe("julianDay", () => {
  // Meeus, Astronomical Algorithms (2nd ed.), ch. 7, Example 7.a (from memory).
  it("gives JD 2436116.31 for 1957 October 4.81 (Sputnik 1)", () => {
    expect(julianDay(1957, 10, 4.81)).toBeCloseTo(2436116.31, 6);
  });

  // Meeus ch. 7, Example 7.b: a Julian-calendar date (from memory).
  it("reads dates before 1582 October 15 in the Julian calendar: 333 January 27.5 is JD 1842713.0", () => {
    expect(julianDay(333, 1, 27.5)).toBe(1842713.0);
  });

  // Meeus ch. 7, the table of test dates after Example 7.b (from memory).
  it.each([
    [2000, 1, 1.5, 2451545.0],
    [1999, 1, 1, 2451179.5],
    [1987, 1, 27, 2446822.5],
    [1987, 6, 19.5, 2446966.0],
    [1988, 1, 27, 2447187.5],
    [1988, 6, 19.5, 2447332.0],
    [1900, 1, 1, 2415020.5],
    [1600, 1, 1, 2305447.5],
    [1600, 12, 31, 2305812.5],
    [837, 4, 10.3, 2026871.8],
    [-1000, 7, 12.5, 1356001.0],
    [-4712, 1, 1.5, 0.0],
  ])("gives %i-%i-%f as JD %f", (y, m, d, jd) => {
    expect(julianDay(y, m, d)).toBeCloseTo(jd, 6);
  });

  // Meeus ch. 7, Example 7.c: JD 2436116.31 back to 1957 October 4.81 (from memory).
  it("inverts JD 2436116.31 to 1957 October 4.81", () => {
    const c = calendarDate(2436116.31);
    expect([c.year, c.month]).toEqual([1957, 10]);
    expect(c.day).toBeCloseTo(4.81, 6);
  });

  // Meeus ch. 7, Example 7.d: JD 1842713.0 → 333 January 27.5 and JD 1507900.13 → −584 May 28.63 (from memory).
  it("inverts Julian-calendar days, including years before year 0", () => {
    expect(calendarDate(1842713.0)).toEqual({ year: 333, month: 1, day: 27.5 });
    const c = calendarDate(1507900.13);
    expect([c.year, c.month]).toEqual([-584, 5]);
    expect(c.day).toBeCloseTo(28.63, 6);
  });

  it("maps Unix time both ways: 2000-01-01T12:00Z is JD 2451545.0", () => {
    expect(julianDayFromMs(Date.UTC(2000, 0, 1, 12))).toBe(2451545.0);
    expect(msFromJulianDay(2440587.5)).toBe(0);
  });
});

describe("solarCoordinates", () => {
  // Meeus, Astronomical Algorithms (2nd ed.), ch. 25, Example 25.a: the Sun on 1992 October 13.0 TD,
  // JDE 2448908.5, by the low-accuracy method (values from memory). The book rounds each
  // intermediate to five decimals, so the last digit may differ by one.
  const sun = solarCoordinates(2448908.5);

  it("reproduces the intermediate quantities of Example 25.a", () => {
    expect(sun.t).toBeCloseTo(-0.072183436, 9);
    expect(sun.meanLongitude).toBeCloseTo(201.8072, 4);
    expect(sun.meanAnomaly).toBeCloseTo(278.99397, 4);
    expect(sun.eccentricity).toBeCloseTo(0.016711668, 9);
    expect(sun.equationOfCentre).toBeCloseTo(-1.89732, 5);
  });

  it("gives the true longitude 199.90988° and the apparent longitude 199.90895°", () => {
    // In the book 199.90988° is ☉, the true longitude; λ, the apparent one, is 199.90895°.
    expect(Math.abs(sun.trueLongitude - 199.90988)).toBeLessThan(2e-5);
    expect(Math.abs(sun.apparentLongitude - 199.90895)).toBeLessThan(2e-5);
  });

  it("gives obliquity 23.43999°, right ascension 198.38083° and declination −7.78507°", () => {
    expect(sun.meanObliquity).toBeCloseTo(23.44023, 5);
    expect(sun.obliquity).toBeCloseTo(23.43999, 5);
    expect(Math.abs(sun.rightAscension - 198.38083)).toBeLessThan(2e-5);
    expect(Math.abs(sun.declination - -7.78507)).toBeLessThan(1e-5);
  });

  // Meeus ch. 28, Example 28.b: the equation of time on 1992 October 13.0 by formula 28.3,
  // E = +0.059825 rad = +13m42.7s (from memory).
  it("gives the equation of time of Example 28.b, +13 min 42.7 s", () => {
    expect(sun.equationOfTimeMinutes * 60).toBeCloseTo(13 * 60 + 42.7, 0);
    expect(((sun.equationOfTimeMinutes / 4) * Math.PI) / 180).toBeCloseTo(0.059825, 5);
  });

  // 2026 June solstice 21 June 08:24 UT and March equinox 20 March 14:46 UT (from memory).
  it("puts the declination near +23.44° at the June solstice and near 0° at the March equinox", () => {
    expect(solarCoordinates(julianDay(2026, 6, 21.36)).declination).toBeCloseTo(23.44, 1);
    expect(Math.abs(solarCoordinates(julianDay(2026, 3, 20.61)).declination)).toBeLessThan(0.05);
  });
});
