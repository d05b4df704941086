// Limits the safety rules apply. None comes from a published standard for poultry doors; each is
// trade practice (common practice) unless its comment names something else.
import { FRACTION_HIGH, FRACTION_LOW, MIN_THRESHOLD_COUNTS } from "@/lib/drive/stall";

/** Loaded running speed as a share of the motor's no-load speed, for small geared DC drives: 0.7–0.8 (common practice). */
export const LOADED_SPEED_FACTOR = 0.75;

/** Below this share of nominal velocity a door pressing on a bird can keep moving (common practice, as in lib/drive). */
export const STALL_FRACTION_ERROR = FRACTION_LOW;
/** At or above the nominal velocity the check trips on every run. */
export const STALL_FRACTION_MAX = 1;
/** Above this share supply sag, cold grease or a fuller spool trips the check without an obstacle (common practice). */
export const STALL_FRACTION_WARN = FRACTION_HIGH;
/** Fewer counts than this per window at the threshold make the check noisy (±1 count quantisation; common practice). */
export const STALL_MIN_COUNTS_PER_WINDOW = MIN_THRESHOLD_COUNTS;
/** Windows longer than this let a door press on an obstacle for a noticeable time before it is judged (common practice). */
export const STALL_WINDOW_LONG_MS = 300;
/** Start-up blanking longer than this leaves the start of every run unguarded (common practice). */
export const BLANKING_MAX_MS = 2000;
/** … or longer than this share of the whole travel time (common practice). */
export const BLANKING_MAX_TRAVEL_SHARE = 0.25;

/** The timeout must leave at least this factor over the expected travel time (a cold, low-voltage drive is slower; common practice). */
export const TIMEOUT_MIN_FACTOR = 1.2;
/** A timeout beyond this factor lets a stuck or jammed door pull for far too long (common practice). */
export const TIMEOUT_MAX_FACTOR = 4;

/** Close travel this far short of the calibrated full travel leaves a gap under the door (common practice). */
export const CLOSE_SHORT_OF_CALIBRATED = 0.02;
/** Without calibration the door-model estimate is only good to about this share either way (common practice). */
export const CLOSE_MODEL_TOLERANCE = 0.05;

/** Radio source farther than this many times its usual range: in practice another continent, no reception. */
export const RADIO_RANGE_ERROR_FACTOR = 3;

/**
 * A 32.768 kHz watch crystal is commonly specified at ±20 ppm at 25 °C, and drifts more when cold
 * (common practice for real-time-clock crystals, from memory).
 */
export const RTC_DRIFT_PPM = 20;
