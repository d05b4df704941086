// Schedule rules that need no site: the step grid and the order of opening and closing.
import { clock, minuteOfDay, num } from "./format";
import { finding } from "./rules";
import type { RuleCheck, SafetyFinding } from "./types";

const DAY_MINUTES = 1440;

/** RL-SCHEDULE-GRID: the step divides a day; fixed times and sun offsets lie on the step grid. */
export const checkScheduleGrid: RuleCheck = ({ doc }) => {
  const s = doc.schedule;
  const step = s.stepMinutes;
  const out: SafetyFinding[] = [];
  if (DAY_MINUTES % step !== 0) {
    out.push(
      finding(
        "RL-SCHEDULE-GRID",
        "error",
        ["/schedule/stepMinutes"],
        `A schedule step of ${num(step)} min does not divide the 1,440 minutes of a day (1,440 ÷ ${num(step)} = ${num(DAY_MINUTES / step, 2)}): the grid would not meet itself at midnight. Use a divisor such as 5, 10, 15, 20, 30 or 60.`,
        { stepMinutes: step },
      ),
    );
    return out;
  }
  // The grid starts at local midnight, so a time is on it when its minutes after midnight are a whole number of steps.
  const offGrid = (path: string, what: string, minutes: number, show: (m: number) => string) => {
    const below = minutes - (((minutes % step) + step) % step);
    if (below === minutes) return;
    out.push(
      finding(
        "RL-SCHEDULE-GRID",
        "error",
        [path, "/schedule/stepMinutes"],
        `${what} ${show(minutes)} is not on the ${num(step)}-minute grid: the nearest grid values are ${show(below)} and ${show(below + step)}.`,
        { value: minutes, stepMinutes: step },
      ),
    );
  };
  const offset = (m: number) => `${num(m)} min`;
  if (s.kind === "fixed") {
    offGrid("/schedule/openAt", "Open time", minuteOfDay(s.openAt), clock);
    offGrid("/schedule/closeAt", "Close time", minuteOfDay(s.closeAt), clock);
  } else {
    offGrid("/schedule/sunriseOffsetMinutes", "Open offset from sunrise", s.sunriseOffsetMinutes, offset);
    offGrid("/schedule/civilDuskOffsetMinutes", "Close offset from civil dusk", s.civilDuskOffsetMinutes, offset);
  }
  return out;
};

/** RL-SCHEDULE-ORDER (fixed form): the close time comes after the open time on the same day. */
export const checkFixedOrder: RuleCheck = ({ doc }) => {
  const s = doc.schedule;
  if (s.kind !== "fixed") return [];
  const open = minuteOfDay(s.openAt);
  const close = minuteOfDay(s.closeAt);
  if (close > open) return [];
  return [
    finding(
      "RL-SCHEDULE-ORDER",
      "error",
      ["/schedule/openAt", "/schedule/closeAt"],
      close === open
        ? `Open and close times are both ${s.openAt}: the door would not have a time to be open, or would be open all the time.`
        : `The close time ${s.closeAt} is before the open time ${s.openAt}: the door would be open from ${s.openAt} through the night until ${s.closeAt}.`,
      { openAt: s.openAt, closeAt: s.closeAt },
    ),
  ];
};
