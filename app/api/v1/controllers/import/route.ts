import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { importControllers, importSchema } from "@/lib/releases/import-controllers";

/**
 * Registers controllers from CSV text: `{ csv, onlyGoodRows? }`. 400 naming each bad row unless
 * `onlyGoodRows`; the answer lists each new serial with its token, shown this once.
 */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "controllers:manage");
  const input = await readJson(request, importSchema, { maxBytes: 2 * 1024 * 1024 });
  return Response.json(await importControllers({ actor, input }), { status: 201, headers: { "cache-control": "no-store" } });
});
