// Today's opening and closing at a site, read the way the safety rules read a schedule
// (lib/profiles/safety/sun-days.ts): sun times per local date to the minute, sunrise + offset and
// civil dusk + offset rounded down to the step grid, no close on a night without civil dusk.
import { migrateV1toV2 } from "@/lib/profiles/migrate";
import { clock, minuteOfDay, num } from "@/lib/profiles/safety/format";
import { floorToStep, type PlanDay } from "@/lib/profiles/safety/sun-days";
import { isValidParams, type DoorParamsV2 } from "@/lib/profiles/schemas";
import { offsetSeconds } from "@/lib/sun/time-zone";
import { localDate, planDay } from "./sun-today";

export type DoorSite = { latitude: number; longitude: number; timeZone: string };
export type DoorNote = { tone: "bad" | "warn" | "info"; text: string };
export type DoorTimes = {
  /** The site's local date today. */
  date: string;
  sunrise: string | null;
  civilDusk: string | null;
  open: string | null;
  close: string | null;
  /** The schedule in words: "opens at sunrise + 15 min, closes at civil dusk + 10 min". */
  rule: string;
  /** How times fall on the step grid, when that matters. */
  step: string | null;
  notes: DoorNote[];
};

type Schedule = DoorParamsV2["schedule"];

/** An effective configuration as a version 2 document (version 1 migrated), or null when it is not valid. */
export function asV2Document(values: Record<string, unknown>): DoorParamsV2 | null {
  if (isValidParams(2, values)) return values;
  if (isValidParams(1, values)) return migrateV1toV2(values);
  return null;
}

const signed = (m: number) => (m === 0 ? "" : m < 0 ? ` − ${num(-m)} min` : ` + ${num(m)} min`);
const latitude = (lat: number) => `${num(Math.abs(lat), 2)}° ${lat >= 0 ? "N" : "S"}`;

/** A schedule in words: "opens at sunrise + 15 min, closes at civil dusk + 10 min" or "opens at 07:00, closes at 21:00 (fixed times)". */
export function describeSchedule(s: Schedule, clockZone?: string): string {
  if (s.kind === "sun") return `opens at sunrise${signed(s.sunriseOffsetMinutes)}, closes at civil dusk${signed(s.civilDuskOffsetMinutes)}`;
  return `opens at ${s.openAt}, closes at ${s.closeAt}${clockZone ? ` ${clockZone} time` : ""} (fixed times)`;
}

export type SunToday = Pick<DoorTimes, "date" | "sunrise" | "civilDusk">;

/** Today's local date, sunrise and evening civil dusk at a site, for a site without doors to schedule. */
export function sunTimesToday(site: DoorSite, now: Date): SunToday {
  const date = localDate(now, site.timeZone);
  const day = planDay(site, site.timeZone, date);
  return { date, sunrise: day.sunrise.minute === null ? null : clock(day.sunrise.minute), civilDusk: day.dusk.minute === null ? null : clock(day.dusk.minute) };
}

/** Today's door times at a site for a schedule document, in the site's time zone, with what to watch. */
export function doorTimesToday({ site, doc, now }: { site: DoorSite; doc: DoorParamsV2; now: Date }): DoorTimes {
  const tz = site.timeZone;
  const date = localDate(now, tz);
  const day = planDay(site, tz, date);
  const s = doc.schedule;
  const notes: DoorNote[] = [];
  const zoneDiffers = doc.timeZone !== tz;
  let open: number | null;
  let close: number | null;
  if (s.kind === "sun") {
    open = day.sunrise.minute === null ? null : floorToStep(day.sunrise.minute + s.sunriseOffsetMinutes, s.stepMinutes);
    close = day.dusk.minute === null ? null : floorToStep(day.dusk.minute + s.civilDuskOffsetMinutes, s.stepMinutes);
    notes.push(...sunNotes(s, day, open, close, site));
    if (zoneDiffers) {
      notes.push({ tone: "warn", text: `This configuration keeps its clock on ${doc.timeZone}, not the site's ${tz} (RL-TIME-ZONE): sun times stay the same, but its display and step grid follow ${doc.timeZone}.` });
    }
  } else {
    // A fixed time is a wall time in the configuration's own zone; shown here in the site's.
    const shift = zoneDiffers ? Math.round((offsetSeconds(now.getTime(), doc.timeZone) - offsetSeconds(now.getTime(), tz)) / 60) : 0;
    open = wrap(minuteOfDay(s.openAt) - shift);
    close = wrap(minuteOfDay(s.closeAt) - shift);
    notes.push(...fixedNotes(s, day, open, close));
    if (zoneDiffers) {
      notes.push({ tone: "warn", text: `This configuration keeps its clock on ${doc.timeZone}, not the site's ${tz} (RL-TIME-ZONE): its fixed times run on ${doc.timeZone} time, ${shiftWords(shift)} here.` });
    }
  }
  return {
    date,
    sunrise: day.sunrise.minute === null ? null : clock(day.sunrise.minute),
    civilDusk: day.dusk.minute === null ? null : clock(day.dusk.minute),
    open: open === null ? null : clock(open),
    close: close === null ? null : clock(close),
    rule: describeSchedule(s, s.kind === "fixed" && zoneDiffers ? doc.timeZone : undefined),
    step: s.kind === "sun" && s.stepMinutes > 1 ? `Each time rounded down to the ${num(s.stepMinutes)}-minute step (assumed controller behaviour).` : null,
    notes,
  };
}

