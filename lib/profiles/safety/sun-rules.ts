// The schedule against the site's sunrise and civil dusk on every day of the year.
import type { FixedTimesSchedule, SunFollowingSchedule } from "@/schemas/generated/door-params-v2";
import { dateRanges, days, minuteOfDay, num } from "./format";
import { finding } from "./rules";
import { floorToStep, planDays, type PlanDay } from "./sun-days";
import type { RuleCheck, SafetyFinding, Site } from "./types";

type Hit = { i: number; by: number };

const signed = (m: number) => (m < 0 ? `−${num(-m)} min` : `+${num(m)} min`);
const ofAll = (count: number, total: number, what: string) =>
  count === total ? `on every one of the ${days(total)} with ${what}` : `on ${days(count)} of the ${days(total)} with ${what}`;
const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const latitude = (site: Site) => `${num(Math.abs(site.latitude), 2)}° ${site.latitude >= 0 ? "N" : "S"}`;

/** RL-DUSK-CLOSE, RL-SUNRISE-OPEN, RL-POLAR and the sun form of RL-SCHEDULE-ORDER, from one year of sun times. */
export const checkSunSchedule: RuleCheck = ({ doc, ctx, year }) => {
  if (!ctx.site) return [];
  // The site's zone, not the document's: when they differ RL-TIME-ZONE blocks approval, and the days are
  // judged as the schedule will run once the zone is put right.
  const plan = planDays(ctx.site, ctx.site.timeZone, year);
  const s = doc.schedule;
  return s.kind === "sun" ? sunForm(s, plan, ctx.site) : fixedForm(s, plan, ctx.site);
};

function summary(plan: PlanDay[], hits: readonly Hit[] | readonly number[]): { count: number; when: string; dates: string[]; maxBy: number } {
  const idx = hits.map((h) => (typeof h === "number" ? h : h.i));
  const maxBy = hits.reduce<number>((m, h) => (typeof h === "number" ? m : Math.max(m, h.by)), 0);
  const dates = plan.map((d) => d.date);
  return { count: idx.length, when: dateRanges(dates, idx), dates: idx.map((i) => dates[i]!), maxBy };
}

function sunForm(s: SunFollowingSchedule, plan: PlanDay[], site: Site): SafetyFinding[] {
  const step = s.stepMinutes;
  const offOpen = s.sunriseOffsetMinutes;
  const offClose = s.civilDuskOffsetMinutes;
  const early: Hit[] = [];
  const earlyOpen: Hit[] = [];
  const order: number[] = [];
  const openAllNight: number[] = [];
  const duskOtherDate: number[] = [];
  const darkAllDay: number[] = [];
  const noSunrise: number[] = [];
  let midnightSun = 0;
  const afterMidnight: number[] = [];
  let duskDays = 0;
  let sunriseDays = 0;
  plan.forEach((d, i) => {
    const close = d.dusk.minute === null ? null : floorToStep(d.dusk.minute + offClose, step);
    const open = d.sunrise.minute === null ? null : floorToStep(d.sunrise.minute + offOpen, step);
    if (d.dusk.minute !== null && close !== null) {
      duskDays++;
      if (close < d.dusk.minute) early.push({ i, by: d.dusk.minute - close });
      if (close >= 1440) afterMidnight.push(i);
    } else if (d.dusk.minute === null) {
      if (d.dusk.missing === "always_below") darkAllDay.push(i);
      else if (d.dusk.missing === "other_day") duskOtherDate.push(i);
      else openAllNight.push(i);
    }
    if (d.sunrise.minute !== null && open !== null) {
      sunriseDays++;
      if (open < d.sunrise.minute) earlyOpen.push({ i, by: d.sunrise.minute - open });
    } else if (d.sunrise.minute === null && d.sunrise.missing === "always_below" && d.dusk.minute !== null) {
      noSunrise.push(i);
    } else if (d.sunrise.minute === null && d.sunrise.missing === "always_above") {
      midnightSun++;
    }
    if (open !== null && close !== null && open >= close) order.push(i);
  });
  const out: SafetyFinding[] = [];
  const closePaths = ["/schedule/civilDuskOffsetMinutes", "/schedule/stepMinutes"];
  const openPaths = ["/schedule/sunriseOffsetMinutes", "/schedule/stepMinutes"];
  if (early.length) {
    const e = summary(plan, early);
    const detail = { days: e.count, dates: e.dates, maxMinutesEarly: e.maxBy, rounding: "down" };
    out.push(
      offClose < 0
        ? finding("RL-DUSK-CLOSE", "error", closePaths, `With a close offset of ${signed(offClose)} the door closes before civil dusk ${ofAll(e.count, duskDays, "a civil dusk")}, by up to ${num(e.maxBy)} min (${e.when}): hens still out are shut out for the night.`, detail)
        : finding(
            "RL-DUSK-CLOSE",
            "warning",
            closePaths,
            `With civil dusk ${signed(offClose)} rounded down to the ${num(step)}-minute grid (assumed controller behaviour), the door closes before civil dusk ${ofAll(e.count, duskDays, "a civil dusk")}, by up to ${num(e.maxBy)} min (${e.when}). A close offset of at least one step (${num(step)} min) avoids it.`,
            detail,
          ),
    );
  }
  if (earlyOpen.length) {
    const e = summary(plan, earlyOpen);
    const why = offOpen < 0 ? `With an open offset of ${signed(offOpen)}` : `With sunrise ${signed(offOpen)} rounded down to the ${num(step)}-minute grid (assumed controller behaviour),`;
    out.push(
      finding("RL-SUNRISE-OPEN", "warning", openPaths, `${why} the door opens before sunrise ${ofAll(e.count, sunriseDays, "a sunrise")}, by up to ${num(e.maxBy)} min (${e.when}): birds go out while predators are still about.`, {
        days: e.count,
        dates: e.dates,
        maxMinutesEarly: e.maxBy,
      }),
    );
  }
  if (order.length) {
    const e = summary(plan, order);
    out.push(
      finding(
        "RL-SCHEDULE-ORDER",
        "error",
        ["/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"],
        `On ${days(e.count)} (${e.when}) sunrise ${signed(offOpen)} falls at or after civil dusk ${signed(offClose)}: the door would close, then open in the dark and stay open through the night.`,
        { days: e.count, dates: e.dates },
      ),
    );
  }
  const at = latitude(site);
  if (openAllNight.length || duskOtherDate.length) {
    const parts: string[] = [];
    if (openAllNight.length) {
      const e = summary(plan, openAllNight);
      parts.push(`on ${days(e.count)} (${e.when}) there is no civil dusk at ${at}: the sun stays less than 6° below the horizon all night`);
    }
    if (duskOtherDate.length) {
      const e = summary(plan, duskOtherDate);
      parts.push(`on ${days(e.count)} (${e.when}) the evening's civil dusk falls on another local date in ${site.timeZone}`);
    }
    out.push(
      finding(
        "RL-POLAR",
        "error",
        ["/schedule/kind", "/schedule/civilDuskOffsetMinutes"],
        `${capital(parts.join("; "))}. The sun schedule has no close time on those nights, and the controller is assumed to leave the door open all night. Use a fixed close time for those weeks.`,
        { nightsWithoutDusk: openAllNight.length, midnightSunDays: midnightSun, nightsWithDuskOnAnotherDate: duskOtherDate.length, dates: summary(plan, [...openAllNight, ...duskOtherDate].sort((a, b) => a - b)).dates },
      ),
    );
  }
  const notes: string[] = [];
  if (noSunrise.length) {
    const e = summary(plan, noSunrise);
    notes.push(`on ${days(e.count)} (${e.when}) the sun does not rise (polar night): the schedule has no open time and the controller is assumed to keep the door shut all day`);
  }
  if (darkAllDay.length) {
    const e = summary(plan, darkAllDay);
    notes.push(`on ${days(e.count)} (${e.when}) the sun stays more than 6° below the horizon all day: no civil dusk and no sunrise, so the door is assumed to stay as it is`);
  }
  if (afterMidnight.length) {
    const e = summary(plan, afterMidnight);
    notes.push(`on ${days(e.count)} (${e.when}) civil dusk ${signed(offClose)} falls after local midnight: whether the controller closes after midnight or skips that night is to be confirmed against the firmware`);
  }
  if (notes.length) {
    const text = notes.join("; ");
    out.push(
      finding("RL-POLAR", "warning", ["/schedule/kind", "/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"], `At ${at}, ${text}.`, {
        daysWithoutSunrise: noSunrise.length,
        daysWithoutTwilight: darkAllDay.length,
        closesAfterMidnight: afterMidnight.length,
      }),
    );
  }
  return out;
}

