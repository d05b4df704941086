import { describe, expect, it } from "vitest";
import { sunDay, type SunEvent } from "@/lib/sun/events";
import { julianDayFromMs } from "@/lib/sun/julian-day";
import { solarDay, solarDayNumber } from "@/lib/sun/solar-day";
import { solarCoordinates } from "@/lib/sun/solar-position";
import { lightSpans } from "@/lib/sun/spans";
import { localNoonMs } from "@/lib/sun/time-zone";
import { sunYear } from "@/lib/sun/year";

const TROMSO = { lat: 69.65, lon: 18.96, tz: "Europe/Oslo" };
const noEvent = (e: SunEvent) => (e.time === null ? e : null);

describe("midnight sun and polar night", () => {
  // Tromsø's midnight sun runs from about 20 May to 22 July and its polar night from about
  // 27 November to 15 January (common knowledge, from memory).
  it("has no sunrise or sunset in Tromsø on 21 June: the sun stays up", () => {
    const d = sunDay({ ...TROMSO, date: "2026-06-21" });
    expect(d.sunrise).toEqual({ time: null, status: "always_above", reason: "sun stays above the horizon all day" });
    expect(noEvent(d.sunset)?.reason).toBe("sun stays above the horizon all day");
    expect(noEvent(d.civilDusk)?.status).toBe("always_above");
    expect(d.dayLengthMinutes).toBe(1440);
  });

  it("has no sunrise in Tromsø on 21 December but still a civil dawn and dusk around noon", () => {
    const d = sunDay({ ...TROMSO, date: "2026-12-21" });
    expect(noEvent(d.sunrise)?.reason).toBe("sun stays below the horizon all day");
    expect(noEvent(d.sunset)?.status).toBe("always_below");
    expect(d.civilDawn.time).toMatch(/^2026-12-21T(09|10):\d\d:00\+01:00$/);
    expect(d.civilDusk.time).toMatch(/^2026-12-21T(13|14):\d\d:00\+01:00$/);
    expect(d.dayLengthMinutes).toBe(0);
  });

  it("mirrors in the south: Syowa (69° S) has polar night in June and midnight sun in December", () => {
    const june = sunDay({ lat: -69.0, lon: 39.58, tz: "Antarctica/Syowa", date: "2026-06-21" });
    const dec = sunDay({ lat: -69.0, lon: 39.58, tz: "Antarctica/Syowa", date: "2026-12-21" });
    expect(noEvent(june.sunrise)?.status).toBe("always_below");
    expect(noEvent(dec.sunset)?.status).toBe("always_above");
  });

  // Midnight sun needs 90° − φ − δ < −0.833°, i.e. φ > 66.7° with δ ≤ 23.44°.
  it("finds a sunrise and a sunset every solar day at 65° N; a local day may lose its sunset past midnight", () => {
    const site = { lat: 65, lon: 25.5, tz: "Europe/Helsinki" };
    const days = sunYear({ ...site, year: 2026 }).days;
    for (const d of days) {
      const n = solarDayNumber(julianDayFromMs(localNoonMs({ year: 2026, month: Number(d.date.slice(5, 7)), day: Number(d.date.slice(8)) }, site.tz)), site.lon);
      const sd = solarDay(n, site.lat, site.lon);
      expect(sd.sunrise.ms, d.date).not.toBeNull();
      expect(sd.sunset.ms, d.date).not.toBeNull();
      for (const e of [d.sunrise, d.sunset]) if (e.time === null) expect(e.status, d.date).toBe("other_day");
    }
    // In Helsinki time (UTC+3 in summer, solar noon ~13:17) sunset comes after midnight around the
    // solstice: 21 June shows the evening of the 20th, just after midnight, marked as such.
    expect(days.find((d) => d.date === "2026-06-21")!.sunset).toMatchObject({ time: expect.stringMatching(/^2026-06-21T00:/), note: "the previous day's sunset, after midnight" });
  });
});

