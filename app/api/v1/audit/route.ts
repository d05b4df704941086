import { z } from "zod";
import { listAuditEvents } from "@/db/queries/audit";
import { toCsv } from "@/lib/audit/csv";
import { authorize } from "@/lib/auth/guard";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";

const querySchema = z.object({
  action: z.string().max(64).regex(/^[a-z_.]*$/, "must be an action name such as revision.approved").optional(),
  actor: z.email("must be an e-mail address").optional(),
  subjectType: z.string().max(32).optional(),
  beforeId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(5000).default(200),
  format: z.enum(["json", "csv"]).default("json"),
});

/** The audit log, newest first, filtered; `format=csv` downloads it. */
export const GET = handle(async (request) => {
  await authorize(request.headers, "audit:read");
  const q = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  const events = await listAuditEvents({ action: q.action, actorEmail: q.actor, subjectType: q.subjectType, beforeId: q.beforeId, limit: q.limit });
  if (q.format === "csv") {
    const csv = toCsv(
      ["id", "time", "actor", "actor_email", "action", "subject_type", "subject_id", "detail"],
      events.map((e) => [e.id, e.createdAt, e.actorName, e.actorEmail, e.action, e.subjectType, e.subjectId, e.detail]),
    );
    return new Response(csv, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": 'attachment; filename="roostline-audit.csv"', "cache-control": "no-store" } });
  }
  return Response.json({ events }, { headers: { "cache-control": "no-store" } });
});
