import type { z } from "zod";
import { AppError, toAppError } from "./errors";
import { parseWith } from "./validation";

const MAX_JSON_BYTES = 256 * 1024;

/** The body as text, refused as soon as more than `maxBytes` have arrived (a body without a length is streamed). */
async function readAtMost(request: Request, maxBytes: number): Promise<string> {
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel();
      throw new AppError("invalid_request", `The body is larger than ${maxBytes / 1024} KiB.`);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}

/** Reads and validates a JSON body: 400 for a wrong content type, malformed JSON or a wrong shape. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S, { maxBytes = MAX_JSON_BYTES }: { maxBytes?: number } = {}): Promise<z.infer<S>> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().includes("application/json")) {
    throw new AppError("invalid_request", "Send the body as JSON with Content-Type: application/json.");
  }
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > maxBytes) {
    throw new AppError("invalid_request", `The body is larger than ${maxBytes / 1024} KiB.`);
  }
  const text = await readAtMost(request, maxBytes);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    const detail = err instanceof SyntaxError ? err.message : "unreadable";
    throw new AppError("invalid_request", `The body is not valid JSON (${detail}).`);
  }
  return parseWith(schema, value, "request body");
}

/** The JSON body of an error response. */
export function errorResponse(err: AppError): Response {
  const headers: Record<string, string> = { "cache-control": "no-store" };
  if (err.retryAfterSeconds) headers["retry-after"] = String(err.retryAfterSeconds);
  return Response.json(
    { error: err.code, message: err.message, ...(err.issues ? { issues: err.issues } : {}) },
    { status: err.status, headers },
  );
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler: known errors get their status, anything else is logged and masked as 500. */
export function handle<C>(fn: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await fn(request, context);
    } catch (err) {
      const known = toAppError(err);
      if (known) return errorResponse(known);
      console.error(`[roostline] ${request.method} ${new URL(request.url).pathname} failed`, err);
      return Response.json(
        { error: "internal", message: "Something went wrong on our side; it has been logged." },
        { status: 500, headers: { "cache-control": "no-store" } },
      );
    }
  };
}