describe("civil twilight all night", () => {
  // All-night civil twilight needs the Sun within 6° of the horizon at its lowest: 90° − φ − δ < 6°,
  // so with δ ≤ 23.44° it starts at about 60.6° latitude; exactly 60° N still has a short civil night.
  it("has no civil dusk or dawn in Trondheim (63.4° N) at the June solstice but a sunset", () => {
    const d = sunDay({ lat: 63.43, lon: 10.39, tz: "Europe/Oslo", date: "2026-06-21" });
    expect(d.civilDusk).toMatchObject({ time: null, status: "always_above" });
    expect(d.civilDawn).toMatchObject({ time: null, status: "always_above" });
    expect(d.sunset.time).toMatch(/^2026-06-21T23:\d\d:00\+02:00$/);
  });

  it("still has a civil dusk at exactly 60° N on the solstice", () => {
    expect(sunDay({ lat: 60, lon: 10.75, tz: "Europe/Oslo", date: "2026-06-21" }).civilDusk.time).not.toBeNull();
  });

  it("mirrors in the south: Palmer Station (64.8° S) has civil twilight all night at the December solstice", () => {
    const d = sunDay({ lat: -64.77, lon: -64.05, tz: "Antarctica/Palmer", date: "2026-12-21" });
    expect(d.civilDusk).toMatchObject({ time: null, status: "always_above" });
    expect(d.sunset.time).not.toBeNull();
  });
});

describe("events near local midnight", () => {
  const REYKJAVIK = { lat: 64.15, lon: -21.94, tz: "Atlantic/Reykjavik" };

  it("never reports a time from another calendar day", () => {
    for (const site of [REYKJAVIK, TROMSO, { lat: 1.87, lon: -157.4, tz: "Pacific/Kiritimati" }, { lat: -14.28, lon: -170.7, tz: "Pacific/Pago_Pago" }]) {
      for (const d of sunYear({ ...site, year: 2026 }).days) {
        for (const e of [d.civilDawn, d.sunrise, d.solarNoon, d.sunset, d.civilDusk]) {
          if (e.time !== null) expect(e.time.slice(0, 10)).toBe(d.date);
        }
      }
    }
  });

  it("says when a day's civil dusk falls after midnight, and shows it on the next date with a note", () => {
    const days = sunYear({ ...REYKJAVIK, year: 2026 }).days;
    const crossing = days.findIndex((d) => d.civilDusk.time === null && d.civilDusk.status === "other_day");
    expect(crossing).toBeGreaterThan(0);
    const [before, day, after] = [days[crossing - 1]!, days[crossing]!, days[crossing + 1]!];
    expect(before.civilDusk.time).toMatch(/T23:/);
    expect(noEvent(day.civilDusk)?.reason).toMatch(new RegExp(`falls on ${after.date}`));
    expect(after.civilDusk).toMatchObject({ time: expect.stringMatching(/T00:/), note: "the previous day's civil dusk, after midnight" });
  });

  // A consistency check of the iteration (our own solar coordinates, searched directly, not an
  // outside source): near the first and last nights of midnight sun and all-night twilight the
  // crossing is ill-conditioned, and the hour-angle iteration must still land on the altitude
  // curve's real crossing, or report none when the curve never gets there.
  it.each([
    [64.15, -21.94],
    [69.65, 18.96],
    [66.0, 25.0],
    [60.7, 10.0],
    [-64.77, -64.05],
    [-69.0, 39.58],
  ])("finds the same crossings as a direct search of the altitude curve every day of 2026 at %f, %f", (lat, lon) => {
    const RAD = Math.PI / 180;
    const altitude = (ms: number) => {
      const c = solarCoordinates(julianDayFromMs(ms));
      const utMinutes = (((ms % 86_400_000) + 86_400_000) % 86_400_000) / 60_000;
      const h = ((utMinutes + 4 * lon + c.equationOfTimeMinutes) / 4 - 180) * RAD;
      const [phi, dec] = [lat * RAD, c.declination * RAD];
      return Math.asin(Math.sin(phi) * Math.sin(dec) + Math.cos(phi) * Math.cos(dec) * Math.cos(h)) / RAD;
    };
    // First time the altitude drops through h0 walking from transit towards the lowest point.
    const search = (transit: number, h0: number, sign: number): number | null => {
      const step = 120_000;
      let t0 = transit;
      for (let k = 1; k <= 360; k++) {
        const t1 = transit + sign * k * step;
        if (altitude(t0) > h0 && altitude(t1) <= h0) {
          let [a, b] = [t0, t1];
          for (let j = 0; j < 20; j++) {
            const mid = (a + b) / 2;
            if (altitude(mid) > h0) a = mid;
            else b = mid;
          }
          return (a + b) / 2;
        }
        t0 = t1;
      }
      return null;
    };
    for (let day = 0; day < 365; day++) {
      const noon = Date.UTC(2026, 0, 1 + day, 12) - lon * 240_000;
      const sd = solarDay(solarDayNumber(julianDayFromMs(noon), lon), lat, lon);
      for (const [kind, h0, sign] of [["civilDawn", -6, -1], ["sunrise", -0.833, -1], ["sunset", -0.833, 1], ["civilDusk", -6, 1]] as const) {
        const found = search(sd.transitMs, h0, sign);
        const ours = sd[kind].ms;
        const label = `${new Date(noon).toISOString().slice(0, 10)} ${kind}`;
        if (found === null) expect(ours, label).toBeNull();
        else expect(Math.abs(ours! - found), label).toBeLessThan(15_000);
      }
    }
  });
});

