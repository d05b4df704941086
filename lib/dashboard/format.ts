// Durations and shares as the dashboard shows them.

/** A length of time in words, coarse enough to read at a glance: "45 s", "12 min", "3 h 20 min", "4 d 6 h". */
export function formatDuration(seconds: number): string {
  const s = Math.max(0, Math.floor(seconds));
  if (s < 60) return `${s} s`;
  const min = Math.floor(s / 60);
  if (min < 60) return `${min} min`;
  const h = Math.floor(min / 60);
  if (h < 48) return min % 60 ? `${h} h ${min % 60} min` : `${h} h`;
  const d = Math.floor(h / 24);
  return h % 24 ? `${d} d ${h % 24} h` : `${d} d`;
}

/** How long ago an instant was, from `now`: "3 h 20 min ago". */
export function ago(at: Date, now: Date): string {
  return `${formatDuration((now.getTime() - at.getTime()) / 1000)} ago`;
}

export type Progress = { value: number; max: number; percent: number; text: string };

/**
 * A release's adoption as a progress bar: controllers running it out of those in its stage. With no
 * controller in the stage yet the bar is empty rather than undefined (max 1, value 0).
 */
export function adoptionProgress({ running, staged }: { running: number; staged: number }): Progress {
  const value = Math.max(0, Math.min(running, staged));
  if (staged <= 0) return { value: 0, max: 1, percent: 0, text: "No controller in this stage yet" };
  const percent = Math.floor((value / staged) * 100);
  return { value, max: staged, percent, text: `${value} of ${staged} staged ${staged === 1 ? "controller runs" : "controllers run"} it (${percent} %)` };
}
