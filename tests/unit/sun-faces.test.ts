import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/tools/sun/route";
import { sunCommand } from "@/lib/cli/sun-command";
import { CliError } from "@/lib/cli/types";
import { sunDayInputSchema, sunQuerySchema, sunYearInputSchema } from "@/lib/sun/inputs";
import { formatOffset, offsetSeconds, resolveTimeZone } from "@/lib/sun/time-zone";

const issuesOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  (r.error?.issues ?? []).map((i) => `/${i.path.map(String).join("/")}: ${i.message}`);

const SITE = { lat: "52.52", lon: "13.4", tz: "Europe/Berlin" };

describe("sun input schemas", () => {
  it("accepts strings from a form or query and returns numbers", () => {
    expect(sunDayInputSchema.parse({ ...SITE, date: "2026-06-21" })).toEqual({ lat: 52.52, lon: 13.4, tz: "Europe/Berlin", date: "2026-06-21" });
  });

  it("names each field that is missing", () => {
    expect(issuesOf(sunDayInputSchema.safeParse({ lat: "", lon: " " }))).toEqual(["/lat: is required", "/lon: is required", "/date: is required", "/tz: is required"]);
  });

  it("refuses latitude and longitude out of range, and text that is not a number", () => {
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, lat: "90.5", date: "2026-01-01" }))).toEqual(["/lat: must be at most 90"]);
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, lon: "-180.1", date: "2026-01-01" }))).toEqual(["/lon: must be at least -180"]);
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, lat: "north", date: "2026-01-01" }))).toEqual(["/lat: must be a number"]);
  });

  it("refuses dates that do not exist, in the wrong shape, or out of range", () => {
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, date: "2026-02-30" }))).toEqual(["/date: is not a date that exists (2026-02-30)"]);
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, date: "2026-02-29" }))).toEqual(["/date: is not a date that exists (2026-02-29)"]);
    expect(sunDayInputSchema.safeParse({ ...SITE, date: "2028-02-29" }).success).toBe(true);
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, date: "21/06/2026" }))).toEqual(["/date: must be a date as YYYY-MM-DD"]);
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, date: "1899-12-31" }))).toEqual(["/date: must be between 1900-01-01 and 2100-12-31"]);
  });

  it("refuses an unknown time zone and an offset in place of a zone", () => {
    expect(issuesOf(sunDayInputSchema.safeParse({ ...SITE, tz: "Mars/Olympus_Mons", date: "2026-01-01" }))[0]).toMatch(/^\/tz: "Mars\/Olympus_Mons" is not a known IANA time zone/);
    expect(sunDayInputSchema.safeParse({ ...SITE, tz: "+01:00", date: "2026-01-01" }).success).toBe(false);
  });

  it("accepts aliases and fixes letter case of zone names", () => {
    expect(sunDayInputSchema.parse({ ...SITE, tz: "UTC", date: "2026-01-01" }).tz).toBe("UTC");
    expect(sunDayInputSchema.parse({ ...SITE, tz: "europe/berlin", date: "2026-01-01" }).tz).toBe("Europe/Berlin");
    expect(resolveTimeZone("Etc/UTC")).not.toBeNull();
    expect(resolveTimeZone("Nowhere")).toBeNull();
  });

  it("keeps the year between 1900 and 2100 and whole", () => {
    expect(issuesOf(sunYearInputSchema.safeParse({ ...SITE, year: "1899" }))).toEqual(["/year: must be 1900 or later"]);
    expect(issuesOf(sunYearInputSchema.safeParse({ ...SITE, year: "2101" }))).toEqual(["/year: must be 2100 or earlier"]);
    expect(issuesOf(sunYearInputSchema.safeParse({ ...SITE, year: "2026.5" }))).toEqual(["/year: must be a whole year"]);
  });

  it("wants either a date or a year in a query", () => {
    expect(issuesOf(sunQuerySchema.safeParse(SITE))).toEqual(["/date: is required (or give a year)"]);
    expect(issuesOf(sunQuerySchema.safeParse({ ...SITE, date: "2026-01-01", year: "2026" }))).toEqual(["/year: give either a date or a year, not both"]);
    expect(sunQuerySchema.parse({ ...SITE, year: "2026" })).toMatchObject({ kind: "year", year: 2026 });
  });
});

describe("time-zone offsets", () => {
  it("formats offsets as ISO-8601, with seconds only for historical local mean time", () => {
    expect(formatOffset(3600)).toBe("+01:00");
    expect(formatOffset(-34_200)).toBe("-09:30");
    expect(formatOffset(0)).toBe("+00:00");
    expect(formatOffset(-37_760)).toBe("-10:29:20");
  });

  it("reads India's +05:30 and Nepal's +05:45 from Intl", () => {
    expect(offsetSeconds(Date.UTC(2026, 0, 1), "Asia/Kolkata")).toBe(19_800);
    expect(offsetSeconds(Date.UTC(2026, 0, 1), "Asia/Kathmandu")).toBe(20_700);
  });
});

const get = (query: string) => GET(new Request(`http://127.0.0.1/api/v1/tools/sun?${query}`), {});

