// Light spans of a local day for the year chart, in minutes after local midnight. Works from
// the events actually on that date, so polar days, all-night twilight and a dusk that belongs
// to the previous evening all draw correctly.

import type { SunEvent } from "./events";

export type Span = [from: number, to: number];

/** Minutes after local midnight between an upward crossing (`up`) and a downward one (`down`). */
export function lightSpans(up: SunEvent, down: SunEvent, dayMinutes = 1440): Span[] {
  const marks: { t: number; rising: boolean }[] = [];
  if (up.time !== null) marks.push({ t: up.minuteOfDay, rising: true });
  if (down.time !== null) marks.push({ t: down.minuteOfDay, rising: false });
  if (marks.length === 0) {
    const above = (up.time === null && up.status === "always_above") || (down.time === null && down.status === "always_above");
    return above ? [[0, dayMinutes]] : [];
  }
  marks.sort((a, b) => a.t - b.t);
  // Before the first crossing the Sun is on the side that crossing leaves.
  let light = !marks[0]!.rising;
  let from = 0;
  const spans: Span[] = [];
  for (const m of marks) {
    if (m.rising && !light) {
      light = true;
      from = m.t;
    } else if (!m.rising && light) {
      if (m.t > from) spans.push([from, m.t]);
      light = false;
    }
  }
  if (light && dayMinutes > from) spans.push([from, dayMinutes]);
  return spans;
}
