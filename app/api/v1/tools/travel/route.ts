import { computeTravel } from "@/lib/drive/travel";
import { travelInputSchema } from "@/lib/drive/inputs";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

/** Encoder counts, resolution and travel time for a door's travel; public, pure, cacheable. */
export const GET = handle(async (request) => {
  const input = parseWith(travelInputSchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  return Response.json({ input, result: computeTravel(input) }, { headers: { "cache-control": "public, max-age=300" } });
});
