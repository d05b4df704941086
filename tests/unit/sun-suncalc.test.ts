// Agreement with the suncalc package (v2.0.2), a general-purpose reference implementation of the
// same Meeus formulas. Its own approximations: it works per solar day in UTC instants, has no
// notion of a local calendar day, starts each crossing from the declination at transit and
// decides whether an event happens from that noon declination alone, so on a boundary night it
// may miss (or invent) a brief crossing. Both compute ~0.01° solar coordinates, so the times
// agree to seconds, except within ~40 minutes of the Sun's lowest point on the first and last
// nights of midnight sun or all-night twilight, where 0.01° of declination moves the time by
// many minutes. Those crossings are checked against a direct search of the altitude curve in
// sun-polar.test.ts instead. (suncalc 2 returns null, not NaN, for an event that does not occur.)
import * as SunCalc from "suncalc";
import { describe, expect, it } from "vitest";
import { sunDay, type SunDay } from "@/lib/sun/events";
import { julianDayFromMs } from "@/lib/sun/julian-day";
import { solarDay, solarDayNumber } from "@/lib/sun/solar-day";
import { localNoonMs } from "@/lib/sun/time-zone";
import { datesOfYear, sunYear } from "@/lib/sun/year";

const PAIRS = [
  ["civilDawn", "dawn"],
  ["sunrise", "sunrise"],
  ["sunset", "sunset"],
  ["civilDusk", "dusk"],
] as const;

const SITES = [
  { name: "equator (Kampala's longitude)", lat: 0, lon: 32.58, tz: "Africa/Kampala" },
  { name: "40° N (Boulder)", lat: 40, lon: -105.27, tz: "America/Denver" },
  { name: "37.5° S (Melbourne)", lat: -37.5, lon: 144.96, tz: "Australia/Melbourne" },
  { name: "55° N (Newcastle)", lat: 55, lon: -1.61, tz: "Europe/London" },
  { name: "55° S (Ushuaia)", lat: -54.8, lon: -68.3, tz: "America/Argentina/Ushuaia" },
  { name: "64° N (Reykjavík)", lat: 64.15, lon: -21.94, tz: "Atlantic/Reykjavik" },
  { name: "64° N (Trøndelag)", lat: 64, lon: 11.5, tz: "Europe/Oslo" },
] as const;

const NEAR_NADIR_MS = 40 * 60_000;
const nearNadir = (ms: number, noonMs: number) => Math.min(Math.abs(ms - (noonMs - 43_200_000)), Math.abs(ms - (noonMs + 43_200_000))) < NEAR_NADIR_MS;

const dateParts = (date: string) => {
  const [year, month, day] = date.split("-").map(Number);
  return { year: year!, month: month!, day: day! };
};

describe.each(SITES)("solar days at $name agree with suncalc", ({ lat, lon, tz }) => {
  for (const year of [2026, 2028]) {
    it(`gives every crossing of ${year} within one minute, and no event where suncalc has none`, () => {
      let compared = 0;
      for (const date of datesOfYear(year)) {
        const noon = localNoonMs(dateParts(date), tz);
        const ours = solarDay(solarDayNumber(julianDayFromMs(noon), lon), lat, lon);
        const ref = SunCalc.getTimes(new Date(ours.transitMs), lat, lon);
        expect(Math.abs(ours.transitMs - ref.solarNoon.getTime()), `${date} solar noon`).toBeLessThan(60_000);
        for (const [mine, theirs] of PAIRS) {
          const a = ours[mine];
          const b = ref[theirs];
          if (b === null || b === undefined || Number.isNaN(b.getTime())) {
            // suncalc decides from the noon declination; on a boundary night we may find a crossing
            // close to the Sun's lowest point, which the direct search in sun-polar.test.ts confirms.
            if (a.ms !== null) expect(nearNadir(a.ms, ours.transitMs), `${date} ${mine}: suncalc has none`).toBe(true);
            continue;
          }
          if (nearNadir(b.getTime(), ref.solarNoon.getTime())) continue;
          expect(a.ms, `${date} ${mine}: suncalc has ${b.toISOString()}`).not.toBeNull();
          expect(Math.abs(a.ms! - b.getTime()), `${date} ${mine}`).toBeLessThan(60_000);
          compared++;
        }
      }
      expect(compared).toBeGreaterThan(datesOfYear(year).length * 3);
    });
  }
});

describe.each(SITES)("local days at $name agree with suncalc", ({ lat, lon, tz }) => {
  it("reports suncalc's time, rounded to the minute, for each event that falls on its own date", () => {
    const days: SunDay[] = sunYear({ lat, lon, year: 2026, tz }).days;
    for (const d of days) {
      const noon = localNoonMs(dateParts(d.date), tz);
      const ref = SunCalc.getTimes(new Date(noon), lat, lon);
      for (const [mine, theirs] of PAIRS) {
        const a = d[mine];
        const b = ref[theirs];
        if (b === null || b === undefined) {
          // suncalc's solar day has no such event; ours may still show the previous evening's dusk
          // after midnight, or a boundary-night crossing close to the Sun's lowest point.
          if (a.time !== null && !a.note) expect(nearNadir(Date.parse(a.time), ref.solarNoon.getTime()), `${d.date} ${mine}`).toBe(true);
          continue;
        }
        if (a.time === null || a.note || nearNadir(b.getTime(), ref.solarNoon.getTime())) continue;
        expect(Math.abs(Date.parse(a.time) - b.getTime()), `${d.date} ${mine}`).toBeLessThanOrEqual(60_000);
      }
    }
  });
});

describe("one day through sunDay and suncalc", () => {
  it("agrees for Melbourne on the first day of daylight saving (2026-10-04)", () => {
    const d = sunDay({ lat: -37.81, lon: 144.96, date: "2026-10-04", tz: "Australia/Melbourne" });
    const ref = SunCalc.getTimes(new Date(localNoonMs({ year: 2026, month: 10, day: 4 }, "Australia/Melbourne")), -37.81, 144.96);
    expect(d.sunrise.time).toMatch(/\+11:00$/);
    expect(Math.abs(Date.parse(d.sunrise.time!) - ref.sunrise!.getTime())).toBeLessThanOrEqual(60_000);
    expect(Math.abs(Date.parse(d.sunset.time!) - ref.sunset!.getTime())).toBeLessThanOrEqual(60_000);
  });
});
