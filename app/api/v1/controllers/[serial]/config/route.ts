import { requireController, requireOwnSerial } from "@/lib/auth/device";
import { AppError } from "@/lib/http/errors";
import { handle } from "@/lib/http/route";
import { deviceConfigFor } from "@/lib/releases/service";

type Ctx = { params: Promise<{ serial: string }> };

export const dynamic = "force-dynamic";

/** The calling controller's signed configuration; 304 when If-None-Match matches; 404 when nothing is released to it. */
export const GET = handle<Ctx>(async (request, ctx) => {
  const controller = await requireController(request);
  requireOwnSerial(controller, (await ctx.params).serial);
  const config = await deviceConfigFor(controller);
  if (!config) throw new AppError("not_found", "Nothing has been released to this controller yet; keep the configuration you run.");
  const headers = { etag: config.etag, "cache-control": "private, no-cache" };
  const inm = request.headers.get("if-none-match");
  if (inm && inm.split(",").some((t) => t.trim() === config.etag)) return new Response(null, { status: 304, headers });
  return new Response(config.body, { headers: { ...headers, "content-type": "application/json; charset=utf-8" } });
});
