import { readFileSync } from "node:fs";

export const dynamic = "force-dynamic";

let reference: { body: string; etag: string } | undefined;

/**
 * The benchmark's framework floor: a trivial handler of the same build that answers with the bytes
 * and ETag of a real device configuration, read once from ROOSTLINE_BENCH_REFERENCE. Off (404) unless
 * `npm run bench` set that variable.
 */
export async function GET(request: Request) {
  const file = process.env.ROOSTLINE_BENCH_REFERENCE;
  if (!file) return Response.json({ error: "not_found", message: "Only the benchmark serves this." }, { status: 404 });
  reference ??= JSON.parse(readFileSync(file, "utf8")) as { body: string; etag: string };
  const headers = { etag: reference.etag, "cache-control": "private, no-cache" };
  if (request.headers.get("if-none-match") === reference.etag) return new Response(null, { status: 304, headers });
  return new Response(reference.body, { headers: { ...headers, "content-type": "application/json; charset=utf-8" } });
}
