// Help text for the safety rules, keyed by rule id. The catalog (lib/profiles/safety/rules.ts) says
// what each rule checks; this adds why it matters and what to do when it fires. A unit test fails
// when a rule has no entry here or an entry names no rule.
import { TRAPPING_CAUTION } from "@/lib/drive/warnings";
import { SAFETY_RULES } from "@/lib/profiles/safety/rules";
import { v2PathToV1 } from "@/lib/profiles/safety/paths";
import type { Severity } from "@/lib/profiles/safety/types";
import { parameterAnchor, ruleAnchor } from "./links";

export type RuleHelpText = { why: string; actions: readonly string[] };

export const RULE_HELP: Readonly<Record<string, RuleHelpText>> = {
  "RL-NO-REFERENCE": {
    why: "Without the door's own speed and travel, the three values that decide whether the door stops on an obstacle are numbers nobody has compared with the door.",
    actions: [
      "Make sure the profile belongs to a door model; its drive-train figures give the speed and travel the rules compare with.",
      "Better still, record a calibration run on the installed door (see Calibration) and take the drive values from it.",
      "Acknowledge only if the values were measured on the door another way, and say how in the reason.",
    ],
  },
  "RL-STALL-FRACTION": {
    why: "Set too low, a door pressing on a bird keeps going; set too close to the running speed, it trips on a cold morning or a tired battery and the door does not close.",
    actions: [
      "Start from about half the running speed: the Stall check tool and a calibration run both suggest a value.",
      "Error below the lower limit: raise the threshold. Error at or above the running speed: lower it.",
      "Warning near the running speed: find out why the door runs slowly (cord, grease, supply) before accepting it.",
      "After any change, test the obstacle stop on the installed door.",
    ],
  },
  "RL-STALL-WINDOW": {
    why: "The window is both the check's resolution and its reaction time: with too few counts in it the reading jumps, and a long one lets the door keep pressing before the motor is cut.",
    actions: [
      "Too few counts per window: lengthen the window, or use finer encoder decoding (×4) or an encoder with more pulses per revolution.",
      "Window too long: shorten it towards the shortest that still holds enough counts.",
      "The Stall check tool shows how far the door moves before a stall stops it.",
    ],
  },
  "RL-STALL-BLANKING": {
    why: "While blanking runs nothing watches the door; if blanking is too short, the check trips while the motor is still speeding up and the door never completes a close.",
    actions: [
      "Set it to the start-up ramp plus one detection window; a calibration run measures the ramp.",
      "If the motor is slow to get going, look at the drive and its supply rather than lengthening blanking.",
    ],
  },
  "RL-STALL-REOPEN": {
    why: "A door that only stops keeps its weight on whatever it caught until someone comes; backing off lets go at once.",
    actions: ["Turn reopening after a stall on.", "If it has to stay off, say in the acknowledgement why, and how a caught bird is freed."],
  },
  "RL-TIMEOUT-MARGIN": {
    why: "The timeout is the last thing that stops the motor when nothing else does: too tight and a cold or low-voltage door stops short with an alarm, too loose and a jammed door pulls on its cord, or on what it caught, for a long time.",
    actions: [
      "Set about 1.5 to 2 × the door's measured travel time; a calibration run suggests a value.",
      "Error: raise the timeout to at least the value the message gives.",
      "Warning: lower it, unless the door is known to run much slower at times, and then say so.",
    ],
  },
  "RL-CLOSE-TRAVEL": {
    why: "There is no sensor at the closed end: this count alone decides where the motor stops. Too many counts slacken the cord until it winds back the wrong way; too few leave a gap a predator can lift.",
    actions: [
      "Calibrate the door and take the close travel from the run.",
      "Error (more than the measured travel): lower it to at most the measured full travel.",
      "Warning (well short): raise it towards the measured travel, then watch a full close on the door.",
      "Without a calibration the door model's estimate is only approximate: calibrate before approving.",
    ],
  },
  "RL-SCHEDULE-GRID": {
    why: "The controller's buttons move times in whole steps from midnight; a value off that grid is rounded on the controller and cannot be set back from its buttons.",
    actions: ["Use a step that divides the 1,440 minutes of a day, such as 5, 10, 15, 20, 30 or 60.", "Move the times or sun offsets to whole steps; the message names the nearest ones."],
  },
  "RL-SCHEDULE-ORDER": {
    why: "A door due to close before it opens stays open through the night.",
    actions: [
      "Fixed times: make the close time later than the open time.",
      "Sun schedule: open earlier after sunrise or close later after dusk, so that opening comes first on the shortest days.",
    ],
  },
  "RL-DUSK-CLOSE": {
    why: "A door that closes before the flock is in leaves birds outside for the night.",
    actions: [
      "Use a dusk offset of zero or more; 15 to 30 minutes after civil dusk is common practice.",
      "Fixed times: move the close time past civil dusk on the latest dusk of the year, or use the sun schedule.",
      "The rounding warning goes away with a finer step, or an offset of at least one step.",
    ],
  },
  "RL-SUNRISE-OPEN": {
    why: "Predators are about at first light; birds let out in the dark are easy prey.",
    actions: [
      "Use a sunrise offset of zero or more.",
      "Fixed times: move the open time after sunrise on the earliest sunrise of the year, or use the sun schedule.",
      "If the early opening is intended, say why in the acknowledgement.",
    ],
  },
  "RL-POLAR": {
    why: "Far north or south some days have no sunrise or no civil dusk; a sun schedule then has nothing to act on and the door may stay open all night.",
    actions: ["Use a fixed-times schedule for the weeks the finding lists.", "Compare those dates with the Sun and dusk tool for the site."],
  },
  "RL-NO-SITE": {
    why: "Sun times, and the reach of a time signal, depend on where the door is; without a site neither can be checked.",
    actions: [
      "On a base profile this is expected: it has no site of its own. Its schedule is checked against each site in that site's overlay and when it is released.",
      "On an overlay, make sure the site (or the controller's site) has its position and time zone.",
    ],
  },
  "RL-TIME-ZONE": {
    why: "Fixed times and the clock on the display follow the document's zone; if it differs from the site's, the door acts an hour or more off on some days.",
    actions: ["Set the time zone to the site's own IANA zone, as shown on the Sites page.", "If the site's zone itself is wrong, correct the site."],
  },
  "RL-TIME-SOURCE-RANGE": {
    why: "A clock that never gets a time fix drifts, and the schedule drifts with it.",
    actions: [
      "Choose the time signal that serves the region, or GNSS or NTP.",
      "Near the edge of the range (warning), expect fixes mostly at night, and keep the alarm for hours without a fix at a day or two.",
      "The Time codes tool shows the distance to each transmitter.",
    ],
  },
  "RL-TIME-SOURCE-RTC": {
    why: "A clock without a time source is never corrected; the schedule drifts by minutes a year and the missing-fix alarm cannot notice.",
    actions: ["Prefer a time source the site can receive.", "If the real-time clock alone is intended, set the clock at every service visit and say so in the acknowledgement."],
  },
  "RL-POWER-UP-OPEN": {
    why: "A power cut that ends at night would open the door to predators.",
    actions: ["Use the power-up mode scheduled, so the door takes the position the schedule wants.", "Keep open only where someone checks the door after every outage, and say so in the acknowledgement."],
  },
  "RL-HOMING-OFF": {
    why: "After an outage the encoder count may be wrong, so the next close can stop short or drive past the closed end.",
    actions: ["Turn homing on power-up on.", "If it has to stay off, say why in the acknowledgement and check the door after every outage."],
  },
};

