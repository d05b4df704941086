// A whole year of local sun days for one site. Neighbouring dates share solar days, so each
// solar day is computed once and looked up three times.

import { sunDayWith, type SunDay } from "./events";
import type { SunYearInput } from "./inputs";
import { solarDay, type SolarDay } from "./solar-day";
import { isoDate } from "./time-zone";

export type SunYear = {
  year: number;
  latitude: number;
  longitude: number;
  timeZone: string;
  days: SunDay[];
};

/** Whether a Gregorian year has 29 February. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Every date of a year as "YYYY-MM-DD". */
export function datesOfYear(year: number): string[] {
  const lengths = [31, isLeapYear(year) ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  return lengths.flatMap((len, m) => Array.from({ length: len }, (_, d) => isoDate({ year, month: m + 1, day: d + 1 })));
}

/** Sun events for every local calendar day of a year (365 or 366 days), daylight-saving aware. */
export function sunYear(input: SunYearInput): SunYear {
  const { lat, lon, year, tz } = input;
  const cache = new Map<number, SolarDay>();
  const lookup = (n: number) => {
    let d = cache.get(n);
    if (!d) {
      d = solarDay(n, lat, lon);
      cache.set(n, d);
    }
    return d;
  };
  const days = datesOfYear(year).map((date) => sunDayWith({ lat, lon, date, tz }, lookup));
  return { year, latitude: lat, longitude: lon, timeZone: tz, days };
}
