// Numbers, times and date lists as they appear in safety messages.

const grouped = new Map<number, Intl.NumberFormat>();

/** A number with thousands separators and at most `digits` decimals: 2000 → "2,000", 0.1234 → "0.12". */
export function num(value: number, digits = 0): string {
  let f = grouped.get(digits);
  if (!f) {
    f = new Intl.NumberFormat("en-US", { maximumFractionDigits: digits });
    grouped.set(digits, f);
  }
  return f.format(value);
}

/** A share as a percentage with one decimal at most: 0.15 → "15 %", 0.2994 → "29.9 %". */
export function pct(share: number): string {
  return `${num(share * 100, 1)} %`;
}

/** Seconds from milliseconds, for messages: 12345 → "12.3 s". */
export function sec(ms: number): string {
  return `${num(ms / 1000, 1)} s`;
}

/** Minutes after local midnight as HH:MM; values past midnight wrap and say so. */
export function clock(minuteOfDay: number): string {
  const m = ((Math.round(minuteOfDay) % 1440) + 1440) % 1440;
  const text = `${String(Math.floor(m / 60)).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;
  return minuteOfDay >= 1440 ? `${text} (after midnight)` : text;
}

/** Minutes after midnight of an "HH:MM" time (already schema-checked). */
export function minuteOfDay(hhmm: string): number {
  const [h, m] = hhmm.split(":").map(Number);
  return (h ?? 0) * 60 + (m ?? 0);
}

/** "1 day" / "143 days". */
export function days(count: number): string {
  return `${num(count)} ${count === 1 ? "day" : "days"}`;
}

/**
 * Day indexes (ascending) of a year's date list as runs of consecutive dates, the first `max` of them:
 * "2026-04-02 to 2026-09-08, 2026-10-01 and 2 more periods".
 */
export function dateRanges(dates: readonly string[], indexes: readonly number[], max = 3): string {
  const runs: [number, number][] = [];
  for (const i of indexes) {
    const last = runs[runs.length - 1];
    if (last && i === last[1] + 1) last[1] = i;
    else runs.push([i, i]);
  }
  const text = runs.slice(0, max).map(([a, b]) => (a === b ? dates[a]! : `${dates[a]!} to ${dates[b]!}`));
  const rest = runs.length - max;
  return rest > 0 ? `${text.join(", ")} and ${rest} more ${rest === 1 ? "period" : "periods"}` : text.join(", ");
}
