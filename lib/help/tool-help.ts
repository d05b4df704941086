// The calculators and where their models and limits come from, for the tools help page. Figures
// are read from the constants the calculations use.
import { BOUNCE_MOST_MS, SLUGGISH_MS } from "@/lib/drive/debounce";
import { ASSUMED_RAMP_MS, FRACTION_HIGH, FRACTION_LOW, MIN_THRESHOLD_COUNTS } from "@/lib/drive/stall";
import { COUNTS_PER_MM_MIN, DOOR_SPEED_MAX_MM_S, MOTOR_RPM_MAX, MOTOR_RPM_MIN } from "@/lib/drive/travel";
import { num } from "@/lib/profiles/safety/format";
import { CIVIL_ALTITUDE, SUNRISE_ALTITUDE } from "@/lib/sun/solar-day";
import { EARTH_MEAN_RADIUS_KM, TRANSMITTERS } from "@/lib/timecode/transmitters";
import { STANDARDS } from "@/lib/timecode/types";

/** How a statement is backed: a named publication, worked out here, recalled, or the trade's habit. */
export type SourceKind = "published" | "worked out" | "from memory" | "common practice";

export type ToolSource = { text: string; kind: SourceKind };

export type ToolHelp = {
  slug: string;
  name: string;
  /** What it answers, in a sentence. */
  what: string;
  /** Where its results are used elsewhere in Roostline. */
  usedBy: string;
  sources: readonly ToolSource[];
};

export const TOOL_HELP: readonly ToolHelp[] = [
  {
    slug: "travel",
    name: "Drive train",
    what: "Encoder counts for the door's travel from spool, cord, gearbox and encoder, with the travel time and door speed at a motor speed.",
    usedBy: "The close-travel and timeout rules estimate the door from its door model this way until it is calibrated.",
    sources: [
      { kind: "worked out", text: "Cord on a spool by its centreline: each full layer beneath adds two cord thicknesses to the winding diameter; the pitch of a single layer is neglected (about 0.05 % for a 2 mm cord on an 18 mm core)." },
      { kind: "worked out", text: "Counts per motor revolution = encoder pulses per revolution × decoding (×1, ×2 or ×4 edges)." },
      { kind: "common practice", text: `Plausibility limits: motor speed ${num(MOTOR_RPM_MIN)} to ${num(MOTOR_RPM_MAX)} rpm, door speed up to about ${num(DOOR_SPEED_MAX_MM_S)} mm/s, at least ${num(COUNTS_PER_MM_MIN)} count per millimetre.` },
    ],
  },
  {
    slug: "stall",
    name: "Stall check",
    what: "The stall threshold and window from the running speed, the start-up blanking, and how far the door moves before a stall stops it.",
    usedBy: "The stall rules (RL-STALL-…) and the calibration suggestions use the same calculation.",
    sources: [
      { kind: "worked out", text: "Counts are totalled over back-to-back windows and compared with the threshold at the end of each, so a door slowing down can pass one window just above the threshold and stop only after the next." },
      { kind: "common practice", text: `A start-up ramp of ${num(ASSUMED_RAMP_MS)} ms is assumed when none is given.` },
      { kind: "common practice", text: `At least ${num(MIN_THRESHOLD_COUNTS)} counts per window at the threshold; a threshold between ${num(FRACTION_LOW, 2)} and ${num(FRACTION_HIGH, 2)} of the running speed.` },
    ],
  },
  {
    slug: "debounce",
    name: "Debounce",
    what: "RC and Schmitt-trigger delays for buttons and end-stop contacts, component values for a wanted delay, and software sampling.",
    usedBy: "A guide for the debounce time parameter and the input circuit; no safety rule depends on it.",
    sources: [
      { kind: "worked out", text: "An RC network into a Schmitt-trigger input: on closing the capacitor discharges through R2 to the falling threshold, t = R2·C·ln(Vcc / VT−); on opening it charges through R1 + R2 to the rising threshold, t = (R1 + R2)·C·ln(Vcc / (Vcc − VT+))." },
      { kind: "published", text: "Preferred component values from the E6 and E12 series of IEC 60063." },
      { kind: "from memory", text: `Most contacts settle within about ${num(BOUNCE_MOST_MS)} ms and a few take tens of milliseconds, after a published measurement of many switches.` },
      { kind: "common practice", text: `A delay above ${num(SLUGGISH_MS)} ms makes a button feel sluggish.` },
    ],
  },
  {
    slug: "sun",
    name: "Sun and dusk",
    what: "Civil dawn, sunrise, sunset and civil dusk for a site on any day and through the year, in the site's local clock time with daylight saving.",
    usedBy: "The schedule rules (RL-DUSK-CLOSE, RL-SUNRISE-OPEN, RL-POLAR) check every day of the year with it.",
    sources: [
      { kind: "published", text: "Jean Meeus, Astronomical Algorithms: Julian days (ch. 7), the rise and set hour angle (ch. 15), the Sun's position by the low-accuracy method (ch. 25) and the equation of time (ch. 28)." },
      { kind: "published", text: `Sunrise and sunset with the Sun's centre at ${num(SUNRISE_ALTITUDE, 3)}° (refraction and the Sun's semi-diameter); civil dawn and dusk with the centre at ${num(CIVIL_ALTITUDE)}°.` },
      { kind: "published", text: "Local time and daylight saving from the IANA time-zone data that ships with the server's runtime." },
    ],
  },
  {
    slug: "timecode",
    name: "Time codes",
    what: "Encode and decode DCF77, MSF and WWVB minute frames with their checks, the distance from a site to each transmitter, and a reading of a controller's pulse log.",
    usedBy: "The time-source range rule (RL-TIME-SOURCE-RANGE) uses the same distances and usual ranges.",
    sources: [
      { kind: "published", text: "DCF77: PTB's description of the DCF77 time code. MSF: NPL's “MSF 60 kHz time and date code”. WWVB: NIST Special Publication 432 and NIST's “WWVB Time Code Format”." },
      { kind: "published", text: `Distances by the haversine formula on a sphere of the GRS 80 mean radius, ${num(EARTH_MEAN_RADIUS_KM, 4)} km (H. Moritz, “Geodetic Reference System 1980”, Journal of Geodesy 74, 2000).` },
      { kind: "from memory", text: "Transmitter positions; each agrees within a few kilometres with its operator's rounded figure." },
      { kind: "common practice", text: `Usual ranges: ${STANDARDS.map((s) => `${TRANSMITTERS[s].callSign} ${TRANSMITTERS[s].rangeText}`).join("; ")}.` },
      { kind: "common practice", text: "Pulse-width tolerances for a receiver module's output, and trusting a time only when consecutive frames agree." },
    ],
  },
];