describe("GET /api/v1/tools/sun", () => {
  it("answers one day with ISO times with offset and a reason where an event does not occur", async () => {
    const res = await get("lat=69.65&lon=18.96&date=2026-06-21&tz=Europe/Oslo");
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toBe("public, max-age=300");
    const body = await res.json();
    expect(body).toMatchObject({ date: "2026-06-21", timeZone: "Europe/Oslo", timesRoundedTo: "nearest minute" });
    expect(body.sunset).toMatchObject({ time: null, reason: "sun stays above the horizon all day" });
    expect(body.solarNoon.time).toMatch(/^2026-06-21T12:\d\d:00\+02:00$/);
  });

  it("answers a whole year", async () => {
    const body = await (await get("lat=52.52&lon=13.4&year=2026&tz=Europe/Berlin")).json();
    expect(body.days).toHaveLength(365);
    expect(body.days[0].sunrise.time).toMatch(/^2026-01-01T08:\d\d:00\+01:00$/);
  });

  it("answers 400 with the path of a bad latitude", async () => {
    const res = await get("lat=123&lon=13.4&date=2026-06-21&tz=Europe/Berlin");
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toBe("invalid_request");
    expect(body.issues).toEqual([{ path: "/lat", message: "must be at most 90" }]);
  });

  it("answers 400 naming a date that does not exist and an unknown zone", async () => {
    const body = await (await get("lat=52&lon=13&date=2026-02-30&tz=Nowhere/City")).json();
    expect(body.issues.map((i: { path: string }) => i.path)).toEqual(["/date", "/tz"]);
  });

  it("answers 400 when neither a date nor a year is given", async () => {
    const body = await (await get("lat=52&lon=13&tz=UTC")).json();
    expect(body.issues).toEqual([{ path: "/date", message: "is required (or give a year)" }]);
  });
});

describe("roostline sun", () => {
  const run = (...args: string[]) => sunCommand.run(args);
  const failure = (...args: string[]) => {
    try {
      run(...args);
    } catch (err) {
      return err;
    }
    throw new Error("expected a failure");
  };

  it("prints a small table for one day, with the reason for an event that does not occur", () => {
    const { text, json } = run("--lat", "69.65", "--lon", "18.96", "--date", "2026-12-21", "--tz", "Europe/Oslo");
    expect(text).toMatch(/sunrise\s+—\s+sun stays below the horizon all day/);
    expect(text).toMatch(/civil dawn\s+\d\d:\d\d/);
    expect(json).toMatchObject({ sunrise: { time: null, reason: "sun stays below the horizon all day" }, timesRoundedTo: "nearest minute" });
  });

  it("takes negative coordinates as separate arguments", () => {
    const { json } = run("--lat", "-33.92", "--lon", "18.42", "--date", "2026-06-21", "--tz", "Africa/Johannesburg");
    expect((json as { latitude: number }).latitude).toBe(-33.92);
    expect(run("--lat=-33.92", "--lon=18.42", "--date=2026-06-21", "--tz=Africa/Johannesburg").text).toContain("-33.92");
  });

  it("prints a year as CSV with the agreed header, 366 rows in a leap year", () => {
    const lines = run("--lat", "52.52", "--lon", "13.4", "--year", "2028", "--tz", "Europe/Berlin").text.split("\n");
    expect(lines[0]).toBe("date,civil_dawn,sunrise,sunset,civil_dusk,day_length_min");
    expect(lines).toHaveLength(367);
    expect(lines[1]).toMatch(/^2028-01-01,2028-01-01T07:\d\d:00\+01:00,2028-01-01T08:\d\d:00\+01:00,2028-01-01T16:\d\d:00\+01:00,2028-01-01T16:\d\d:00\+01:00,\d+$/);
  });

  it("leaves an empty CSV cell where an event does not occur", () => {
    const lines = run("--lat", "69.65", "--lon", "18.96", "--year", "2026", "--tz", "Europe/Oslo").text.split("\n");
    expect(lines.find((l) => l.startsWith("2026-06-21,"))).toMatch(/^2026-06-21,,,,,1440$/);
  });

  it("throws a CliError naming the option for bad input", () => {
    expect(failure("--lat", "95", "--lon", "0", "--date", "2026-01-01", "--tz", "UTC")).toEqual(new CliError("--lat: must be at most 90"));
    expect(failure("--lat", "5", "--lon", "0", "--date", "2026-02-30", "--tz", "UTC")).toEqual(new CliError("--date: is not a date that exists (2026-02-30)"));
    expect((failure("--lat", "5", "--lon", "0", "--date", "2026-01-01", "--tz", "Atlantis/Capital") as Error).message).toMatch(/^--tz: /);
    expect(failure("--lat", "5", "--lon", "0", "--tz", "UTC")).toEqual(new CliError("--date: is required (or give a year)"));
    expect(failure("--lat", "5", "--lon", "0", "--tz", "UTC", "--year", "1800")).toEqual(new CliError("--year: must be 1900 or later"));
  });

  it("throws a CliError for an unknown option or a stray argument", () => {
    expect(failure("--latitude", "5")).toBeInstanceOf(CliError);
    expect(failure("--lat", "5", "--lon", "0", "--tz", "UTC", "--year", "2026", "extra")).toBeInstanceOf(CliError);
  });
});