const wrap = (m: number) => ((m % 1440) + 1440) % 1440;

function shiftWords(shift: number): string {
  if (shift === 0) return "today the same clock time as";
  return `${num(Math.abs(shift) / 60, 2)} h ${shift > 0 ? "earlier" : "later"}`;
}

function sunNotes(s: Extract<Schedule, { kind: "sun" }>, day: PlanDay, open: number | null, close: number | null, site: DoorSite): DoorNote[] {
  const notes: DoorNote[] = [];
  const { dusk, sunrise } = day;
  if (dusk.minute === null) {
    if (dusk.missing === "always_above") {
      notes.push({
        tone: "bad",
        text: `No civil dusk tonight at ${latitude(site.latitude)}: the sun stays less than 6° below the horizon all night. The sun schedule has no close time, and the controller is assumed to leave the door open all night; use a fixed close time for these weeks.`,
      });
    } else if (dusk.missing === "other_day") {
      notes.push({ tone: "warn", text: `Tonight's civil dusk falls on another local date in ${site.timeZone}: the sun schedule has no close time tonight, and the controller is assumed to leave the door open.` });
    } else {
      notes.push({ tone: "info", text: "The sun stays more than 6° below the horizon all day: no sunrise and no civil dusk, so the door is assumed to stay as it is." });
    }
  }
  if (sunrise.minute === null && dusk.minute !== null) {
    notes.push({
      tone: "info",
      text: sunrise.missing === "always_below" ? "The sun does not rise today (polar night): no open time, and the controller is assumed to keep the door shut all day." : "There is no sunrise on this local date: no open time today, and the door is assumed to stay as it is.",
    });
  }
  if (close !== null && dusk.minute !== null) {
    if (close >= 1440) notes.push({ tone: "warn", text: `Civil dusk${signed(s.civilDuskOffsetMinutes)} falls after local midnight tonight: whether the controller closes then or skips the night is to be confirmed against the firmware.` });
    if (close < dusk.minute) {
      const by = dusk.minute - close;
      notes.push(
        s.civilDuskOffsetMinutes < 0
          ? { tone: "bad", text: `The door closes ${num(by)} min before civil dusk: hens still out are shut out for the night.` }
          : { tone: "warn", text: `Rounded down to the ${num(s.stepMinutes)}-minute step, the door closes ${num(by)} min before civil dusk today.` },
      );
    }
  }
  if (open !== null && sunrise.minute !== null && open < sunrise.minute) {
    notes.push({ tone: "warn", text: `The door opens ${num(sunrise.minute - open)} min before sunrise: birds go out while predators are still about.` });
  }
  if (open !== null && close !== null && open >= close) {
    notes.push({ tone: "bad", text: "Today the opening falls at or after the closing: the door would close, then open in the dark and stay open through the night." });
  }
  return notes;
}

function fixedNotes(s: Extract<Schedule, { kind: "fixed" }>, day: PlanDay, open: number, close: number): DoorNote[] {
  const notes: DoorNote[] = [];
  const { dusk, sunrise } = day;
  if (dusk.minute !== null && close < dusk.minute) {
    notes.push({ tone: "bad", text: `The fixed close at ${s.closeAt} is ${num(dusk.minute - close)} min before civil dusk today: hens still out are shut out for the night.` });
  }
  if (dusk.minute === null && dusk.missing !== "always_below") {
    notes.push({ tone: "info", text: `There is no civil dusk tonight: the fixed close at ${s.closeAt} acts in twilight, while some birds may still be out.` });
  }
  if (sunrise.minute !== null && open < sunrise.minute) {
    notes.push({ tone: "warn", text: `The fixed open at ${s.openAt} is ${num(sunrise.minute - open)} min before sunrise today: birds go out while predators are still about.` });
  }
  if (sunrise.minute === null && sunrise.missing === "always_below") {
    notes.push({ tone: "warn", text: `The sun does not rise today: the fixed open at ${s.openAt} lets the birds out in the dark.` });
  }
  return notes;
}
