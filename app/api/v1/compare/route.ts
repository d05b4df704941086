import { z } from "zod";
import { getRevisions } from "@/db/queries/profiles";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";
import { compareDocuments } from "@/lib/reviews/compare";
import type { ParamsVersion } from "@/lib/profiles/schemas";

const querySchema = z.object({
  from: z.coerce.number().int().positive("must be a revision id"),
  to: z.coerce.number().int().positive("must be a revision id"),
});

/** Compares two revisions of the same parameter-set version: parameter rows and a unified diff. */
export const GET = handle(async (request) => {
  await authorize(request.headers, "profiles:read");
  const { from, to } = parseWith(querySchema, Object.fromEntries(new URL(request.url).searchParams), "query");
  const found = await getRevisions({ revisionIds: [from, to] });
  const a = found.find((r) => r.id === from);
  const b = found.find((r) => r.id === to);
  if (!a || !b) throw new AppError("not_found", `No revision ${!a ? from : to}.`);
  if (a.schemaVersion !== b.schemaVersion) {
    throw new AppError("invalid_request", `Revision ${from} uses parameter set ${a.schemaVersion} and ${to} uses ${b.schemaVersion}; migrate one first.`, { issues: [{ path: "/to", message: "different parameter set" }] });
  }
  const comparison = compareDocuments(a.content, b.content, a.schemaVersion as ParamsVersion, { before: `revision ${a.number}`, after: `revision ${b.number}` });
  return Response.json({ from: { id: a.id, number: a.number, contentHash: a.contentHash }, to: { id: b.id, number: b.number, contentHash: b.contentHash }, ...comparison });
});
