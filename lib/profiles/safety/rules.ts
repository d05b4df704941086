// The catalog of safety rules beyond the JSON Schema: stable ids, what each checks, in plain words.
import { TRAPPING_CAUTION } from "@/lib/drive/warnings";
import { pct } from "./format";
import * as L from "./limits";
import type { SafetyFinding, SafetyRule, Severity } from "./types";

export const SAFETY_RULES: readonly SafetyRule[] = [
  {
    id: "RL-NO-REFERENCE",
    severity: "warning",
    title: "Nothing to check the drive values against",
    explanation: `Without a calibration run or a door model the stall threshold, travel timeout and close travel cannot be compared with the door's real speed and travel. Calibrate the door on site, then check again. ${TRAPPING_CAUTION}`,
    paths: ["/stall/thresholdCps", "/travelTimeoutMs", "/closeTravelCounts"],
  },
  {
    id: "RL-STALL-FRACTION",
    severity: "error",
    title: "Stall threshold against the door's running speed",
    explanation: `The stall check stops the motor when the door slows below the threshold. Below ${pct(L.STALL_FRACTION_ERROR)} of the normal running speed a door pressing on a bird or a hand can keep moving and never trip it (error); at or above the running speed it trips on every run (error); above ${pct(L.STALL_FRACTION_WARN)} supply sag, cold grease or a fuller spool trip it without an obstacle (warning). The running speed is the calibrated one, or the motor's no-load speed × ${L.LOADED_SPEED_FACTOR} (common practice) from the door model. ${TRAPPING_CAUTION}`,
    paths: ["/stall/thresholdCps"],
  },
  {
    id: "RL-STALL-WINDOW",
    severity: "warning",
    title: "Stall detection window",
    explanation: `Counts are totalled over each window and compared with the threshold. Fewer than ${L.STALL_MIN_COUNTS_PER_WINDOW} counts per window at the threshold make the reading jump by a quarter or more with one count; a window longer than ${L.STALL_WINDOW_LONG_MS} ms lets the door keep pressing on an obstacle for up to two windows before the motor is cut (common practice). ${TRAPPING_CAUTION}`,
    paths: ["/stall/windowMs", "/stall/thresholdCps"],
  },
  {
    id: "RL-STALL-BLANKING",
    severity: "warning",
    title: "Stall start-up blanking",
    explanation: `While blanking runs the stall check is off and the door moves unguarded. More than ${L.BLANKING_MAX_MS / 1000} s, or more than ${pct(L.BLANKING_MAX_TRAVEL_SHARE)} of the travel time, is flagged. Blanking shorter than the time to reach the threshold speed plus one window trips the check at every start; with reopening after a stall the door then never closes (common practice). ${TRAPPING_CAUTION}`,
    paths: ["/stall/startupBlankingMs"],
  },
  {
    id: "RL-STALL-REOPEN",
    severity: "warning",
    title: "Reopening after a stall while closing",
    explanation: `With reopening off, a door that stalls on a bird while closing only stops, and may rest its weight on it until someone comes. ${TRAPPING_CAUTION}`,
    paths: ["/stall/reopenOnStall"],
  },
  {
    id: "RL-TIMEOUT-MARGIN",
    severity: "error",
    title: "Travel timeout against the travel time",
    explanation: `The timeout must exceed the normal travel time with room to spare: under ${L.TIMEOUT_MIN_FACTOR} × the travel time a cold or low-voltage drive stops short and raises alarms (error); over ${L.TIMEOUT_MAX_FACTOR} × a stuck or jammed door pulls for far too long before it is stopped (warning). The travel time is the calibrated one, or the close travel at the door model's running speed (common practice). ${TRAPPING_CAUTION}`,
    paths: ["/travelTimeoutMs"],
  },
  {
    id: "RL-CLOSE-TRAVEL",
    severity: "error",
    title: "Close travel against the door's travel",
    explanation: `The close end has no sensor: the count alone decides where the motor stops. More counts than the calibrated full travel drive past the closed end, slackening the cord until it winds back the other way (error). More than ${pct(L.CLOSE_SHORT_OF_CALIBRATED)} short of it leaves a gap under the door that a fox can open (warning). Without a calibration the door model's estimate is used, with ±${pct(L.CLOSE_MODEL_TOLERANCE)} tolerance (warning, until the door is calibrated). ${TRAPPING_CAUTION}`,
    paths: ["/closeTravelCounts"],
  },
  {
    id: "RL-SCHEDULE-GRID",
    severity: "error",
    title: "Schedule on its step grid",
    explanation: "The controller moves times in whole steps from midnight, so the step must divide the 1,440 minutes of a day, fixed times must lie on that grid (minutes after midnight divisible by the step) and sun offsets must be whole steps. A value off the grid cannot be set again from the buttons and is rounded by the controller.",
    paths: ["/schedule/stepMinutes", "/schedule/openAt", "/schedule/closeAt", "/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"],
  },
  {
    id: "RL-SCHEDULE-ORDER",
    severity: "error",
    title: "Opening before closing",
    explanation: "The door must open before it closes on the same day. A fixed close time at or before the open time, or a sun schedule whose open time falls at or after its close time on short winter days, leaves the door open through the night.",
    paths: ["/schedule/openAt", "/schedule/closeAt", "/schedule/sunriseOffsetMinutes", "/schedule/civilDuskOffsetMinutes"],
  },
  {
    id: "RL-DUSK-CLOSE",
    severity: "error",
    title: "Closing before civil dusk",
    explanation: "Most birds are on the roost by civil dusk; a door that closes earlier shuts hens out for the night. Checked for every day of the year at the site: a negative dusk offset or a fixed close time before dusk is an error. The controller is assumed to round sun times down to the step grid (truncation, the worst case; to be confirmed against the firmware), which can close the door up to one step earlier than asked: that is a warning.",
    paths: ["/schedule/civilDuskOffsetMinutes", "/schedule/closeAt", "/schedule/stepMinutes"],
  },
  {
    id: "RL-SUNRISE-OPEN",
    severity: "warning",
    title: "Opening before sunrise",
    explanation: "Foxes and other predators are about at dawn; opening before sunrise lets the birds out while it is still dark. Checked for every day of the year at the site, with the same rounding down to the step grid as for closing.",
    paths: ["/schedule/sunriseOffsetMinutes", "/schedule/openAt", "/schedule/stepMinutes"],
  },
  {
    id: "RL-POLAR",
    severity: "error",
    title: "Days without sunrise or civil dusk",
    explanation: "Far north or south the sun can stay up all night (midnight sun), twilight can last all night, or the sun can stay below the horizon all day (polar night). A sun schedule then has no time to act on: the controller is assumed not to close on a night without civil dusk, so the door stays open (error), and not to open on a day without sunrise, so the birds stay in (warning); a civil dusk after local midnight is flagged too. A fixed schedule still acts at its times (warning: it closes in daylight or opens in the dark). Use a fixed schedule for those weeks.",
    paths: ["/schedule/kind", "/schedule/civilDuskOffsetMinutes", "/schedule/sunriseOffsetMinutes"],
  },
  {
    id: "RL-NO-SITE",
    severity: "warning",
    title: "No site to check the schedule and clock against",
    explanation: "Without the site's position the schedule cannot be checked against sunrise and civil dusk, nor the time source against the transmitter's range.",
    paths: ["/schedule", "/clock/source"],
  },
  {
    id: "RL-TIME-ZONE",
    severity: "error",
    title: "Time zone of the site",
    explanation: "The document's time zone must keep the same clock as the site's zone on every day of the year; otherwise fixed times, and the clock shown on the display, are off by the difference.",
    paths: ["/timeZone"],
  },
  {
    id: "RL-TIME-SOURCE-RANGE",
    severity: "error",
    title: "Long-wave time signal range",
    explanation: `A long-wave time signal is only dependable within its usual range (DCF77 about 2,000 km, MSF about 1,000 km, WWVB varies; common practice). Beyond it is a warning; beyond ${L.RADIO_RANGE_ERROR_FACTOR} × it, in practice another continent, is an error: the clock would never be set.`,
    paths: ["/clock/source"],
  },
  {
    id: "RL-TIME-SOURCE-RTC",
    severity: "warning",
    title: "Clock without a time source",
    explanation: `The real-time clock alone is never corrected: a watch crystal commonly drifts up to about ±${L.RTC_DRIFT_PPM} ppm, some 10 minutes a year, more in the cold (from memory), and the schedule drifts with it. The alarm for hours without a time fix cannot tell that apart. Set the clock at every service visit. GNSS and NTP need no such note here: GNSS needs a view of the sky and NTP a network link, which this check cannot see.`,
    paths: ["/clock/source", "/clock/alarmAfterHoursWithoutFix"],
  },
  {
    id: "RL-POWER-UP-OPEN",
    severity: "warning",
    title: "Opening at power-up",
    explanation: "With the power-up mode “open”, a power cut at night that ends before morning opens the door to predators. “scheduled” closes it again when power returns after closing time.",
    paths: ["/powerUpMode"],
  },
  {
    id: "RL-HOMING-OFF",
    severity: "warning",
    title: "Homing at power-up",
    explanation: `Without homing the controller trusts a count it may have lost during a power cut, so the next close can stop short (a gap) or drive past the closed end. ${TRAPPING_CAUTION}`,
    paths: ["/homeOnPowerUp"],
  },
];

const byId = new Map(SAFETY_RULES.map((r) => [r.id, r]));

/** A finding of a catalogued rule, titled from the catalog. */
export function finding(ruleId: string, severity: Severity, paths: string[], message: string, detail?: unknown): SafetyFinding {
  const rule = byId.get(ruleId);
  if (!rule) throw new Error(`unknown safety rule ${ruleId}`);
  return detail === undefined ? { ruleId, severity, paths, title: rule.title, message } : { ruleId, severity, paths, title: rule.title, message, detail };
}
