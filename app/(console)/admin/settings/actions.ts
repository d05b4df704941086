"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { setSafetyApprovals } from "@/db/queries/reviews";
import { requireUser } from "@/lib/auth/guard";
import { type ActionResult, parseForm, runAction } from "@/lib/http/action";

const approvalsSchema = z.object({
  approvals: z.coerce.number({ error: "Enter a number" }).int("Enter a whole number").min(1, "At least 1").max(5, "At most 5"),
});

/** Sets how many approvals from different reviewers a safety-relevant change needs. */
export async function setApprovalsAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await requireUser("settings:manage");
    const parsed = parseForm(approvalsSchema, form);
    if ("result" in parsed) return parsed.result;
    await setSafetyApprovals({ actorId: actor.id, value: parsed.data.approvals });
    revalidatePath("/admin/settings");
    return { ok: true, message: `Safety-relevant changes now need ${parsed.data.approvals} approval${parsed.data.approvals > 1 ? "s" : ""}. Revisions already in review keep the number they were submitted with.` };
  });
}
