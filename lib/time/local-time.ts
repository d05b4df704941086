/** A date's wall-clock time in an IANA zone, e.g. "14:05 (UTC+1)". */
export function formatLocalTime(at: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", hour12: false, timeZoneName: "shortOffset" }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "";
  const offset = get("timeZoneName").replace("GMT", "UTC");
  return `${get("hour")}:${get("minute")} (${offset})`;
}

/** A timestamp for tables: "2026-12-02 14:05 UTC". */
export function formatUtc(at: Date): string {
  return at.toISOString().slice(0, 16).replace("T", " ") + " UTC";
}
