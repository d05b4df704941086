import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkSafety, type SafetyContext, type SafetyFinding, type Site } from "@/lib/profiles/safety";
import type { DoorParamsV2 } from "@/lib/profiles/schemas";
import { sunYear } from "@/lib/sun/year";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = <T = DoorParamsV2>(name: string): T => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as T;
const NOW = new Date("2026-03-01T12:00:00Z");

const BERLIN: Site = { latitude: 52.52, longitude: 13.405, timeZone: "Europe/Berlin" };
const CHICAGO: Site = { latitude: 41.88, longitude: -87.63, timeZone: "America/Chicago" };
const TROMSO: Site = { latitude: 69.65, longitude: 18.96, timeZone: "Europe/Oslo" };
const HOBART: Site = { latitude: -42.88, longitude: 147.33, timeZone: "Australia/Hobart" };

// The clean profile moved to a site: its zone follows the site, GNSS keeps the time-source rules quiet.
function at(site: Site, schedule: DoorParamsV2["schedule"], ctx: Partial<SafetyContext> = {}): SafetyFinding[] {
  const doc: DoorParamsV2 = { ...fixture("safety-v2-clean.json"), timeZone: site.timeZone, clock: { source: "gnss", alarmAfterHoursWithoutFix: 24 }, schedule };
  return checkSafety(2, doc, { now: NOW, site, year: 2026, ...ctx }).filter((f) => f.ruleId !== "RL-NO-REFERENCE");
}
const rule = (found: SafetyFinding[], id: string, severity?: string) => found.filter((f) => f.ruleId === id && (!severity || f.severity === severity));
const datesOf = (f: SafetyFinding | undefined): string[] => (f?.detail as { dates?: string[] } | undefined)?.dates ?? [];
const sun = (sunriseOffsetMinutes: number, civilDuskOffsetMinutes: number, stepMinutes: number): DoorParamsV2["schedule"] => ({ kind: "sun", sunriseOffsetMinutes, civilDuskOffsetMinutes, stepMinutes });
const fixed = (openAt: string, closeAt: string, stepMinutes = 30): DoorParamsV2["schedule"] => ({ kind: "fixed", openAt, closeAt, stepMinutes });

describe("sun schedule at a mid-latitude site", () => {
  it("finds nothing when both offsets are at least one step", () => {
    expect(at(BERLIN, sun(15, 30, 15))).toEqual([]);
  });

  it("refuses a negative dusk offset: the door closes before civil dusk on every day", () => {
    const [f] = rule(at(BERLIN, sun(0, -30, 30)), "RL-DUSK-CLOSE");
    expect(f).toMatchObject({ severity: "error", paths: ["/schedule/civilDuskOffsetMinutes", "/schedule/stepMinutes"] });
    expect(f?.message).toContain("With a close offset of −30 min the door closes before civil dusk on every one of the 365 days with a civil dusk");
    expect(datesOf(f)).toHaveLength(365);
  });

  it("warns when rounding down to the step grid closes the door before dusk, on the days an independent count finds", () => {
    const [f] = rule(at(BERLIN, sun(30, 0, 30)), "RL-DUSK-CLOSE");
    expect(f?.severity).toBe("warning");
    // Rounded down, dusk + 0 closes early exactly when dusk's minute of day is not a multiple of 30.
    const expected = sunYear({ lat: BERLIN.latitude, lon: BERLIN.longitude, year: 2026, tz: BERLIN.timeZone })
      .days.filter((d) => d.civilDusk.time !== null && d.civilDusk.minuteOfDay % 30 !== 0)
      .map((d) => d.date);
    expect(datesOf(f)).toEqual(expected);
    expect((f?.detail as { maxMinutesEarly: number }).maxMinutesEarly).toBeLessThanOrEqual(29);
    expect(f?.message).toContain("A close offset of at least one step (30 min) avoids it");
  });

  it("warns about a negative sunrise offset on every day", () => {
    const [f] = rule(at(BERLIN, sun(-30, 30, 30)), "RL-SUNRISE-OPEN");
    expect(f).toMatchObject({ severity: "warning", paths: ["/schedule/sunriseOffsetMinutes", "/schedule/stepMinutes"] });
    expect(f?.message).toContain("on every one of the 365 days with a sunrise, by up to 59 min");
  });

  it("warns when rounding the sunrise offset down opens before sunrise", () => {
    expect(rule(at(BERLIN, sun(0, 30, 30)), "RL-SUNRISE-OPEN")[0]?.severity).toBe("warning");
    expect(rule(at(BERLIN, sun(30, 30, 30)), "RL-SUNRISE-OPEN")).toEqual([]);
  });
});

describe("fixed schedule against the sun", () => {
  it("counts the days a fixed close comes before civil dusk and lists them as periods", () => {
    const [f] = rule(at(CHICAGO, fixed("07:00", "20:45", 15)), "RL-DUSK-CLOSE");
    expect(f).toMatchObject({ severity: "error", paths: ["/schedule/closeAt"] });
    const expected = sunYear({ lat: CHICAGO.latitude, lon: CHICAGO.longitude, year: 2026, tz: CHICAGO.timeZone })
      .days.filter((d) => d.civilDusk.time !== null && d.civilDusk.minuteOfDay > 20 * 60 + 45)
      .map((d) => d.date);
    expect(datesOf(f)).toEqual(expected);
    // Chicago's civil dusk is about 21:0x CDT at the June solstice and about 16:5x CST in December (from memory).
    expect(datesOf(f)).toContain("2026-06-21");
    expect(datesOf(f)).not.toContain("2026-12-21");
    expect(f?.message).toMatch(/^The fixed close at 20:45 is before civil dusk on \d+ days, by up to \d+ min \(2026-0\d-\d\d to 2026-0\d-\d\d\)/);
  });

  it("warns on the days a fixed open comes before sunrise", () => {
    const [f] = rule(at(CHICAGO, fixed("06:00", "22:00")), "RL-SUNRISE-OPEN");
    expect(f?.severity).toBe("warning");
    expect(datesOf(f)).toContain("2026-12-21");
    expect(datesOf(f)).not.toContain("2026-06-21"); // sunrise about 05:15 CDT (from memory)
  });

  it("finds nothing for a close well after dusk and an open well after sunrise", () => {
    expect(at(BERLIN, fixed("09:00", "23:00"))).toEqual([]);
  });
});

