// Typical values for the parameters page, keyed by version 2 path. Only where the trade's usual
// choice is clear; each is marked common practice. The numbers come from the constants the
// calibration suggestions and safety rules use, so the page says what the checks do.
import { DEFAULT_CLOSE_MARGIN_SHARE, DEFAULT_STALL_FRACTION, TIMEOUT_FACTOR, TIMEOUT_MIN_EXTRA_MS, WINDOW_MAX_MS, WINDOW_MIN_COUNTS, WINDOW_MIN_MS } from "@/lib/calibration/suggest";
import { num, pct } from "@/lib/profiles/safety/format";
import { STALL_FRACTION_ERROR, STALL_FRACTION_WARN } from "@/lib/profiles/safety/limits";
import { STANDARDS } from "@/lib/timecode/types";
import { TRANSMITTERS } from "@/lib/timecode/transmitters";

const ranges = STANDARDS.map((s) => `${TRANSMITTERS[s].callSign} ${TRANSMITTERS[s].rangeText}`).join("; ");

export const TYPICAL_VALUES: Readonly<Record<string, string>> = {
  "/closeTravelCounts": `The door's measured full travel less about ${pct(DEFAULT_CLOSE_MARGIN_SHARE)}, as a calibration run suggests (common practice).`,
  "/openSensorActiveLevel": "low for NPN proximity sensors, which pull their output low when they see the target (common practice).",
  "/homeOnPowerUp": "true (common practice): the count restarts from the open end stop after every outage.",
  "/travelTimeoutMs": `About 1.5 to 2 × the door's normal travel time (common practice); a calibration run suggests ${num(TIMEOUT_FACTOR)} ×, and at least the travel time plus ${num(TIMEOUT_MIN_EXTRA_MS / 1000)} s.`,
  "/stall/thresholdCps": `About ${pct(DEFAULT_STALL_FRACTION)} of the door's running speed (common practice). The safety rules want ${pct(STALL_FRACTION_ERROR)} to ${pct(STALL_FRACTION_WARN)}.`,
  "/stall/windowMs": `Long enough to hold at least ${num(WINDOW_MIN_COUNTS)} counts at the threshold, between ${num(WINDOW_MIN_MS)} and ${num(WINDOW_MAX_MS)} ms (common practice).`,
  "/stall/startupBlankingMs": "The start-up ramp plus one detection window (common practice).",
  "/stall/reopenOnStall": "true (common practice): backing off releases whatever was caught.",
  "/debounceMs": "20 to 50 ms (common practice).",
  "/powerUpMode": "scheduled (common practice): after an outage the door takes the position the schedule wants.",
  "/schedule/civilDuskOffsetMinutes": "15 to 30 min after civil dusk (common practice).",
  "/clock/source": `The long-wave signal whose usual range covers the site (${ranges}; common practice), otherwise GNSS or NTP.`,
  "/clock/alarmAfterHoursWithoutFix": "24 to 48 h (common practice): long-wave reception is often good only at night.",
};
