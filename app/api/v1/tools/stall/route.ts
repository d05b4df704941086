import { stallInputSchema } from "@/lib/drive/inputs";
import { computeStall } from "@/lib/drive/stall";
import { TRAPPING_CAUTION } from "@/lib/drive/warnings";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

/** Stall threshold, start-up blanking and reaction distance; public, pure, cacheable. */
export const GET = handle(async (request) => {
  const input = parseWith(stallInputSchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  return Response.json(
    { input, result: computeStall(input), caution: TRAPPING_CAUTION },
    { headers: { "cache-control": "public, max-age=300" } },
  );
});