describe("southern hemisphere", () => {
  it("closes before dusk in the southern summer, not in June", () => {
    const [f] = rule(at(HOBART, fixed("08:00", "20:00")), "RL-DUSK-CLOSE");
    // Hobart's civil dusk is after 21:00 AEDT around the December solstice, about 17:15 AEST in June (from memory).
    expect(datesOf(f)).toContain("2026-12-21");
    expect(datesOf(f)).toContain("2026-01-15");
    expect(datesOf(f)).not.toContain("2026-06-21");
  });

  it("finds nothing for a well-set sun schedule", () => {
    expect(at(HOBART, sun(30, 30, 30))).toEqual([]);
  });
});

describe("polar site: Tromsø, 69.65° N", () => {
  const found = at(TROMSO, sun(30, 30, 30));

  it("refuses a sun schedule: in summer there is no civil dusk and the door would stay open all night", () => {
    const [f] = rule(found, "RL-POLAR", "error");
    expect(f?.paths).toEqual(["/schedule/kind", "/schedule/civilDuskOffsetMinutes"]);
    expect(f?.message).toContain("there is no civil dusk at 69.65° N");
    expect(f?.message).toContain("leave the door open all night");
    expect(datesOf(f)).toContain("2026-06-21");
    expect(datesOf(f)).not.toContain("2026-12-21");
  });

  it("counts the midnight-sun days within the season usually quoted for Tromsø", () => {
    const detail = rule(found, "RL-POLAR", "error")[0]?.detail as { midnightSunDays: number };
    // Midnight sun at Tromsø about 20 May to 22 July, some 64 days (from memory); the upper-limb and
    // refraction convention moves each end by a day or two.
    expect(detail.midnightSunDays).toBeGreaterThanOrEqual(62);
    expect(detail.midnightSunDays).toBeLessThanOrEqual(70);
  });

  it("warns that in the polar night there is no sunrise and the door stays shut", () => {
    const [f] = rule(found, "RL-POLAR", "warning");
    expect(f?.message).toContain("the sun does not rise (polar night)");
    expect(f?.message).toContain("keep the door shut all day");
    const detail = f?.detail as { daysWithoutSunrise: number };
    // Polar night at Tromsø about 27 November to 15 January (from memory): in 2026 that is 1–15 January and 27 November–31 December.
    expect(detail.daysWithoutSunrise).toBeGreaterThanOrEqual(46);
    expect(detail.daysWithoutSunrise).toBeLessThanOrEqual(52);
    expect(f?.message).toMatch(/2026-01-01 to 2026-01-1[3-6], 2026-11-2[6-9] to 2026-12-31/);
  });

  it("flags a civil dusk after local midnight on the nights at the edge of the light season", () => {
    expect(rule(found, "RL-POLAR", "warning")[0]?.message).toContain("falls after local midnight");
  });

  it("refuses a sun schedule whose open time falls after its close time on short days", () => {
    const [f] = rule(at(TROMSO, sun(240, 0, 30)), "RL-SCHEDULE-ORDER");
    expect(f?.severity).toBe("error");
    expect(f?.message).toContain("open in the dark and stay open through the night");
    // Just outside the polar night the sun is up for under four hours.
    expect(datesOf(f).every((d) => d.startsWith("2026-01-") || d.startsWith("2026-11-"))).toBe(true);
  });

  it("warns for a fixed schedule: it closes in twilight in June and opens in the dark in December", () => {
    const all = at(TROMSO, fixed("08:00", "21:30"));
    const [f] = rule(all, "RL-POLAR");
    expect(f?.severity).toBe("warning");
    expect(f?.message).toContain("there is no civil dusk: the fixed close at 21:30 still acts");
    expect(f?.message).toContain("the sun does not rise: the fixed open at 08:00 lets the birds out in the dark");
    // Before and after the white nights dusk comes later than 21:30.
    expect(datesOf(rule(all, "RL-DUSK-CLOSE")[0])).toContain("2026-04-20");
  });
});

describe("which year is checked", () => {
  it("takes now's year in the site's zone when no year is given", () => {
    const auckland: Site = { latitude: -36.85, longitude: 174.76, timeZone: "Pacific/Auckland" };
    const doc: DoorParamsV2 = { ...fixture("safety-v2-clean.json"), timeZone: auckland.timeZone, clock: { source: "gnss", alarmAfterHoursWithoutFix: 24 }, schedule: sun(30, -30, 30) };
    // 23:30 UTC on 31 December is already 1 January in New Zealand (UTC+13 in summer).
    const found = checkSafety(2, doc, { now: new Date("2026-12-31T23:30:00Z"), site: auckland });
    expect(datesOf(rule(found, "RL-DUSK-CLOSE")[0])[0]).toBe("2027-01-01");
  });

  it("uses the year given", () => {
    const [f] = rule(at(BERLIN, sun(0, -30, 30), { year: 2028 }), "RL-DUSK-CLOSE");
    expect(datesOf(f)).toHaveLength(366);
  });
});
