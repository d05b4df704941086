"use server";
import { headers } from "next/headers";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { changeUserRole, deactivateUser, reactivateUser } from "@/db/queries/users";
import { requireUser } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { type ActionResult, parseForm, runAction } from "@/lib/http/action";
import { inviteSchema, inviteUser, resendInvitation, roleSchema } from "@/lib/users/admin";

const userIdSchema = z.object({ userId: z.string().min(1, "Missing user").max(64) });
const roleChangeSchema = userIdSchema.extend({ role: roleSchema });

/** Invites a colleague by e-mail with a role; they set their own password from the link. */
export async function inviteUserAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("users:manage");
    const parsed = parseForm(inviteSchema, form);
    if ("result" in parsed) return parsed.result;
    await inviteUser({ actor, input: parsed.data, requestHeaders: await headers() });
    revalidatePath("/admin/users");
    return { ok: true, message: `Invitation sent to ${parsed.data.email} as ${ROLE_LABELS[parsed.data.role]}.` };
  });
}

/** Gives a user another role (never leaving the team without an active admin). */
export async function changeRoleAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("users:manage");
    const parsed = parseForm(roleChangeSchema, form);
    if ("result" in parsed) return parsed.result;
    await changeUserRole({ actorId: actor.id, ...parsed.data });
    revalidatePath("/admin/users");
    return { ok: true, message: `Role changed to ${ROLE_LABELS[parsed.data.role]}.` };
  });
}

/** Deactivates a user; their sessions end at once. */
export async function deactivateUserAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("users:manage");
    const parsed = parseForm(userIdSchema, form);
    if ("result" in parsed) return parsed.result;
    await deactivateUser({ actorId: actor.id, userId: parsed.data.userId });
    revalidatePath("/admin/users");
    return { ok: true, message: "Deactivated. Their sessions have ended." };
  });
}

/** Lets a deactivated user sign in again. */
export async function reactivateUserAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("users:manage");
    const parsed = parseForm(userIdSchema, form);
    if ("result" in parsed) return parsed.result;
    await reactivateUser({ actorId: actor.id, userId: parsed.data.userId });
    revalidatePath("/admin/users");
    return { ok: true, message: "Reactivated." };
  });
}

/** Sends a new invitation link to someone who has not set a password. */
export async function resendInvitationAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("users:manage");
    const parsed = parseForm(userIdSchema, form);
    if ("result" in parsed) return parsed.result;
    await resendInvitation({ actor, userId: parsed.data.userId });
    revalidatePath("/admin/users");
    return { ok: true, message: "A new invitation is on its way." };
  });
}
