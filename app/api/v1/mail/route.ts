import { z } from "zod";
import { listCapturedMails } from "@/db/queries/mail";
import { authorize } from "@/lib/auth/guard";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

const querySchema = z.object({
  to: z.email("must be an e-mail address").optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

/** Messages captured by the local SMTP stand-in, newest first (admins). */
export const GET = handle(async (request) => {
  await authorize(request.headers, "mail:read");
  const query = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  const mails = await listCapturedMails(query);
  return Response.json({ mails }, { headers: { "cache-control": "no-store" } });
});
