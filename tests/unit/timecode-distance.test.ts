import { describe, expect, it } from "vitest";
import { EARTH_MEAN_RADIUS_KM, haversineKm, initialBearingDeg, TRANSMITTERS, transmitterDistance } from "@/lib/timecode/transmitters";

const dms = (d: number, m: number, sign = 1) => sign * (d + m / 60);

describe("great-circle distance", () => {
  it("uses the IUGG mean Earth radius", () => {
    // R1 = 6 371 008.8 m: H. Moritz, "Geodetic Reference System 1980", Journal of Geodesy 74 (2000) 128–133.
    expect(EARTH_MEAN_RADIUS_KM).toBe(6371.0088);
  });

  it("gives R·π/180 for one degree along a meridian and π·R between antipodes", () => {
    // Arc length on a sphere, s = R·θ (definition).
    expect(haversineKm({ lat: 10, lon: 20 }, { lat: 11, lon: 20 })).toBeCloseTo((EARTH_MEAN_RADIUS_KM * Math.PI) / 180, 6);
    expect(haversineKm({ lat: 0, lon: 0 }, { lat: 0, lon: 180 })).toBeCloseTo(Math.PI * EARTH_MEAN_RADIUS_KM, 6);
    expect(haversineKm({ lat: 90, lon: 0 }, { lat: -90, lon: 0 })).toBeCloseTo(Math.PI * EARTH_MEAN_RADIUS_KM, 6);
  });

  it("agrees with the spherical law of cosines", () => {
    // Spherical trigonometry, law of cosines for sides: cos c = sin φ1 sin φ2 + cos φ1 cos φ2 cos Δλ.
    const r = (d: number) => (d * Math.PI) / 180;
    const pairs = [
      [52.2, 0.12, 50.0156, 9.0108],
      [-33.9, 151.2, 51.5, -0.1],
      [40.6781, -105.0469, 25.8, -80.2],
      [64.1, -21.9, 54.9116, -3.2785],
    ] as const;
    for (const [a, b, c, d] of pairs) {
      const cos = Math.sin(r(a)) * Math.sin(r(c)) + Math.cos(r(a)) * Math.cos(r(c)) * Math.cos(r(d - b));
      expect(haversineKm({ lat: a, lon: b }, { lat: c, lon: d })).toBeCloseTo(EARTH_MEAN_RADIUS_KM * Math.acos(cos), 6);
    }
  });

  it("points north, east, south and west where it should", () => {
    expect(initialBearingDeg({ lat: 0, lon: 0 }, { lat: 10, lon: 0 })).toBeCloseTo(0, 9);
    expect(initialBearingDeg({ lat: 0, lon: 0 }, { lat: 0, lon: 10 })).toBeCloseTo(90, 9);
    expect(initialBearingDeg({ lat: 10, lon: 0 }, { lat: 0, lon: 0 })).toBeCloseTo(180, 9);
    expect(initialBearingDeg({ lat: 0, lon: 10 }, { lat: 0, lon: 0 })).toBeCloseTo(270, 9);
  });
});

describe("transmitters", () => {
  it("sit within 3 km of their operators' rounded positions", () => {
    // MSF: 54° 55′ N, 3° 15′ W, NPL "MSF 60 kHz time and date code".
    expect(haversineKm(TRANSMITTERS.msf, { lat: dms(54, 55), lon: dms(3, 15, -1) })).toBeLessThan(3);
    // DCF77: 50° 01′ N, 9° 00′ E as PTB gives it (from memory).
    expect(haversineKm(TRANSMITTERS.dcf77, { lat: dms(50, 1), lon: dms(9, 0) })).toBeLessThan(3);
    // WWVB: 40° 40′ N, 105° 03′ W (from memory).
    expect(haversineKm(TRANSMITTERS.wwvb, { lat: dms(40, 40), lon: dms(105, 3, -1) })).toBeLessThan(3);
  });

  it("puts an English site within DCF77 and MSF range and far beyond WWVB", () => {
    const site = { lat: 52.2, lon: 0.12 };
    const dcf = transmitterDistance("dcf77", site);
    expect(dcf.distanceKm).toBeGreaterThan(500);
    expect(dcf.distanceKm).toBeLessThan(800);
    expect(dcf.withinUsualRange).toBe(true);
    expect(transmitterDistance("msf", site).withinUsualRange).toBe(true);
    const wwvb = transmitterDistance("wwvb", site);
    expect(wwvb.withinUsualRange).toBe(false);
    expect(wwvb.note).toMatch(/^Beyond the usual range of WWVB/);
    expect(wwvb.note).toMatch(/night/);
  });

  it("lays the ferrite rod at right angles to the bearing", () => {
    const d = transmitterDistance("dcf77", { lat: 50.0156, lon: 0 });
    expect(d.bearingDeg).toBeGreaterThan(80);
    expect(d.bearingDeg).toBeLessThan(100);
    expect(Math.abs(((d.rodAxisDeg - d.bearingDeg + 540) % 180) - 90)).toBeCloseTo(0, 9);
  });
});
