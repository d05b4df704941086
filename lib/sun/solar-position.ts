// The Sun's apparent coordinates by the low-accuracy method (Meeus, Astronomical Algorithms,
// ch. 25) and the equation of time (ch. 28, formula 28.3). Accurate to about 0.01°, which keeps
// rise and set times well inside a minute away from the poles.
//
// The series are defined in Dynamical Time; we feed them Universal Time. The difference (about
// a minute in this century) moves the Sun by under 0.001°, far below the minute we report.

import { J2000 } from "./julian-day";

const RAD = Math.PI / 180;

export type SolarCoordinates = {
  /** Julian centuries from J2000.0. */
  t: number;
  /** Geometric mean longitude L0, degrees in [0, 360). */
  meanLongitude: number;
  /** Mean anomaly M, degrees in [0, 360). */
  meanAnomaly: number;
  /** Eccentricity of the Earth's orbit. */
  eccentricity: number;
  /** Equation of the centre C, degrees. */
  equationOfCentre: number;
  /** True geometric longitude ☉, degrees in [0, 360). */
  trueLongitude: number;
  /** Apparent longitude λ (nutation and aberration applied), degrees in [0, 360). */
  apparentLongitude: number;
  /** Mean obliquity ε0, degrees. */
  meanObliquity: number;
  /** Obliquity corrected for the apparent position, degrees. */
  obliquity: number;
  /** Apparent right ascension α, degrees in [0, 360). */
  rightAscension: number;
  /** Apparent declination δ, degrees. */
  declination: number;
  /** Equation of time (apparent − mean solar time), minutes. */
  equationOfTimeMinutes: number;
};

const normalize = (deg: number) => ((deg % 360) + 360) % 360;

/** The Sun's apparent position and the equation of time at a Julian Day. */
export function solarCoordinates(jd: number): SolarCoordinates {
  const t = (jd - J2000) / 36_525;
  const l0 = normalize(280.46646 + 36_000.76983 * t + 0.0003032 * t * t); // 25.2
  const m = normalize(357.52911 + 35_999.05029 * t - 0.0001537 * t * t); // 25.3
  const e = 0.016708634 - 0.000042037 * t - 0.0000001267 * t * t; // 25.4
  const mr = m * RAD;
  const c =
    (1.914602 - 0.004817 * t - 0.000014 * t * t) * Math.sin(mr) +
    (0.019993 - 0.000101 * t) * Math.sin(2 * mr) +
    0.000289 * Math.sin(3 * mr);
  const trueLongitude = normalize(l0 + c);
  const omega = (125.04 - 1934.136 * t) * RAD;
  const lambda = normalize(trueLongitude - 0.00569 - 0.00478 * Math.sin(omega));
  // 22.2, in arcseconds from 23°26'21.448"
  const eps0 = 23 + 26 / 60 + (21.448 - 46.815 * t - 0.00059 * t * t + 0.001813 * t * t * t) / 3600;
  const eps = eps0 + 0.00256 * Math.cos(omega); // 25.8
  const lr = lambda * RAD;
  const er = eps * RAD;
  const alpha = normalize(Math.atan2(Math.cos(er) * Math.sin(lr), Math.cos(lr)) / RAD); // 25.6
  const delta = Math.asin(Math.sin(er) * Math.sin(lr)) / RAD; // 25.7
  return {
    t,
    meanLongitude: l0,
    meanAnomaly: m,
    eccentricity: e,
    equationOfCentre: c,
    trueLongitude,
    apparentLongitude: lambda,
    meanObliquity: eps0,
    obliquity: eps,
    rightAscension: alpha,
    declination: delta,
    equationOfTimeMinutes: equationOfTime(l0, m, e, eps),
  };
}

/** Equation of time in minutes from L0, M, e and ε in degrees (Meeus 28.3). */
export function equationOfTime(meanLongitude: number, meanAnomaly: number, eccentricity: number, obliquity: number): number {
  const y = Math.tan((obliquity * RAD) / 2) ** 2;
  const l0 = meanLongitude * RAD;
  const m = meanAnomaly * RAD;
  const e = eccentricity;
  const radians =
    y * Math.sin(2 * l0) -
    2 * e * Math.sin(m) +
    4 * e * y * Math.sin(m) * Math.cos(2 * l0) -
    0.5 * y * y * Math.sin(4 * l0) -
    1.25 * e * e * Math.sin(2 * m);
  return (radians / RAD) * 4;
}
