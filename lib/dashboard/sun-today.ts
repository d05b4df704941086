// One local date's sunrise and evening civil dusk from the safety rules' own one-day helpers
// (lib/profiles/safety/sun-days.ts), without computing the other 364 days: the dashboard needs today
// only, for every site, on every page load. A unit test holds it equal to planDays over whole years.
import { sunDay } from "@/lib/sun/events";
import { isoDate, wallTime } from "@/lib/sun/time-zone";
import { eveningDusk, type PlanDay, sunrise } from "@/lib/profiles/safety/sun-days";

type Place = { latitude: number; longitude: number };

/** Sunrise and evening civil dusk of one local date at a place, in zone `tz` (a PlanDay). */
export function planDay(place: Place, tz: string, date: string): PlanDay {
  const day = sunDay({ lat: place.latitude, lon: place.longitude, date, tz });
  return { date, sunrise: sunrise(day), dusk: eveningDusk(day, place.latitude, place.longitude, tz) };
}

/** The local calendar date ("YYYY-MM-DD") of an instant in a zone. */
export function localDate(now: Date, tz: string): string {
  return isoDate(wallTime(now.getTime(), tz));
}
