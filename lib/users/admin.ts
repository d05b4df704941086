import { z } from "zod";
import { recordAudit } from "@/db/queries/audit";
import { findUserByEmail, getUser } from "@/db/queries/users";
import { getAuth } from "@/lib/auth/auth";
import { ROLES } from "@/lib/auth/permissions";
import type { SessionUser } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { deliverDueMail } from "@/lib/mail/outbox";

export const roleSchema = z.enum(ROLES, { error: `must be one of ${ROLES.join(", ")}` });

export const inviteSchema = z.object({
  name: z.string().trim().min(1, "Enter the person's name").max(120, "Keep the name under 120 characters"),
  email: z.string().trim().toLowerCase().max(191, "Keep the address under 191 characters").pipe(z.email("Enter a valid e-mail address")),
  role: roleSchema,
});
export type InviteInput = z.infer<typeof inviteSchema>;

/**
 * Creates a user without a password and mails a one-time set-password link.
 * `requestHeaders` carry the admin's session, so better-auth checks the admin too.
 */
export async function inviteUser({ actor, input, requestHeaders }: { actor: SessionUser; input: InviteInput; requestHeaders: Headers }) {
  if (await findUserByEmail({ email: input.email })) {
    throw new AppError("conflict", "Someone with this e-mail address already has an account.", {
      issues: [{ path: "/email", message: "Already in use" }],
    });
  }
  const auth = getAuth();
  const created = await auth.api.createUser({
    headers: requestHeaders,
    body: { email: input.email, name: input.name, role: input.role },
  });
  const userId = created.user.id;
  await recordAudit({ actorId: actor.id, action: "user.invited", subjectType: "user", subjectId: userId, detail: { email: input.email, role: input.role } });
  await sendSetPasswordLink({ email: input.email });
  return { userId };
}

/** Sends a fresh invitation to someone who has not set a password yet. */
export async function resendInvitation({ actor, userId }: { actor: SessionUser; userId: string }) {
  const user = await getUser({ userId });
  if (!user) throw new AppError("not_found", "No such user.");
  if (user.status !== "invited") throw new AppError("conflict", "This person has already set a password.");
  await sendSetPasswordLink({ email: user.email });
  await recordAudit({ actorId: actor.id, action: "user.invitation_resent", subjectType: "user", subjectId: userId });
}

async function sendSetPasswordLink({ email }: { email: string }) {
  await getAuth().api.requestPasswordReset({ body: { email, redirectTo: "/set-password" } });
  await deliverDueMail();
}
