import { describe, expect, it } from "vitest";
import { sunDay, type SunEvent } from "@/lib/sun/events";

const minutesApart = (ours: SunEvent, published: string) => {
  if (ours.time === null) throw new Error(`no event: ${ours.reason}`);
  return Math.abs(Date.parse(ours.time) - Date.parse(published)) / 60_000;
};

describe("sunDay against published almanac times", () => {
  // US Naval Observatory, Astronomical Applications Dept., "Sun and Moon Data for One Day",
  // Washington, DC (38°53′ N, 77°02′ W), 2000 January 1, EST: sunrise 07:27, sunset 16:56 (from memory).
  it("matches the USNO sunrise and sunset for Washington, DC on 2000-01-01 within a minute", () => {
    const d = sunDay({ lat: 38.8833, lon: -77.0333, date: "2000-01-01", tz: "America/New_York" });
    expect(minutesApart(d.sunrise, "2000-01-01T07:27:00-05:00")).toBeLessThanOrEqual(1);
    expect(minutesApart(d.sunset, "2000-01-01T16:56:00-05:00")).toBeLessThanOrEqual(1);
  });

  // Published sunrise/sunset tables for London on the June solstice: about 04:43 and 21:21 BST (from memory).
  it("matches London's solstice sunrise and sunset within two minutes", () => {
    const d = sunDay({ lat: 51.5074, lon: -0.1278, date: "2026-06-21", tz: "Europe/London" });
    expect(minutesApart(d.sunrise, "2026-06-21T04:43:00+01:00")).toBeLessThanOrEqual(2);
    expect(minutesApart(d.sunset, "2026-06-21T21:21:00+01:00")).toBeLessThanOrEqual(2);
  });

  // Published sunrise/sunset tables for New York City on the December solstice: 07:17 and 16:32 EST (from memory).
  it("matches New York's December-solstice sunrise and sunset within two minutes", () => {
    const d = sunDay({ lat: 40.7128, lon: -74.006, date: "2026-12-21", tz: "America/New_York" });
    expect(minutesApart(d.sunrise, "2026-12-21T07:17:00-05:00")).toBeLessThanOrEqual(2);
    expect(minutesApart(d.sunset, "2026-12-21T16:32:00-05:00")).toBeLessThanOrEqual(2);
  });

  // Geometry, not a table: on the equator at an equinox the Sun sinks vertically at 15° an hour,
  // so from −6° to −0.833° takes 5.167 / 15 h ≈ 20.7 min.
  it("puts civil dawn about 21 minutes before sunrise on the equator at an equinox", () => {
    const d = sunDay({ lat: 0, lon: 0, date: "2026-03-20", tz: "UTC" });
    if (d.civilDawn.time === null || d.sunrise.time === null) throw new Error("missing event");
    const gap = (Date.parse(d.sunrise.time) - Date.parse(d.civilDawn.time)) / 60_000;
    expect(gap).toBeGreaterThanOrEqual(20);
    expect(gap).toBeLessThanOrEqual(22);
  });
});
