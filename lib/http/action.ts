import { z } from "zod";
import { AppError, toAppError } from "./errors";

/** What every server action returns: forms show `message` and each field's error beside the field. */
export type ActionResult<T = undefined> =
  | { ok: true; message?: string; data?: T }
  | { ok: false; code: string; message: string; fieldErrors?: Record<string, string> };

export const idle: ActionResult = { ok: true };

/** Parses FormData with a zod schema into field errors keyed by field name. */
export function parseForm<S extends z.ZodType>(schema: S, form: FormData): { data: z.infer<S> } | { result: ActionResult<never> } {
  // An action can be posted by hand with any argument; only a form is a form.
  if (!(form instanceof FormData)) return { result: { ok: false, code: "invalid_request", message: "Send the form's fields." } };
  const parsed = schema.safeParse(Object.fromEntries(form.entries()));
  if (parsed.success) return { data: parsed.data };
  const fieldErrors: Record<string, string> = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path.map(String).join(".") || "form";
    fieldErrors[key] ??= issue.message;
  }
  return { result: { ok: false, code: "invalid_request", message: "Check the highlighted fields.", fieldErrors } };
}

/** Runs an action body, turning known errors into a result and masking anything else. */
export async function runAction<T>(fn: () => Promise<ActionResult<T>>): Promise<ActionResult<T>> {
  try {
    return await fn();
  } catch (err) {
    // Next's redirect()/notFound() work by throwing; let them through.
    if (err && typeof err === "object" && "digest" in err && typeof err.digest === "string" && err.digest.startsWith("NEXT_")) {
      throw err;
    }
    const known = toAppError(err);
    if (known) {
      const fieldErrors = known.issues?.length
        ? Object.fromEntries(known.issues.map((i) => [i.path.replace(/^\//, "") || "form", i.message]))
        : undefined;
      return { ok: false, code: known.code, message: known.message, fieldErrors };
    }
    console.error("[roostline] server action failed", err);
    return { ok: false, code: "internal", message: "Something went wrong on our side; it has been logged." };
  }
}

export { AppError };
