import { getCapturedMail } from "@/db/queries/mail";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle } from "@/lib/http/route";
import { extractLinks } from "@/lib/mail/templates";

type Ctx = { params: Promise<{ mailId: string }> };

/** One captured message with its text and the links in it (admins). */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "mail:read");
  const id = Number((await ctx.params).mailId);
  if (!Number.isSafeInteger(id) || id <= 0) throw new AppError("invalid_request", "The message id must be a positive whole number.");
  const mail = await getCapturedMail({ mailId: id });
  if (!mail) throw new AppError("not_found", "No such message.");
  return Response.json({ mail: { ...mail, links: extractLinks(mail.textBody) } }, { headers: { "cache-control": "no-store" } });
});
