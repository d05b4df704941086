"use server";
import { headers } from "next/headers";
import { z } from "zod";
import { getAuth, MIN_PASSWORD_LENGTH } from "@/lib/auth/auth";
import { requireUser } from "@/lib/auth/guard";
import { type ActionResult, parseForm, runAction } from "@/lib/http/action";

function isBadRequest(err: unknown): boolean {
  const e = err as { status?: unknown; statusCode?: unknown } | null;
  return !!e && (e.status === "BAD_REQUEST" || e.statusCode === 400);
}

const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter your current password"),
    newPassword: z
      .string()
      .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters`)
      .max(128, "Use at most 128 characters"),
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { path: ["confirmPassword"], message: "The two new passwords differ" })
  .refine((v) => v.newPassword !== v.currentPassword, { path: ["newPassword"], message: "Choose a password different from the current one" });

/** Changes the signed-in person's password and ends their other sessions. */
export async function changePasswordAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    await requireUser();
    const parsed = parseForm(changePasswordSchema, form);
    if ("result" in parsed) return parsed.result;
    try {
      await getAuth().api.changePassword({
        headers: await headers(),
        body: { currentPassword: parsed.data.currentPassword, newPassword: parsed.data.newPassword, revokeOtherSessions: true },
      });
    } catch (err) {
      // Checked by shape: the production bundle may hold more than one copy of the error class.
      if (isBadRequest(err)) {
        return { ok: false, code: "invalid_request", message: "Check the highlighted fields.", fieldErrors: { currentPassword: "This is not your current password" } };
      }
      throw err;
    }
    return { ok: true, message: "Password changed. Your other sessions have been signed out." };
  });
}
