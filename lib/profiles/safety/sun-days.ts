// Each day of the year at the site as the controller would schedule it. Assumptions about the
// firmware, to be confirmed against its specification (none is published):
// - sun times are taken per local date in the site's time zone, to the minute;
// - the open and close times are sunrise + offset and civil dusk + offset, rounded DOWN to the step
//   grid (truncation, what a minute counter divided by the step gives; the worst case for both);
// - on a night without civil dusk the door is not closed, on a day without sunrise it is not opened.
import type { SunDay } from "@/lib/sun/events";
import { julianDayFromMs } from "@/lib/sun/julian-day";
import { solarDay, solarDayNumber } from "@/lib/sun/solar-day";
import { isoDate, localNoonMs, localParts, roundToLocalMinute } from "@/lib/sun/time-zone";
import { sunYear } from "@/lib/sun/year";
import type { Site } from "./types";

export type Missing = "always_above" | "always_below" | "other_day";

/** Evening civil dusk in minutes after the date's midnight (≥ 1440 when it falls after midnight), or why there is none. */
export type Dusk = { minute: number; afterMidnight: boolean } | { minute: null; missing: Missing };
export type Sunrise = { minute: number } | { minute: null; missing: Missing };

export type PlanDay = { date: string; sunrise: Sunrise; dusk: Dusk };

const dayMs = (date: string) => {
  const [year, month, day] = date.split("-").map(Number);
  return Date.UTC(year!, month! - 1, day!);
};

// The day's listing keeps only events on its own local date. When this evening's civil dusk is not
// there (it comes after midnight, or a neighbouring day's dusk took the slot), take the crossing of the
// date's own solar day, as events.ts numbers it, and place it relative to this date's midnight.
/** This evening's civil dusk for one day's listing (shared with the dashboard's one-day plan). */
export function eveningDusk(day: SunDay, lat: number, lon: number, tz: string): Dusk {
  const own = day.civilDusk;
  if (own.time !== null && own.note === undefined) return { minute: own.minuteOfDay, afterMidnight: false };
  const [year, month, d] = day.date.split("-").map(Number);
  const n = solarDayNumber(julianDayFromMs(localNoonMs({ year: year!, month: month!, day: d! }, tz)), lon);
  const crossing = solarDay(n, lat, lon).civilDusk;
  if (crossing.ms === null) return { minute: null, missing: crossing.status };
  const { wall } = localParts(roundToLocalMinute(crossing.ms, tz), tz);
  const days = Math.round((dayMs(isoDate(wall)) - dayMs(day.date)) / 86_400_000);
  if (days === 0 || days === 1) return { minute: days * 1440 + wall.hour * 60 + wall.minute, afterMidnight: days === 1 };
  return { minute: null, missing: "other_day" };
}

/** One day's sunrise as a plan entry. */
export function sunrise(day: SunDay): Sunrise {
  const e = day.sunrise;
  return e.time !== null ? { minute: e.minuteOfDay } : { minute: null, missing: e.status };
}

/** Sunrise and evening civil dusk of every local date of `year` at the site, in time zone `tz`. */
export function planDays(site: Pick<Site, "latitude" | "longitude">, tz: string, year: number): PlanDay[] {
  const lat = site.latitude;
  const lon = site.longitude;
  return sunYear({ lat, lon, year, tz }).days.map((d) => ({ date: d.date, sunrise: sunrise(d), dusk: eveningDusk(d, lat, lon, tz) }));
}

/** A time rounded down to the step grid from midnight. */
export function floorToStep(minute: number, step: number): number {
  return Math.floor(minute / step) * step;
}
