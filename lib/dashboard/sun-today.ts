// One local date's sunrise and evening civil dusk, exactly as the safety rules' year plan
// (lib/profiles/safety/sun-days.ts planDays) has them, without computing the other 364 days: the
// dashboard needs today only, for every site, on every page load. A unit test holds the two equal
// over whole years at several latitudes.
import { sunDay, type SunDay } from "@/lib/sun/events";
import { julianDayFromMs } from "@/lib/sun/julian-day";
import { solarDay, solarDayNumber } from "@/lib/sun/solar-day";
import { isoDate, localNoonMs, localParts, roundToLocalMinute, wallTime } from "@/lib/sun/time-zone";
import type { Dusk, PlanDay, Sunrise } from "@/lib/profiles/safety/sun-days";

type Place = { latitude: number; longitude: number };

const dayMs = (date: string) => {
  const [year, month, day] = date.split("-").map(Number);
  return Date.UTC(year!, month! - 1, day!);
};

// As in sun-days.ts: when this evening's civil dusk is not on the day's own listing (it comes after
// midnight, or a neighbouring day's dusk took the slot), take the crossing of the date's own solar day.
function eveningDusk(day: SunDay, lat: number, lon: number, tz: string): Dusk {
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

/** Sunrise and evening civil dusk of one local date at a place, in zone `tz` (a PlanDay). */
export function planDay(place: Place, tz: string, date: string): PlanDay {
  const day = sunDay({ lat: place.latitude, lon: place.longitude, date, tz });
  const sunrise: Sunrise = day.sunrise.time !== null ? { minute: day.sunrise.minuteOfDay } : { minute: null, missing: day.sunrise.status };
  return { date, sunrise, dusk: eveningDusk(day, place.latitude, place.longitude, tz) };
}

/** The local calendar date ("YYYY-MM-DD") of an instant in a zone. */
export function localDate(now: Date, tz: string): string {
  return isoDate(wallTime(now.getTime(), tz));
}
