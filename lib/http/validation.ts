import type { z } from "zod";
import { AppError, type Issue } from "./errors";

/** zod issues as `{ path, message }` with a JSON-pointer-like path ("/role", "" for the root). */
export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({
    path: i.path.length ? "/" + i.path.map(String).join("/") : "",
    message: i.message,
  }));
}

/** Validates a value with a zod schema, throwing a 400 AppError that names each wrong field. */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown, what = "request"): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const issues = zodIssues(parsed.error);
  const first = issues[0];
  const summary = first ? `${first.path || "body"}: ${first.message}` : "invalid";
  throw new AppError("invalid_request", `The ${what} is not valid (${summary}).`, { issues });
}

/** Whether a parsed JSON value nests no deeper than `limit` objects and arrays (MariaDB's JSON type stops at 32). */
export function withinJsonDepth(value: unknown, limit = 32): boolean {
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length) {
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== "object") continue;
    if (depth + 1 > limit) return false;
    for (const child of Object.values(v)) stack.push([child, depth + 1]);
  }
  return true;
}
