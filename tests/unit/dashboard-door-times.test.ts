import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { asV2Document, describeSchedule, doorTimesToday, sunTimesToday, type DoorSite } from "@/lib/dashboard/door-times";
import { localDate, planDay } from "@/lib/dashboard/sun-today";
import { planDays } from "@/lib/profiles/safety/sun-days";
import type { DoorParamsV2 } from "@/lib/profiles/schemas";
import { sunDay } from "@/lib/sun/events";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = <T = DoorParamsV2>(name: string): T => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as T;

const BERLIN: DoorSite = { latitude: 52.52, longitude: 13.405, timeZone: "Europe/Berlin" };
const LONDON: DoorSite = { latitude: 51.5074, longitude: -0.1278, timeZone: "Europe/London" };
const CORRIE: DoorSite = { latitude: 57.4778, longitude: -4.2247, timeZone: "Europe/London" };
const TROMSO: DoorSite = { latitude: 69.65, longitude: 18.96, timeZone: "Europe/Oslo" };
const LONGYEAR: DoorSite = { latitude: 78.22, longitude: 15.65, timeZone: "Arctic/Longyearbyen" };
const REYKJAVIK: DoorSite = { latitude: 64.15, longitude: -21.94, timeZone: "Atlantic/Reykjavik" };
const HOBART: DoorSite = { latitude: -42.88, longitude: 147.33, timeZone: "Australia/Hobart" };

