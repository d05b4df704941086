// Solar transit and the four crossings of one solar day by the hour-angle method (Meeus,
// Astronomical Algorithms, ch. 15 and 25).
// Each crossing is recomputed with the Sun's position at the crossing itself, because
// declination and the equation of time drift during the half day between noon and dusk.

import { J2000, msFromJulianDay } from "./julian-day";
import { solarCoordinates } from "./solar-position";

const RAD = Math.PI / 180;

/** Upper limb on the horizon with standard refraction (34′) and semi-diameter (16′). */
export const SUNRISE_ALTITUDE = -0.833;
/** Centre 6° below the horizon: the end of civil twilight. */
export const CIVIL_ALTITUDE = -6;

/** A crossing instant, or why the Sun never reaches that altitude on this side of noon. */
export type Crossing = { ms: number } | { ms: null; status: "always_above" | "always_below" };

export type SolarDay = {
  /** Days from the solar transit nearest J2000.0 at this longitude. */
  n: number;
  transitMs: number;
  civilDawn: Crossing;
  sunrise: Crossing;
  sunset: Crossing;
  civilDusk: Crossing;
};

// Mean transit at longitude `lon` (east positive) for day n, moved by the equation of time.
const transitJd = (n: number, lon: number, eotMinutes: number) => J2000 + n - lon / 360 - eotMinutes / 1440;

/** Solar-day number whose transit is nearest a Julian Day at a longitude. */
export function solarDayNumber(jd: number, lon: number): number {
  return Math.round(jd - J2000 + lon / 360);
}

function transit(n: number, lon: number): number {
  let jd = transitJd(n, lon, 0);
  for (let i = 0; i < 3; i++) jd = transitJd(n, lon, solarCoordinates(jd).equationOfTimeMinutes);
  return jd;
}

// sign −1 before noon (rising), +1 after (setting). The first pass uses the declination at
// transit; when that says the Sun stays above the altitude, the deciding moment is really the
// Sun's lowest point half a day away, where the declination differs by up to 0.2°, so that
// point is tried before giving up. Without it, the first and last nights with a brief sunset
// or civil dusk lose their second crossing.
function crossing(n: number, lat: number, lon: number, altitude: number, sign: -1 | 1, transitJdValue: number): Crossing {
  const phi = lat * RAD;
  const h0 = altitude * RAD;
  let jd = transitJdValue;
  let triedLowest = false;
  for (let i = 0; i < 6; i++) {
    const c = solarCoordinates(jd);
    const delta = c.declination * RAD;
    const cosH = (Math.sin(h0) - Math.sin(phi) * Math.sin(delta)) / (Math.cos(phi) * Math.cos(delta));
    if (cosH < -1 && !triedLowest) {
      triedLowest = true;
      jd = transitJdValue + sign * 0.5;
      continue;
    }
    if (cosH < -1) return { ms: null, status: "always_above" };
    if (cosH > 1) return { ms: null, status: "always_below" };
    const hourAngle = Math.acos(cosH) / RAD;
    const next = transitJd(n, lon, c.equationOfTimeMinutes) + (sign * hourAngle) / 360;
    const settled = Math.abs(next - jd) < 1e-6; // 0.09 s
    jd = next;
    if (settled) break;
  }
  return { ms: msFromJulianDay(jd) };
}

/** Transit and the civil-dawn, sunrise, sunset and civil-dusk crossings of solar day n. */
export function solarDay(n: number, lat: number, lon: number): SolarDay {
  const t = transit(n, lon);
  return {
    n,
    transitMs: msFromJulianDay(t),
    civilDawn: crossing(n, lat, lon, CIVIL_ALTITUDE, -1, t),
    sunrise: crossing(n, lat, lon, SUNRISE_ALTITUDE, -1, t),
    sunset: crossing(n, lat, lon, SUNRISE_ALTITUDE, 1, t),
    civilDusk: crossing(n, lat, lon, CIVIL_ALTITUDE, 1, t),
  };
}
