import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkSafety, type SafetyFinding, type Site } from "@/lib/profiles/safety";
import type { DoorParamsV1, DoorParamsV2 } from "@/lib/profiles/schemas";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = <T = DoorParamsV2>(name: string): T => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as T;
const NOW = new Date("2026-03-01T12:00:00Z");

const site = (latitude: number, longitude: number, timeZone: string): Site => ({ latitude, longitude, timeZone });
const BERLIN = site(52.52, 13.405, "Europe/Berlin");

// The clean profile at a site, with a time source; only the clock rules and RL-NO-SITE are kept.
function clockFindings(where: Site | undefined, source: DoorParamsV2["clock"]["source"], timeZone = where?.timeZone ?? "Europe/Berlin"): SafetyFinding[] {
  const doc: DoorParamsV2 = { ...fixture("safety-v2-clean.json"), timeZone, clock: { source, alarmAfterHoursWithoutFix: 48 } };
  return checkSafety(2, doc, { now: NOW, site: where, year: 2026 }).filter((f) => /^RL-(TIME|NO-SITE)/.test(f.ruleId));
}

describe("RL-TIME-SOURCE-RANGE", () => {
  it("is quiet within the usual range", () => {
    expect(clockFindings(BERLIN, "dcf77")).toEqual([]);
    expect(clockFindings(site(51.5, -0.13, "Europe/London"), "msf")).toEqual([]);
    expect(clockFindings(site(41.88, -87.63, "America/Chicago"), "wwvb")).toEqual([]);
    // Lisbon is about 1,900 km from Mainflingen, just inside DCF77's 2,000 km.
    expect(clockFindings(site(38.72, -9.14, "Europe/Lisbon"), "dcf77")).toEqual([]);
  });

  it("warns beyond the usual range, naming the distance", () => {
    const [f] = clockFindings(site(64.15, -21.94, "Atlantic/Reykjavik"), "dcf77");
    expect(f).toMatchObject({ ruleId: "RL-TIME-SOURCE-RANGE", severity: "warning", paths: ["/clock/source"] });
    expect(f?.message).toMatch(/^The site is 2,40\d km from DCF77/);
    // Madrid is about 1,600 km from Anthorn, beyond MSF's 1,000 km.
    expect(clockFindings(site(40.42, -3.7, "Europe/Madrid"), "msf")[0]?.severity).toBe("warning");
    // Honolulu is about 5,400 km from Fort Collins: out of range, but not three times over.
    expect(clockFindings(site(21.31, -157.86, "Pacific/Honolulu"), "wwvb")[0]?.severity).toBe("warning");
  });

  it("refuses a radio source on another continent: WWVB in Australia, DCF77 in North America", () => {
    const [f] = clockFindings(site(-33.87, 151.21, "Australia/Sydney"), "wwvb");
    expect(f).toMatchObject({ ruleId: "RL-TIME-SOURCE-RANGE", severity: "error" });
    expect(f?.message).toContain("in practice another continent, so the clock would never be set");
    expect(clockFindings(site(40.71, -74.01, "America/New_York"), "dcf77")[0]?.severity).toBe("error");
    expect(clockFindings(site(35.68, 139.69, "Asia/Tokyo"), "msf")[0]?.severity).toBe("error");
  });

  it("does not judge GNSS or NTP by distance", () => {
    expect(clockFindings(site(-33.87, 151.21, "Australia/Sydney"), "gnss")).toEqual([]);
    expect(clockFindings(site(-33.87, 151.21, "Australia/Sydney"), "ntp")).toEqual([]);
  });

  it("reports the v1 path /timeSource for a v1 document", () => {
    const v1: DoorParamsV1 = { ...fixture<DoorParamsV1>("safety-v1-clean.json"), timeSource: "wwvb" };
    const found = checkSafety(1, v1, { now: NOW, site: BERLIN }).filter((f) => f.ruleId === "RL-TIME-SOURCE-RANGE");
    expect(found).toMatchObject([{ severity: "error", paths: ["/timeSource"] }]);
  });
});

