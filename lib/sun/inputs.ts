// Shared input schemas for the sun tool: the page, the HTTP route and the CLI all parse with
// these, so a bad value gets the same message wherever it is typed.

import { z } from "zod";
import { resolveTimeZone } from "./time-zone";

/** The years we compute: the zone history and the low-accuracy solar series are trusted here. */
export const MIN_YEAR = 1900;
export const MAX_YEAR = 2100;

const blankToUndefined = (v: unknown) => (v === null || (typeof v === "string" && v.trim() === "") ? undefined : v);

const present = z.custom<unknown>((v) => v !== undefined, { error: "is required" });

const numberField = () => present.pipe(z.coerce.number({ error: "must be a number" }));

const latitude = z.preprocess(blankToUndefined, numberField().pipe(z.number().min(-90, "must be at least -90").max(90, "must be at most 90")));
const longitude = z.preprocess(blankToUndefined, numberField().pipe(z.number().min(-180, "must be at least -180").max(180, "must be at most 180")));

const year = z.preprocess(
  blankToUndefined,
  numberField().pipe(z.number().int("must be a whole year").min(MIN_YEAR, `must be ${MIN_YEAR} or later`).max(MAX_YEAR, `must be ${MAX_YEAR} or earlier`)),
);

const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function dateProblem(value: string): string | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!m) return "must be a date as YYYY-MM-DD";
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (y < MIN_YEAR || y > MAX_YEAR) return `must be between ${MIN_YEAR}-01-01 and ${MAX_YEAR}-12-31`;
  const leap = (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
  const max = mo === 2 && !leap ? 28 : (DAYS_IN_MONTH[mo - 1] ?? 0);
  if (mo < 1 || mo > 12 || d < 1 || d > max) return `is not a date that exists (${value})`;
  return null;
}

const date = z.preprocess(
  blankToUndefined,
  present.pipe(
    z
      .string({ error: "must be a date as YYYY-MM-DD" })
      .trim()
      .check((ctx) => {
        const problem = dateProblem(ctx.value);
        if (problem) ctx.issues.push({ code: "custom", message: problem, input: ctx.value });
      }),
  ),
);

const timeZone = z.preprocess(
  blankToUndefined,
  present.pipe(
    z
      .string({ error: "must be an IANA time zone name" })
      .trim()
      .transform((v, ctx) => {
        const resolved = resolveTimeZone(v);
        if (resolved) return resolved;
        ctx.addIssue({ code: "custom", message: `"${v}" is not a known IANA time zone (e.g. Europe/Berlin, UTC)` });
        return z.NEVER;
      }),
  ),
);

/** One local calendar day at a site. */
export const sunDayInputSchema = z.object({ lat: latitude, lon: longitude, date, tz: timeZone });
export type SunDayInput = z.infer<typeof sunDayInputSchema>;

/** A whole year at a site. */
export const sunYearInputSchema = z.object({ lat: latitude, lon: longitude, year, tz: timeZone });
export type SunYearInput = z.infer<typeof sunYearInputSchema>;

/** Query-string or command-line input: a site with either `date` (one day) or `year`. */
export const sunQuerySchema = z
  .object({ lat: latitude, lon: longitude, date: date.optional(), year: year.optional(), tz: timeZone })
  .superRefine((v, ctx) => {
    if (v.date === undefined && v.year === undefined) ctx.addIssue({ code: "custom", path: ["date"], message: "is required (or give a year)" });
    if (v.date !== undefined && v.year !== undefined) ctx.addIssue({ code: "custom", path: ["year"], message: "give either a date or a year, not both" });
  })
  .transform((v) =>
    v.date !== undefined
      ? { kind: "day" as const, lat: v.lat, lon: v.lon, tz: v.tz, date: v.date }
      : { kind: "year" as const, lat: v.lat, lon: v.lon, tz: v.tz, year: v.year ?? MIN_YEAR },
  );
export type SunQuery = z.infer<typeof sunQuerySchema>;
