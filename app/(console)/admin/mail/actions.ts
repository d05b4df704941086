"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { retryMail } from "@/db/queries/mail";
import { requireUser } from "@/lib/auth/guard";
import { type ActionResult, AppError, parseForm, runAction } from "@/lib/http/action";
import { deliverDueMail } from "@/lib/mail/outbox";

const retrySchema = z.object({ mailId: z.coerce.number().int().positive("Missing message") });

/** Makes an unsent message due again and tries to deliver it now. */
export async function retryMailAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    await requireUser("mail:read");
    const parsed = parseForm(retrySchema, form);
    if ("result" in parsed) return parsed.result;
    if (!(await retryMail({ mailId: parsed.data.mailId }))) throw new AppError("conflict", "This message has already been sent.");
    const { sent } = await deliverDueMail();
    revalidatePath("/admin/mail");
    return { ok: true, message: sent ? "Sent." : "Still not delivered; the error is shown in the list." };
  });
}