function fixedForm(s: FixedTimesSchedule, plan: PlanDay[], site: Site): SafetyFinding[] {
  const close = minuteOfDay(s.closeAt);
  const open = minuteOfDay(s.openAt);
  const early: Hit[] = [];
  const earlyOpen: Hit[] = [];
  const noDusk: number[] = [];
  const noSunrise: number[] = [];
  plan.forEach((d, i) => {
    if (d.dusk.minute !== null && close < d.dusk.minute) early.push({ i, by: d.dusk.minute - close });
    if (d.dusk.minute === null && d.dusk.missing !== "always_below") noDusk.push(i);
    if (d.sunrise.minute !== null && open < d.sunrise.minute) earlyOpen.push({ i, by: d.sunrise.minute - open });
    if (d.sunrise.minute === null && d.sunrise.missing === "always_below") noSunrise.push(i);
  });
  const out: SafetyFinding[] = [];
  if (early.length) {
    const e = summary(plan, early);
    out.push(
      finding("RL-DUSK-CLOSE", "error", ["/schedule/closeAt"], `The fixed close at ${s.closeAt} is before civil dusk on ${days(e.count)}, by up to ${num(e.maxBy)} min (${e.when}): hens still out are shut out for the night. A later close time or a sun schedule avoids it.`, {
        days: e.count,
        dates: e.dates,
        maxMinutesEarly: e.maxBy,
      }),
    );
  }
  if (earlyOpen.length) {
    const e = summary(plan, earlyOpen);
    out.push(
      finding("RL-SUNRISE-OPEN", "warning", ["/schedule/openAt"], `The fixed open at ${s.openAt} is before sunrise on ${days(e.count)}, by up to ${num(e.maxBy)} min (${e.when}): birds go out while predators are still about.`, {
        days: e.count,
        dates: e.dates,
        maxMinutesEarly: e.maxBy,
      }),
    );
  }
  const notes: string[] = [];
  if (noDusk.length) {
    const e = summary(plan, noDusk);
    notes.push(`on ${days(e.count)} (${e.when}) there is no civil dusk: the fixed close at ${s.closeAt} still acts, in twilight or daylight, while some birds may still be out`);
  }
  if (noSunrise.length) {
    const e = summary(plan, noSunrise);
    notes.push(`on ${days(e.count)} (${e.when}) the sun does not rise: the fixed open at ${s.openAt} lets the birds out in the dark`);
  }
  if (notes.length) {
    out.push(
      finding("RL-POLAR", "warning", ["/schedule/openAt", "/schedule/closeAt"], `At ${latitude(site)}, ${notes.join("; ")}.`, {
        nightsWithoutDusk: noDusk.length,
        daysWithoutSunrise: noSunrise.length,
      }),
    );
  }
  return out;
}