describe("time zones", () => {
  // Central European Summer Time starts on the last Sunday of March at 01:00 UTC (EU Directive 2000/84/EC).
  it("gives Berlin's events +01:00 on 28 March 2026 and +02:00 on 29 March, the day clocks go forward", () => {
    const sat = sunDay({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", date: "2026-03-28" });
    const sun = sunDay({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", date: "2026-03-29" });
    for (const e of [sat.civilDawn, sat.sunrise, sat.sunset, sat.civilDusk]) expect(e.time).toMatch(/\+01:00$/);
    for (const e of [sun.civilDawn, sun.sunrise, sun.sunset, sun.civilDusk]) expect(e.time).toMatch(/\+02:00$/);
    // The clock jumps an hour; the Sun only moves a couple of minutes.
    const clock = (t: string | null) => Number(t!.slice(11, 13)) * 60 + Number(t!.slice(14, 16));
    expect(clock(sun.sunrise.time) - clock(sat.sunrise.time)).toBeGreaterThan(55);
    expect(clock(sun.sunrise.time) - clock(sat.sunrise.time)).toBeLessThan(60);
    expect(sun.utcOffset).toBe("+02:00");
  });

  it("gives Berlin's events +01:00 again on 25 October 2026, the day clocks go back", () => {
    const d = sunDay({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", date: "2026-10-25" });
    expect(d.sunrise.time).toMatch(/^2026-10-25T0\d:\d\d:00\+01:00$/);
  });

  it("computes the local day in a zone 14 hours ahead of UTC (Kiritimati)", () => {
    const d = sunDay({ lat: 1.87, lon: -157.4, tz: "Pacific/Kiritimati", date: "2026-03-01" });
    expect(d.sunrise.time).toMatch(/^2026-03-01T06:\d\d:00\+14:00$/);
    expect(d.sunset.time).toMatch(/^2026-03-01T18:\d\d:00\+14:00$/);
    // Its sunrise is on 28 February in UTC.
    expect(new Date(d.sunrise.time!).toISOString().slice(0, 10)).toBe("2026-02-28");
  });

  it("gives the same site a day apart in UTC across the date line (Kiritimati +14 vs. Honolulu −10)", () => {
    const east = sunDay({ lat: 1.87, lon: -157.4, tz: "Pacific/Kiritimati", date: "2026-03-02" });
    const west = sunDay({ lat: 1.87, lon: -157.4, tz: "Pacific/Honolulu", date: "2026-03-01" });
    expect(Date.parse(east.sunrise.time!)).toBe(Date.parse(west.sunrise.time!));
  });

  it("handles a whole leap year, 366 days, and a 365-day year", () => {
    expect(sunYear({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", year: 2028 }).days).toHaveLength(366);
    expect(sunYear({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", year: 2100 }).days).toHaveLength(365);
  });
});

describe("lightSpans", () => {
  const at = (minuteOfDay: number): SunEvent => ({ time: "x", minuteOfDay });
  it("spans sunrise to sunset on an ordinary day", () => {
    expect(lightSpans(at(300), at(1200))).toEqual([[300, 1200]]);
  });
  it("covers the whole day under the midnight sun and nothing in polar night", () => {
    const up: SunEvent = { time: null, status: "always_above", reason: "" };
    const down: SunEvent = { time: null, status: "always_below", reason: "" };
    expect(lightSpans(up, up)).toEqual([[0, 1440]]);
    expect(lightSpans(down, down)).toEqual([]);
  });
  it("splits the day when the previous evening's dusk falls after midnight", () => {
    const other: SunEvent = { time: null, status: "other_day", reason: "" };
    expect(lightSpans(at(150), at(10))).toEqual([[0, 10], [150, 1440]]);
    expect(lightSpans(at(150), other)).toEqual([[150, 1440]]);
  });
});
