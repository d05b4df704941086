// Where the transmitters are and how far a site is from them.
import type { Standard } from "./types";

/**
 * Mean Earth radius R1 = (2a + b)/3 of GRS 80, as recommended by the IUGG: H. Moritz, "Geodetic
 * Reference System 1980", Journal of Geodesy 74 (2000) 128–133.
 */
export const EARTH_MEAN_RADIUS_KM = 6371.0088;

export type Transmitter = {
  standard: Standard;
  callSign: string;
  site: string;
  lat: number;
  lon: number;
  frequencyKHz: number;
  /** Distance within which daytime reception is usually dependable (common practice). */
  usualRangeKm: number;
  rangeText: string;
};

// Coordinates from memory; each agrees within a few km with its operator's rounded position.
export const TRANSMITTERS: Record<Standard, Transmitter> = {
  dcf77: {
    standard: "dcf77",
    callSign: "DCF77",
    site: "Mainflingen, near Frankfurt am Main, Germany",
    lat: 50.0156,
    lon: 9.0108,
    frequencyKHz: 77.5,
    usualRangeKm: 2000,
    rangeText: "about 2000 km",
  },
  msf: {
    standard: "msf",
    callSign: "MSF",
    site: "Anthorn, Cumbria, United Kingdom",
    lat: 54.9116,
    lon: -3.2785,
    frequencyKHz: 60,
    usualRangeKm: 1000,
    rangeText: "about 1000 km by day, up to about 1500 km at night",
  },
  wwvb: {
    standard: "wwvb",
    callSign: "WWVB",
    site: "near Fort Collins, Colorado, United States",
    lat: 40.6781,
    lon: -105.0469,
    frequencyKHz: 60,
    usualRangeKm: 2000,
    rangeText: "varies widely; most of the contiguous US at night, much less by day",
  },
};

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

/** Great-circle distance in km between two points (haversine, mean Earth radius). */
export function haversineKm(a: { lat: number; lon: number }, b: { lat: number; lon: number }): number {
  const dLat = rad(b.lat - a.lat);
  const dLon = rad(b.lon - a.lon);
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(rad(a.lat)) * Math.cos(rad(b.lat)) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_MEAN_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Initial great-circle bearing from a to b, degrees clockwise from true north (0–360). */
export function initialBearingDeg(a: { lat: number; lon: number }, b: { lat: number; lon: number }): number {
  const dLon = rad(b.lon - a.lon);
  const y = Math.sin(dLon) * Math.cos(rad(b.lat));
  const x = Math.cos(rad(a.lat)) * Math.sin(rad(b.lat)) - Math.sin(rad(a.lat)) * Math.cos(rad(b.lat)) * Math.cos(dLon);
  return (deg(Math.atan2(y, x)) + 360) % 360;
}

export type TransmitterDistance = {
  transmitter: Transmitter;
  distanceKm: number;
  bearingDeg: number;
  /** Direction (0–180°) to lay a ferrite-rod antenna: broadside to the transmitter. */
  rodAxisDeg: number;
  withinUsualRange: boolean;
  note: string;
};

/** Distance and direction from a site to a standard's transmitter, with a reception note. */
export function transmitterDistance(standard: Standard, site: { lat: number; lon: number }): TransmitterDistance {
  const t = TRANSMITTERS[standard];
  const distanceKm = haversineKm(site, t);
  const bearingDeg = initialBearingDeg(site, t);
  const within = distanceKm <= t.usualRangeKm;
  // A ferrite rod picks up most when its axis is at right angles to the direction of the station (common practice).
  const rodAxisDeg = (bearingDeg + 90) % 180;
  const note = within
    ? `Within the usual range of ${t.callSign} (${t.rangeText}). Reception is usually better at night and away from switch-mode supplies, motor drivers and LED lighting (common practice).`
    : `Beyond the usual range of ${t.callSign} (${t.rangeText}). Expect reception mostly at night, if at all; plan for the clock to run on its own between good frames (common practice).`;
  return { transmitter: t, distanceKm, bearingDeg, rodAxisDeg, withinUsualRange: within, note };
}
