import { describe, expect, it } from "vitest";
import { isoUtc } from "@/lib/timecode/calendar";
import { decodeFrame, encodeFrame } from "@/lib/timecode/frames";
import { STANDARDS } from "@/lib/timecode/types";

// Reference for civil time: the IANA time-zone database as bundled with Node's ICU, read through
// Intl.DateTimeFormat — independent of the rules coded in lib/timecode/calendar.ts.
const formatters = new Map<string, Intl.DateTimeFormat>();
function civil(ms: number, timeZone: string): { local: string; offset: string } {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", { timeZone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZoneName: "shortOffset" });
    formatters.set(timeZone, f);
  }
  const p = Object.fromEntries(f.formatToParts(new Date(ms)).map((x) => [x.type, x.value]));
  const m = /GMT(?:([+-])(\d+))?/.exec(p.timeZoneName ?? "")!;
  const offset = m[1] ? `${m[1]}${m[2]!.padStart(2, "0")}:00` : "+00:00";
  return { local: `${p.year}-${p.month}-${p.day}T${p.hour}:${p.minute}`, offset };
}
const ZONE = { dcf77: "Europe/Berlin", msf: "Europe/London" } as const;

const MIN = 60_000;
const minutes = (fromIso: string, toIso: string) => {
  const out: number[] = [];
  for (let t = Date.parse(fromIso); t <= Date.parse(toIso); t += MIN) out.push(t);
  return out;
};

const WINDOWS: Record<string, number[]> = {
  "EU spring change 2026": minutes("2026-03-29T00:00:00Z", "2026-03-29T03:00:00Z"),
  "EU autumn change 2026": minutes("2026-10-25T00:00:00Z", "2026-10-25T03:00:00Z"),
  "US spring change 2026": minutes("2026-03-08T06:00:00Z", "2026-03-08T11:00:00Z"),
  "US autumn change 2026": minutes("2026-11-01T05:00:00Z", "2026-11-01T10:00:00Z"),
  "year boundary 2023/2024": minutes("2023-12-31T21:00:00Z", "2024-01-01T03:00:00Z"),
  "leap day 2024": minutes("2024-02-28T22:00:00Z", "2024-03-01T02:00:00Z"),
  "leap day 2000": minutes("2000-02-28T22:00:00Z", "2000-03-01T02:00:00Z"),
  "first minutes of 2000": minutes("2000-01-01T00:00:00Z", "2000-01-01T02:00:00Z"),
  "last minutes of 2099": minutes("2099-12-31T20:00:00Z", "2099-12-31T21:59:00Z"),
  // A prime stride visits every time of day, weekday and month over the century.
  "2000–2099 every 12007 minutes": Array.from({ length: Math.floor((Date.UTC(2099, 11, 31) - Date.UTC(2000, 0, 1)) / (12007 * MIN)) }, (_, k) => Date.UTC(2000, 0, 1) + k * 12007 * MIN),
};

describe.each(STANDARDS)("%s encode → decode round trips", (standard) => {
  it.each(Object.keys(WINDOWS))("returns every minute of %s with all checks passing", (name) => {
    for (const t of WINDOWS[name]!) {
      const r = decodeFrame(encodeFrame(standard, t));
      const at = isoUtc(t);
      expect(r.ok, `${standard} ${at}`).toBe(true);
      expect(r.instant.utc, `${standard} ${at}`).toBe(at);
      if (standard !== "wwvb") {
        const ref = civil(t, ZONE[standard]);
        expect(r.instant.local, `${standard} ${at}`).toBe(`${ref.local}:00${ref.offset}`);
      }
    }
  });
});

describe("change announcements against the time-zone database", () => {
  const offsetChanges = (zone: string, t: number, windowMin: number) => civil(t - 1, zone).offset !== civil(t + windowMin * MIN - MIN, zone).offset;
  const around = [...WINDOWS["EU spring change 2026"]!, ...WINDOWS["EU autumn change 2026"]!];

  it("sets DCF77 A1 exactly in the frames sent during the hour before a CET/CEST change", () => {
    for (const t of around) {
      expect(decodeFrame(encodeFrame("dcf77", t)).flags.zoneChangeAnnounced, isoUtc(t)).toBe(offsetChanges("Europe/Berlin", t, 60));
    }
    expect(around.filter((t) => decodeFrame(encodeFrame("dcf77", t)).flags.zoneChangeAnnounced)).toHaveLength(120);
  });

  it("sets MSF 53B exactly in the 61 frames before a GMT/BST change", () => {
    for (const t of around) {
      expect(decodeFrame(encodeFrame("msf", t)).flags.summerTimeWarning, isoUtc(t)).toBe(offsetChanges("Europe/London", t, 61));
    }
    expect(around.filter((t) => decodeFrame(encodeFrame("msf", t)).flags.summerTimeWarning)).toHaveLength(122);
  });
});
