import { getProfile, getRevision } from "@/db/queries/profiles";
import { listAcknowledgements, listComments, listDecisions } from "@/db/queries/reviews";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { idParam } from "@/lib/http/params";
import { handle } from "@/lib/http/route";
import { evaluateProfileContent } from "@/lib/reviews/workflow";
import type { ParamsVersion } from "@/lib/profiles/schemas";

type Ctx = { params: Promise<{ revisionId: string }> };

/** A revision with its checks, decisions and comments; `?download=1` returns the content as a JSON file. */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "profiles:read");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  const revision = await getRevision({ revisionId });
  if (!revision) throw new AppError("not_found", "No such revision.");
  if (new URL(request.url).searchParams.get("download")) {
    return new Response(JSON.stringify(revision.content, null, 2) + "\n", {
      headers: {
        "content-type": "application/json; charset=utf-8",
        "content-disposition": `attachment; filename="profile-${revision.profileId}-r${revision.number}.json"`,
        etag: `"${revision.contentHash}"`,
      },
    });
  }
  const profile = (await getProfile({ profileId: revision.profileId }))!;
  const [checks, decisions, comments, acknowledgements] = await Promise.all([
    evaluateProfileContent({ profile, version: revision.schemaVersion as ParamsVersion, content: revision.content }),
    listDecisions({ revisionId }),
    listComments({ revisionId }),
    listAcknowledgements({ revisionId }),
  ]);
  return Response.json(
    { revision, profile, checks: { schemaIssues: checks.schemaIssues, findings: checks.findings }, decisions, comments, acknowledgements },
    { headers: { "cache-control": "no-store" } },
  );
});
