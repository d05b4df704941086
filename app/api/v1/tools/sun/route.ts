import { sunDay } from "@/lib/sun/events";
import { sunQuerySchema } from "@/lib/sun/inputs";
import { sunYear } from "@/lib/sun/year";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

const HEADERS = { "cache-control": "public, max-age=300" };

/**
 * Sun events for a site: `?lat=&lon=&date=&tz=` for one local day, `?lat=&lon=&year=&tz=` for a
 * whole year. Public: pure computation, touches no data. Times are local ISO-8601 with offset,
 * rounded to the nearest minute; an event that does not occur is `{ time: null, reason }`.
 */
export const GET = handle(async (request: Request) => {
  const query = parseWith(sunQuerySchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  const body = query.kind === "day" ? sunDay(query) : sunYear(query);
  return Response.json({ ...body, timesRoundedTo: "nearest minute" }, { headers: HEADERS });
});