describe("RL-TIME-SOURCE-RTC", () => {
  it("warns that the real-time clock alone drifts, with the drift and the alarm hours", () => {
    const [f] = clockFindings(BERLIN, "rtc-only");
    expect(f).toMatchObject({ ruleId: "RL-TIME-SOURCE-RTC", severity: "warning", paths: ["/clock/source", "/clock/alarmAfterHoursWithoutFix"] });
    // 20 ppm × 86,400 s = 1.728 s a day; × 365 = 631 s ≈ 11 min a year.
    expect(f?.message).toContain("up to 1.7 s a day, about 11 min a year");
    expect(f?.message).toContain("the alarm after 48 h");
  });

  it("maps to /timeSource and /noFixAlarmHours in version 1", () => {
    const v1: DoorParamsV1 = { ...fixture<DoorParamsV1>("safety-v1-clean.json"), timeSource: "rtc-only" };
    const found = checkSafety(1, v1, { now: NOW, site: BERLIN }).filter((f) => f.ruleId === "RL-TIME-SOURCE-RTC");
    expect(found[0]?.paths).toEqual(["/timeSource", "/noFixAlarmHours"]);
  });
});

describe("RL-TIME-ZONE", () => {
  it("refuses a document zone that keeps another clock than the site's", () => {
    const [f] = clockFindings(BERLIN, "dcf77", "America/Chicago");
    expect(f).toMatchObject({ ruleId: "RL-TIME-ZONE", severity: "error", paths: ["/timeZone"] });
    expect(f?.message).toContain("on 365 days of 2026");
  });

  it("counts only the summer-time days when the zones differ by daylight saving alone", () => {
    const [f] = clockFindings(site(51.5, -0.13, "Europe/London"), "msf", "Africa/Abidjan");
    // EU summer time runs from the last Sunday of March to the last Sunday of October (Directive
    // 2000/84/EC, Art. 2–3; the UK keeps the same dates): in 2026, 29 March to 24 October at local noon, 210 days.
    expect((f?.detail as { days: number }).days).toBe(210);
    expect(f?.message).toContain("2026-03-29 to 2026-10-24");
  });

  it("accepts another name for the same zone", () => {
    expect(clockFindings(site(22.57, 88.36, "Asia/Kolkata"), "gnss", "Asia/Calcutta")).toEqual([]);
  });
});

describe("RL-NO-SITE", () => {
  it("warns once that schedule and clock could not be checked without a site", () => {
    const found = clockFindings(undefined, "wwvb");
    expect(found).toMatchObject([{ ruleId: "RL-NO-SITE", severity: "warning", paths: ["/schedule", "/clock/source"] }]);
  });
});

describe("power-up rules", () => {
  const power = (change: Partial<DoorParamsV2>) =>
    checkSafety(2, { ...fixture<DoorParamsV2>("safety-v2-clean.json"), ...change }, { now: NOW, site: BERLIN }).filter((f) => f.ruleId === "RL-POWER-UP-OPEN" || f.ruleId === "RL-HOMING-OFF");

  it("warns that power-up mode open opens the door at night after a power cut", () => {
    const [f] = power({ powerUpMode: "open" });
    expect(f).toMatchObject({ ruleId: "RL-POWER-UP-OPEN", severity: "warning", paths: ["/powerUpMode"] });
    expect(f?.message).toContain("opens in the dark, to predators");
    expect(power({ powerUpMode: "closed" })).toEqual([]);
    expect(power({ powerUpMode: "scheduled" })).toEqual([]);
  });

  it("warns when homing on power-up is off", () => {
    expect(power({ homeOnPowerUp: false })).toMatchObject([{ ruleId: "RL-HOMING-OFF", severity: "warning", paths: ["/homeOnPowerUp"] }]);
    expect(power({ homeOnPowerUp: true })).toEqual([]);
  });
});
