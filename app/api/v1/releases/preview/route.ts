import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { previewRelease, releaseSchema } from "@/lib/releases/service";

/** What a release would do: affected controllers, the first stage, problems, safety-relevant changes. */
export const POST = handle(async (request) => {
  await authorize(request.headers, "releases:manage");
  const input = await readJson(request, releaseSchema);
  return Response.json(await previewRelease(input));
});
