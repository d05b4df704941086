// Sun events of one local calendar day in an IANA zone. An event is reported only when its
// local wall date is that day: at high latitude or in zones far from solar time a dusk can
// fall after midnight, and a door schedule must never act on another day's time.

import type { SunDayInput } from "./inputs";
import { julianDayFromMs } from "./julian-day";
import { solarDay, solarDayNumber, type Crossing, type SolarDay } from "./solar-day";
import { formatOffset, isoDate, isoWithOffset, localNoonMs, localParts, offsetSeconds, roundToLocalMinute } from "./time-zone";

export type EventKind = "civilDawn" | "sunrise" | "solarNoon" | "sunset" | "civilDusk";
export type NoEventStatus = "always_above" | "always_below" | "other_day";

/** One event: local ISO-8601 time with offset (rounded to the nearest minute), or null with a reason. */
export type SunEvent =
  | { time: string; minuteOfDay: number; note?: string }
  | { time: null; status: NoEventStatus; reason: string };

export type SunDay = {
  date: string;
  latitude: number;
  longitude: number;
  timeZone: string;
  /** UTC offset at local noon; events carry their own offset. */
  utcOffset: string;
  civilDawn: SunEvent;
  sunrise: SunEvent;
  solarNoon: SunEvent;
  sunset: SunEvent;
  civilDusk: SunEvent;
  /** Sunrise to sunset of this day's Sun in whole minutes; 1440 under midnight sun, 0 in polar night. */
  dayLengthMinutes: number;
};

/** Looks up (and may cache) a solar day by number. */
export type SolarDayLookup = (n: number) => SolarDay;

export const EVENT_LABELS: Record<EventKind, string> = {
  civilDawn: "civil dawn",
  sunrise: "sunrise",
  solarNoon: "solar noon",
  sunset: "sunset",
  civilDusk: "civil dusk",
};

const REASONS: Record<Exclude<EventKind, "solarNoon">, Record<"always_above" | "always_below", string>> = {
  civilDawn: { always_above: "sun stays above −6° all night (civil twilight all night)", always_below: "sun stays more than 6° below the horizon all day" },
  civilDusk: { always_above: "sun stays above −6° all night (civil twilight all night)", always_below: "sun stays more than 6° below the horizon all day" },
  sunrise: { always_above: "sun stays above the horizon all day", always_below: "sun stays below the horizon all day" },
  sunset: { always_above: "sun stays above the horizon all day", always_below: "sun stays below the horizon all day" },
};

const parseDate = (date: string) => {
  const [year, month, day] = date.split("-").map(Number);
  return { year: year!, month: month!, day: day! };
};

function localEvent(ms: number, tz: string): { date: string; event: { time: string; minuteOfDay: number } } {
  const { wall: w, offsetSeconds: off } = localParts(roundToLocalMinute(ms, tz), tz);
  return { date: isoDate(w), event: { time: isoWithOffset(w, off), minuteOfDay: w.hour * 60 + w.minute } };
}

function pick(kind: EventKind, date: string, tz: string, own: Crossing, prev: Crossing, next: Crossing): SunEvent {
  if (own.ms !== null) {
    const mine = localEvent(own.ms, tz);
    if (mine.date === date) return mine.event;
  }
  const label = EVENT_LABELS[kind];
  for (const [other, note] of [
    [prev, `the previous day's ${label}, after midnight`],
    [next, `the next day's ${label}, before midnight`],
  ] as const) {
    if (other.ms === null) continue;
    const theirs = localEvent(other.ms, tz);
    if (theirs.date === date) return { ...theirs.event, note };
  }
  if (own.ms === null) {
    const reasons = kind === "solarNoon" ? null : REASONS[kind];
    return { time: null, status: own.status, reason: reasons ? reasons[own.status] : "no transit" };
  }
  return { time: null, status: "other_day", reason: `this day's ${label} falls on ${localEvent(own.ms, tz).date} in this time zone` };
}

function dayLength(d: SolarDay): number {
  if (d.sunrise.ms !== null && d.sunset.ms !== null) return Math.round((d.sunset.ms - d.sunrise.ms) / 60_000);
  const up = (d.sunrise.ms === null && d.sunrise.status === "always_above") || (d.sunset.ms === null && d.sunset.status === "always_above");
  return up ? 1440 : 0;
}

/** Sun events for a local calendar day, using `lookup` to share solar days between neighbouring dates. */
export function sunDayWith(input: SunDayInput, lookup: SolarDayLookup): SunDay {
  const { lat, lon, date, tz } = input;
  const noon = localNoonMs(parseDate(date), tz);
  const n = solarDayNumber(julianDayFromMs(noon), lon);
  const [prev, own, next] = [lookup(n - 1), lookup(n), lookup(n + 1)];
  const at = (kind: Exclude<EventKind, "solarNoon">) => pick(kind, date, tz, own[kind], prev[kind], next[kind]);
  return {
    date,
    latitude: lat,
    longitude: lon,
    timeZone: tz,
    utcOffset: formatOffset(offsetSeconds(noon, tz)),
    civilDawn: at("civilDawn"),
    sunrise: at("sunrise"),
    solarNoon: pick("solarNoon", date, tz, { ms: own.transitMs }, { ms: prev.transitMs }, { ms: next.transitMs }),
    sunset: at("sunset"),
    civilDusk: at("civilDusk"),
    dayLengthMinutes: dayLength(own),
  };
}

/** Sunrise, sunset, civil dawn, civil dusk and solar noon for a site on a local calendar day. */
export function sunDay(input: SunDayInput): SunDay {
  return sunDayWith(input, (n) => solarDay(n, input.lat, input.lon));
}