const sun = (sunriseOffsetMinutes: number, civilDuskOffsetMinutes: number, stepMinutes = 30): DoorParamsV2["schedule"] => ({ kind: "sun", sunriseOffsetMinutes, civilDuskOffsetMinutes, stepMinutes });
const fixed = (openAt: string, closeAt: string): DoorParamsV2["schedule"] => ({ kind: "fixed", openAt, closeAt, stepMinutes: 30 });
const docAt = (site: DoorSite, schedule: DoorParamsV2["schedule"], timeZone = site.timeZone): DoorParamsV2 => ({ ...fixture("safety-v2-clean.json"), timeZone, schedule });
// Local noon, so the site's date is the date named.
const noon = (date: string, site: DoorSite) => new Date(Date.parse(`${date}T12:00:00Z`) - (site.longitude / 15) * 3_600_000);
const hhmm = (m: number) => `${String(Math.floor(m / 60) % 24).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;

describe("one day's sun times, as the safety rules' year plan has them", () => {
  it("equals planDays on every date of 2026 at mid, high and southern latitudes and far from solar time", () => {
    for (const site of [BERLIN, CORRIE, TROMSO, LONGYEAR, REYKJAVIK, HOBART]) {
      const year = planDays(site, site.timeZone, 2026);
      for (const d of year) expect(planDay(site, site.timeZone, d.date), `${site.timeZone} ${d.date}`).toEqual(d);
    }
  });

  it("takes today's date in the site's zone, not UTC's", () => {
    const now = new Date("2026-12-02T23:30:00Z");
    expect(localDate(now, "Europe/Berlin")).toBe("2026-12-03");
    expect(localDate(now, "America/Denver")).toBe("2026-12-02");
  });
});

describe("door times today", () => {
  it("opens at sunrise + offset and closes at civil dusk + offset, each rounded down to the step", () => {
    const now = noon("2026-12-02", BERLIN);
    const d = sunDay({ lat: BERLIN.latitude, lon: BERLIN.longitude, date: "2026-12-02", tz: BERLIN.timeZone });
    if (d.sunrise.time === null || d.civilDusk.time === null) throw new Error("Berlin has both in December");
    const t = doorTimesToday({ site: BERLIN, doc: docAt(BERLIN, sun(15, 10, 15)), now });
    expect(t.date).toBe("2026-12-02");
    expect(t.open).toBe(hhmm(Math.floor((d.sunrise.minuteOfDay + 15) / 15) * 15));
    expect(t.close).toBe(hhmm(Math.floor((d.civilDusk.minuteOfDay + 10) / 15) * 15));
    expect(t.rule).toBe("opens at sunrise + 15 min, closes at civil dusk + 10 min");
    expect(t.step).toContain("rounded down to the 15-minute step");
  });

  // Published tables for London on the June solstice: sunrise about 04:43 BST (from memory; the same
  // figure tests/unit/sun-almanac.test.ts holds lib/sun to).
  it("opens at London's published solstice sunrise with no offset on a one-minute step", () => {
    const t = doorTimesToday({ site: LONDON, doc: docAt(LONDON, sun(0, 0, 1)), now: noon("2026-06-21", LONDON) });
    const [h, m] = t.open!.split(":").map(Number);
    expect(Math.abs(h! * 60 + m! - (4 * 60 + 43))).toBeLessThanOrEqual(2);
    expect(t.step).toBeNull();
  });

  it("says clearly that a sun schedule has no close time on a night without civil dusk", () => {
    const t = doorTimesToday({ site: TROMSO, doc: docAt(TROMSO, sun(30, 30)), now: noon("2026-06-21", TROMSO) });
    expect(t.civilDusk).toBeNull();
    expect(t.close).toBeNull();
    expect(t.notes[0]?.tone).toBe("bad");
    expect(t.notes[0]?.text).toContain("No civil dusk tonight at 69.65° N");
    expect(t.notes[0]?.text).toContain("use a fixed close time");
  });

  it("has no open time in polar night, and says so", () => {
    const t = doorTimesToday({ site: TROMSO, doc: docAt(TROMSO, sun(30, 30)), now: noon("2026-12-21", TROMSO) });
    expect(t.sunrise).toBeNull();
    expect(t.open).toBeNull();
    expect(t.close).not.toBeNull();
    expect(t.notes.map((n) => n.text).join(" ")).toContain("polar night");
  });

  it("marks a close that falls after local midnight", () => {
    const t = doorTimesToday({ site: CORRIE, doc: docAt(CORRIE, sun(30, 30)), now: noon("2026-06-21", CORRIE) });
    expect(t.close).toMatch(/\(after midnight\)$/);
    expect(t.notes.some((n) => n.tone === "warn" && n.text.includes("after local midnight"))).toBe(true);
  });

  it("warns when a negative offset closes the door before civil dusk", () => {
    const t = doorTimesToday({ site: BERLIN, doc: docAt(BERLIN, sun(30, -20)), now: noon("2026-12-02", BERLIN) });
    expect(t.notes.find((n) => n.tone === "bad")?.text).toMatch(/closes \d+ min before civil dusk: hens still out/);
  });

  it("shows fixed times and how far a fixed close falls before civil dusk", () => {
    const d = sunDay({ lat: BERLIN.latitude, lon: BERLIN.longitude, date: "2026-06-21", tz: BERLIN.timeZone });
    if (d.civilDusk.time === null) throw new Error("Berlin has a civil dusk in June");
    const t = doorTimesToday({ site: BERLIN, doc: docAt(BERLIN, fixed("07:00", "21:00")), now: noon("2026-06-21", BERLIN) });
    expect([t.open, t.close]).toEqual(["07:00", "21:00"]);
    expect(t.rule).toBe("opens at 07:00, closes at 21:00 (fixed times)");
    expect(t.notes[0]).toEqual({ tone: "bad", text: `The fixed close at 21:00 is ${d.civilDusk.minuteOfDay - 21 * 60} min before civil dusk today: hens still out are shut out for the night.` });
  });

  it("shows a fixed schedule kept on another zone's clock at the site's own time, with the zone named", () => {
    for (const date of ["2026-01-15", "2026-07-15"]) {
      const t = doorTimesToday({ site: CORRIE, doc: docAt(CORRIE, fixed("07:00", "21:00"), "Europe/Berlin"), now: noon(date, CORRIE) });
      expect([t.open, t.close]).toEqual(["06:00", "20:00"]);
      expect(t.rule).toBe("opens at 07:00, closes at 21:00 Europe/Berlin time (fixed times)");
      expect(t.notes.at(-1)?.text).toContain("1 h earlier here");
    }
  });

  it("leaves sun times alone when only the clock's zone differs, but says so", () => {
    const own = doorTimesToday({ site: CORRIE, doc: docAt(CORRIE, sun(30, 30)), now: noon("2026-12-02", CORRIE) });
    const other = doorTimesToday({ site: CORRIE, doc: docAt(CORRIE, sun(30, 30), "Europe/Berlin"), now: noon("2026-12-02", CORRIE) });
    expect([other.open, other.close]).toEqual([own.open, own.close]);
    expect(other.notes.at(-1)?.text).toContain("RL-TIME-ZONE");
  });

  it("gives sunrise and civil dusk for a site without doors", () => {
    expect(sunTimesToday(LONGYEAR, noon("2026-12-21", LONGYEAR))).toMatchObject({ date: "2026-12-21", sunrise: null, civilDusk: null });
  });
});

describe("schedules in words", () => {
  it("names the offsets with their signs, and plain sunrise or dusk without one", () => {
    expect(describeSchedule(sun(15, 10))).toBe("opens at sunrise + 15 min, closes at civil dusk + 10 min");
    expect(describeSchedule(sun(-15, 0))).toBe("opens at sunrise − 15 min, closes at civil dusk");
    expect(describeSchedule(fixed("06:30", "22:00"))).toBe("opens at 06:30, closes at 22:00 (fixed times)");
  });

  it("reads a version 1 configuration through the migration, and refuses one that is not valid", () => {
    const v1 = fixture<Record<string, unknown>>("v1-base-fixed-times.json");
    const doc = asV2Document(v1);
    expect(doc?.parameterSetVersion).toBe(2);
    expect(doc?.schedule.kind).toBe("fixed");
    expect(asV2Document({ parameterSetVersion: 2 })).toBeNull();
  });
});
