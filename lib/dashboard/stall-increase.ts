// Stall events are a running counter reported with every check-in. What matters on the dashboard is
// how many happened this week, so the week's readings are turned into an increase. The SQL in
// db/queries/dashboard.ts listWeeklyStalls applies the same rule; this is its specification and test bed.

/** Days the "stall events this week" figure looks back. */
export const STALL_WINDOW_DAYS = 7;

/** Start of the stall window ending at `now`. */
export function stallWindowStart(now: Date): Date {
  return new Date(now.getTime() - STALL_WINDOW_DAYS * 86_400_000);
}

/**
 * Increase of a running counter over readings in time order. The first reading only sets the start:
 * the week is measured over its own check-ins, so stalls between the last check-in before it and the
 * first one in it (one check-in interval) are left out. A reading below the one before means the
 * counter restarted from zero (a reboot or a firmware update cleared it), so the whole new value
 * counts. Two restarts between readings look like one.
 */
export function counterIncrease(readings: readonly number[]): number {
  let total = 0;
  for (let i = 1; i < readings.length; i++) {
    const v = readings[i]!;
    const prev = readings[i - 1]!;
    total += v >= prev ? v - prev : v;
  }
  return total;
}
