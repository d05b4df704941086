import { parseArgs } from "node:util";
import { EVENT_LABELS, sunDay, type EventKind, type SunDay } from "@/lib/sun/events";
import { clockTime, formatDuration, YEAR_CSV_HEADER, yearCsv } from "@/lib/sun/format";
import { sunQuerySchema } from "@/lib/sun/inputs";
import { sunYear } from "@/lib/sun/year";
import { CliError, kebabFlag, parseCliInput, type CliCommand } from "./types";

const USAGE = `Usage:
  roostline sun --lat N --lon N --date YYYY-MM-DD --tz ZONE [--json]
  roostline sun --lat N --lon N --year YYYY --tz ZONE [--json]

Civil dawn, sunrise, solar noon, sunset and civil dusk for a site on a local calendar day, or for
every day of a year (CSV: ${YEAR_CSV_HEADER}; empty cell where an event does not occur).

  --lat   latitude in degrees, north positive (-90 to 90)
  --lon   longitude in degrees, east positive (-180 to 180)
  --date  local calendar day in the zone, YYYY-MM-DD
  --year  a whole year instead of one day (1900 to 2100)
  --tz    IANA time zone, e.g. Europe/Berlin or UTC
  --json  one JSON object; times are ISO-8601 with offset, an event that does not occur is
          { "time": null, "reason": ... }

Times are rounded to the nearest minute. Sunrise and sunset: the Sun's upper limb on the
horizon with standard refraction (-0.833°); civil dawn and dusk: its centre at -6°.`;

const KINDS: EventKind[] = ["civilDawn", "sunrise", "solarNoon", "sunset", "civilDusk"];

// parseArgs reads "--lat -33.9" as a missing value followed by an option; joining the pair
// lets southern and western coordinates be typed the natural way.
function joinNegativeValues(args: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    const next = args[i + 1];
    if (/^--[a-z]+$/.test(a) && next !== undefined && /^-\d|^-\.\d/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

function dayText(day: SunDay): string {
  const lines = [`Sun at ${day.latitude}, ${day.longitude} on ${day.date} (${day.timeZone}, UTC${day.utcOffset})`, ""];
  for (const kind of KINDS) {
    const e = day[kind];
    const detail = e.time === null ? e.reason : (e.note ?? "");
    lines.push(`  ${EVENT_LABELS[kind].padEnd(11)} ${clockTime(e).padEnd(5)}  ${detail}`.trimEnd());
  }
  lines.push(`  ${"day length".padEnd(11)} ${formatDuration(day.dayLengthMinutes)}`, "", "Local times, rounded to the nearest minute.");
  return lines.join("\n");
}

function readArgs(args: string[]) {
  try {
    return parseArgs({
      args: joinNegativeValues(args),
      options: { lat: { type: "string" }, lon: { type: "string" }, date: { type: "string" }, year: { type: "string" }, tz: { type: "string" } },
      strict: true,
      allowPositionals: true,
    });
  } catch (err) {
    const code = (err as { code?: string }).code;
    if (err instanceof Error && code?.startsWith("ERR_PARSE_ARGS")) throw new CliError(err.message.split(/\n|\. /)[0]!);
    throw err;
  }
}

/** `roostline sun`: sun events for a site on one day or through a year. */
export const sunCommand: CliCommand = {
  summary: "Sunrise, sunset, civil dawn and dusk for a site: one day or a whole year",
  usage: USAGE,
  run(args) {
    const { values, positionals } = readArgs(args);
    if (positionals.length) throw new CliError(`unexpected argument "${positionals[0]}"; see --help`);
    const query = parseCliInput(sunQuerySchema, values, kebabFlag);
    if (query.kind === "day") {
      const day = sunDay(query);
      return { text: dayText(day), json: { ...day, timesRoundedTo: "nearest minute" } };
    }
    const year = sunYear(query);
    return { text: yearCsv(year), json: { ...year, timesRoundedTo: "nearest minute" } };
  },
};