export type RuleHelp = {
  id: string;
  anchor: string;
  title: string;
  severity: Severity;
  /** What the rule checks, from the catalog, without the trapping caution (the page shows it once). */
  checks: string;
  /** Whether the catalog gives this rule the trapping caution. */
  trapping: boolean;
  why: string;
  actions: readonly string[];
  parameters: { path: string; anchor: string; v1Path: string | null }[];
  /** False for rules that only look at parameters version 1 does not have. */
  inVersionOne: boolean;
};

/** Every catalogued rule with its help text, in catalog order; a rule without help text gets empty fields (the unit test catches it). */
export function ruleHelpEntries(): RuleHelp[] {
  return SAFETY_RULES.map((r) => {
    const help = RULE_HELP[r.id];
    const v1 = r.paths.map((p) => v2PathToV1(p));
    return {
      id: r.id,
      anchor: ruleAnchor(r.id),
      title: r.title,
      severity: r.severity,
      checks: r.explanation.replace(TRAPPING_CAUTION, "").trim(),
      trapping: r.explanation.includes(TRAPPING_CAUTION),
      why: help?.why ?? "",
      actions: help?.actions ?? [],
      parameters: r.paths.map((p, i) => ({ path: p, anchor: parameterAnchor(p), v1Path: v1[i] ?? null })),
      inVersionOne: v1.some((p) => p !== null),
    };
  });
}
