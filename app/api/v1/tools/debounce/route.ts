import { computeDebounce } from "@/lib/drive/debounce";
import { debounceInputSchema } from "@/lib/drive/inputs";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

/** RC + Schmitt-trigger debounce delays and software sampling; public, pure, cacheable. */
export const GET = handle(async (request) => {
  const input = parseWith(debounceInputSchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  return Response.json({ input, result: computeDebounce(input) }, { headers: { "cache-control": "public, max-age=300" } });
});
