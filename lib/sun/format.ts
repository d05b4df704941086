// Plain-text renderings shared by the CLI and the page's text alternative.

import type { SunDay, SunEvent } from "./events";
import type { SunYear } from "./year";

/** "04:43" from an event's local time, or "—" when the event does not happen that day. */
export function clockTime(event: SunEvent): string {
  return event.time === null ? "—" : event.time.slice(11, 16);
}

/** "16 h 38 min" from minutes. */
export function formatDuration(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return `${h} h ${String(m).padStart(2, "0")} min`;
}

export const YEAR_CSV_HEADER = "date,civil_dawn,sunrise,sunset,civil_dusk,day_length_min";

/** A year as CSV: local ISO-8601 times with offset, an empty cell where the event does not happen. */
export function yearCsv(year: SunYear): string {
  const cell = (e: SunEvent) => e.time ?? "";
  const rows = year.days.map((d: SunDay) => [d.date, cell(d.civilDawn), cell(d.sunrise), cell(d.sunset), cell(d.civilDusk), String(d.dayLengthMinutes)].join(","));
  return [YEAR_CSV_HEADER, ...rows].join("\n");
}
