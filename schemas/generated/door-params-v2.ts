/* generated from schemas/door-params-v2.schema.json by scripts/generate-schema-types.ts; do not edit */

/**
 * When the door opens and closes: at fixed local times, or following the sun.
 */
export type Schedule = FixedTimesSchedule | SunFollowingSchedule;

/**
 * Parameter set version 2 for a pop-hole door controller: drive, stall check, inputs, schedule, clock, display and check-in. Typical values marked common practice come from the trade, not from a published source. Version 2 groups the stall check, schedule step and clock settings, and adds reopening after a stall while closing.
 */
export interface DoorParamsV2 {
  /**
   * Parameter-set version.
   * Which firmware parameter layout this document follows. Always 2 here.
   * Default: 2.
   */
  parameterSetVersion: 2;
  /**
   * Close travel.
   * Encoder counts from the open end stop down to fully closed. The close end has no sensor, so this count alone decides where the motor stops: set it from the measured travel in millimetres times the drive's counts per millimetre, then check on the door that it closes fully without slackening the cord. The default suits no door in particular: always set it for the door.
   * Unit: counts.
   * Range 100 to 200000.
   * Default: 17000.
   * Safety-relevant.
   */
  closeTravelCounts: number;
  /**
   * Open end-stop active level.
   * Logic level the inductive open end-stop sensor gives when it sees the door's target. Most NPN proximity sensors pull their output low when active (common practice).
   * Default: "low".
   */
  openSensorActiveLevel: "high" | "low";
  /**
   * Home on power-up.
   * Drive up to the open end stop after power returns, so the encoder count starts from a known position. Without homing the controller trusts a count it may have lost during the outage.
   * Default: true.
   * Safety-relevant.
   */
  homeOnPowerUp: boolean;
  /**
   * Travel timeout.
   * Longest time one open or close movement may take before the motor is stopped and an alarm raised. About 1.5 to 2 times the normal travel time (common practice).
   * Unit: ms.
   * Range 1000 to 300000.
   * Default: 25000.
   * Safety-relevant.
   */
  travelTimeoutMs: number;
  stall: StallCheck;
  /**
   * Button debounce time.
   * Time a button or contact input must stay steady before a change is accepted. Most contacts settle within about 10 ms, a few bounce for tens of milliseconds (from memory); 20 to 50 ms is common practice.
   * Unit: ms.
   * Range 1 to 500.
   * Default: 30.
   */
  debounceMs: number;
  /**
   * Operating mode at power-up.
   * What the door does when power returns: stay open, stay closed, or follow the schedule (which closes it if power returns after closing time).
   * Default: "scheduled".
   * Safety-relevant.
   */
  powerUpMode: "open" | "closed" | "scheduled";
  schedule: Schedule;
  /**
   * Site time zone.
   * IANA time zone of the site, such as Europe/Berlin; fixed times and the displayed clock are in this zone's local time, daylight saving included.
   * Default: "UTC".
   */
  timeZone: string;
  clock: Clock;
  /**
   * Display backlight timeout.
   * Seconds after the last button press before the display backlight turns off.
   * Unit: s.
   * Range 5 to 600.
   * Default: 30.
   */
  backlightTimeoutS: number;
  /**
   * Check-in interval.
   * Seconds between the controller's status reports to the server, where it has a network link.
   * Unit: s.
   * Range 60 to 86400.
   * Default: 900.
   */
  checkInIntervalS: number;
}
/**
 * Stops the motor when the door slows below a velocity threshold (a bird or an obstacle in the way). Stall detection is a second line of defence, not a guarantee.
 */
export interface StallCheck {
  /**
   * Stall velocity threshold.
   * Encoder velocity below which the door counts as stalled (something in the way, a jammed cord) and the motor stops. About half the normal running velocity (common practice). Stall detection is a second line of defence, not a guarantee.
   * Unit: counts/s.
   * Range 10 to 20000.
   * Default: 800.
   * Safety-relevant.
   */
  thresholdCps: number;
  /**
   * Stall detection window.
   * Time over which the encoder velocity is measured for the stall check. Longer windows ignore ripple but react later.
   * Unit: ms.
   * Range 10 to 2000.
   * Default: 100.
   * Safety-relevant.
   */
  windowMs: number;
  /**
   * Stall start-up blanking.
   * Time after the motor starts during which the stall check is suppressed, while the motor accelerates to speed. Roughly the ramp time plus one detection window (common practice).
   * Unit: ms.
   * Range 0 to 5000.
   * Default: 300.
   * Safety-relevant.
   */
  startupBlankingMs: number;
  /**
   * Reopen after a stall while closing.
   * After a stall during closing, drive back up to the open end stop instead of only stopping, so whatever was caught is released. The controller retries closing at the next scheduled time or button press.
   * Default: true.
   * Safety-relevant.
   */
  reopenOnStall: boolean;
}
export interface FixedTimesSchedule {
  /**
   * Schedule form.
   * fixed: open and close at the same local times every day.
   */
  kind: "fixed";
  /**
   * Open time.
   * Local time of day the door opens, as HH:MM (24-hour clock).
   * Default: "07:00".
   */
  openAt: string;
  /**
   * Close time.
   * Local time of day the door closes, as HH:MM (24-hour clock). Close after the birds are in for the night: a fixed time drifts against dusk through the year.
   * Default: "21:00".
   * Safety-relevant.
   */
  closeAt: string;
  /**
   * Schedule step.
   * Step by which the open and close times or offsets move when changed on the controller's buttons.
   * Unit: min.
   * Range 1 to 60.
   * Default: 30.
   */
  stepMinutes: number;
}
export interface SunFollowingSchedule {
  /**
   * Schedule form.
   * sun: open relative to sunrise and close relative to civil dusk, computed daily for the site.
   */
  kind: "sun";
  /**
   * Open offset from sunrise.
   * Minutes after sunrise the door opens; negative opens before sunrise.
   * Unit: min.
   * Range -120 to 240.
   * Default: 30.
   */
  sunriseOffsetMinutes: number;
  /**
   * Close offset from civil dusk.
   * Minutes after civil dusk (sun 6° below the horizon) the door closes; negative closes before. Most birds are on the roost by civil dusk; 15 to 30 minutes after it is common practice.
   * Unit: min.
   * Range -120 to 120.
   * Default: 30.
   * Safety-relevant.
   */
  civilDuskOffsetMinutes: number;
  /**
   * Schedule step.
   * Step by which the open and close times or offsets move when changed on the controller's buttons.
   * Unit: min.
   * Range 1 to 60.
   * Default: 30.
   */
  stepMinutes: number;
}
/**
 * Where the controller's clock is set from, and when to warn that it has gone too long without a fix.
 */
export interface Clock {
  /**
   * Time source.
   * Where the clock is set from: a long-wave time signal (dcf77, msf, wwvb), GNSS, NTP over the network, or the battery-backed real-time clock alone (rtc-only).
   * Default: "dcf77".
   */
  source: "dcf77" | "msf" | "wwvb" | "gnss" | "ntp" | "rtc-only";
  /**
   * Hours without a time fix before alarm.
   * How long the controller runs on its own clock without a successful time fix before it raises an alarm. Long-wave reception is often only good at night, so a day or two is common practice.
   * Unit: h.
   * Range 1 to 720.
   * Default: 48.
   */
  alarmAfterHoursWithoutFix: number;
}
