// The clock: the document's zone against the site's, and whether the time source can reach the site.
import { datesOfYear } from "@/lib/sun/year";
import { formatOffset, localNoonMs, offsetSeconds } from "@/lib/sun/time-zone";
import { STANDARDS, type Standard } from "@/lib/timecode/types";
import { transmitterDistance } from "@/lib/timecode/transmitters";
import { dateRanges, days, num } from "./format";
import * as L from "./limits";
import { finding } from "./rules";
import type { RuleCheck } from "./types";

const isRadio = (source: string): source is Standard => (STANDARDS as readonly string[]).includes(source);

/** RL-NO-SITE: without a site the schedule and the time source go unchecked. */
export const checkNoSite: RuleCheck = ({ ctx }) =>
  ctx.site
    ? []
    : [
        finding(
          "RL-NO-SITE",
          "warning",
          ["/schedule", "/clock/source"],
          "No site given: the schedule could not be checked against sunrise and civil dusk, nor the time source against the transmitter's range.",
        ),
      ];

/** RL-TIME-ZONE: the document's zone keeps the site's clock on every day of the year (aliases pass). */
export const checkTimeZone: RuleCheck = ({ doc, ctx, year }) => {
  const site = ctx.site;
  if (!site || site.timeZone === doc.timeZone) return [];
  const dates = datesOfYear(year);
  const differ: number[] = [];
  let example = "";
  dates.forEach((date, i) => {
    const [y, m, d] = date.split("-").map(Number);
    const noon = localNoonMs({ year: y!, month: m!, day: d! }, site.timeZone);
    const a = offsetSeconds(noon, doc.timeZone);
    const b = offsetSeconds(noon, site.timeZone);
    if (a !== b) {
      differ.push(i);
      example ||= `${date}: UTC${formatOffset(a)} instead of UTC${formatOffset(b)}`;
    }
  });
  if (!differ.length) return [];
  return [
    finding(
      "RL-TIME-ZONE",
      "error",
      ["/timeZone"],
      `The document's time zone ${doc.timeZone} keeps a different clock from the site's ${site.timeZone} on ${days(differ.length)} of ${year} (${dateRanges(dates, differ)}; ${example}): fixed times and the displayed clock would be off. The schedule checks use the site's zone.`,
      { days: differ.length },
    ),
  ];
};

/** RL-TIME-SOURCE-RANGE: a long-wave source within its usual range of the site. */
export const checkTimeSourceRange: RuleCheck = ({ doc, ctx }) => {
  const source = doc.clock.source;
  if (!ctx.site || !isRadio(source)) return [];
  const d = transmitterDistance(source, { lat: ctx.site.latitude, lon: ctx.site.longitude });
  const t = d.transmitter;
  if (d.withinUsualRange) return [];
  const lead = `The site is ${num(d.distanceKm)} km from ${t.callSign} (${t.site}; usual range: ${t.rangeText})`;
  const detail = { distanceKm: d.distanceKm, usualRangeKm: t.usualRangeKm };
  if (d.distanceKm > L.RADIO_RANGE_ERROR_FACTOR * t.usualRangeKm) {
    return [
      finding("RL-TIME-SOURCE-RANGE", "error", ["/clock/source"], `${lead}, more than ${L.RADIO_RANGE_ERROR_FACTOR} × the ${num(t.usualRangeKm)} km we count on: in practice another continent, so the clock would never be set. Choose GNSS, NTP or a time signal that serves the region.`, detail),
    ];
  }
  return [
    finding(
      "RL-TIME-SOURCE-RANGE",
      "warning",
      ["/clock/source"],
      `${lead}, beyond the ${num(t.usualRangeKm)} km we count on: expect reception mostly at night, if at all. The alarm after ${num(doc.clock.alarmAfterHoursWithoutFix)} h without a fix will tell; consider GNSS or NTP.`,
      detail,
    ),
  ];
};

/** RL-TIME-SOURCE-RTC: the real-time clock alone drifts and is never corrected. */
export const checkRtcOnly: RuleCheck = ({ doc }) => {
  if (doc.clock.source !== "rtc-only") return [];
  const hours = doc.clock.alarmAfterHoursWithoutFix;
  const perDayS = L.RTC_DRIFT_PPM * 1e-6 * 86400;
  const perYearMin = (perDayS * 365) / 60;
  return [
    finding(
      "RL-TIME-SOURCE-RTC",
      "warning",
      ["/clock/source", "/clock/alarmAfterHoursWithoutFix"],
      `The clock runs on the real-time clock alone and is never corrected: at ±${L.RTC_DRIFT_PPM} ppm it drifts up to ${num(perDayS, 1)} s a day, about ${num(perYearMin)} min a year, more in the cold, and the schedule drifts with it. With no time source there is never a fix, so the alarm after ${num(hours)} h without one cannot warn of drift. Set the clock at every service visit.`,
      { driftSecondsPerDay: perDayS },
    ),
  ];
};
