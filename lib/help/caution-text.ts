// The caution the help pages show wherever a value or an action can trap or injure. Our own wording.

export const CAUTION_TITLE = "Before you rely on it";

/** The full caution, one point a line. */
export const CAUTION_POINTS: readonly string[] = [
  "Stall detection is a second line of defence, not a guarantee: it notices a door that slows down, not every bird, foot or hand beneath it.",
  "Test the obstacle stop on the installed door, with its own cord, load and supply, after every change to travel, timeout or the stall check, and before you leave the site.",
  "For powered doors where animals or people can be trapped, for mains wiring and for animal welfare, local codes and licensed practice come first; these checks do not replace them.",
];

/** The short form beside a single parameter. */
export const CAUTION_SHORT =
  "Stall detection is a second line of defence, not a guarantee. Test the obstacle stop on the installed door after changing this, and follow local codes and licensed practice for powered doors, mains wiring and animal welfare.";

/** Version 2 parameters whose value decides whether the door stops on what is beneath it. */
export const CAUTION_PATHS: readonly string[] = ["/closeTravelCounts", "/travelTimeoutMs", "/stall/thresholdCps", "/stall/windowMs"];
