// Fleet test data: an approved base revision for a fresh door model, controllers with tokens, releases.
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { POST as createProfileRoute } from "@/app/api/v1/profiles/route";
import { POST as controllersRoute } from "@/app/api/v1/controllers/route";
import { POST as releasesRoute } from "@/app/api/v1/releases/route";
import { db } from "@/db/client";
import { profileRevisions, sites } from "@/db/schema";
import { decideRevision, submitRevision } from "@/db/queries/reviews";
import { signedInUser } from "./auth";
import { baseDocument, createDoorModel, jsonRequest } from "./profiles";

type Person = Awaited<ReturnType<typeof signedInUser>>;

/** A fresh door model whose base profile has an approved revision (approved directly through the queries). */
export async function approvedBase(content = baseDocument()) {
  const engineer = await signedInUser("engineer");
  const model = await createDoorModel();
  const res = await createProfileRoute(jsonRequest("/api/v1/profiles", engineer.cookie, "POST", { layer: "base", name: `Fleet ${model.code}`, doorModelId: model.id, schemaVersion: 2, content }), {});
  const { revisionId } = (await res.json()) as { revisionId: number };
  await submitRevision({ actorId: engineer.id, revisionId, safetyRelevant: false, acknowledgements: [] });
  const [rev] = await db.select({ h: profileRevisions.contentHash }).from(profileRevisions).where(eq(profileRevisions.id, revisionId));
  const reviewer = await signedInUser("reviewer");
  await decideRevision({ reviewerId: reviewer.id, revisionId, decision: "approve", contentHash: rev!.h });
  return { doorModelId: model.id, revisionId, engineer };
}

export async function siteId(slug = "lindenhof"): Promise<number> {
  const [s] = await db.select({ id: sites.id }).from(sites).where(eq(sites.slug, slug));
  return s!.id;
}

export const serialFor = (tag: string) => `T${tag}-${randomBytes(4).toString("hex").toUpperCase()}`;

/** Registers a controller as a technician and returns its serial and token. */
export async function registerController(doorModelId: number, opts: { siteId?: number; parameterSetVersion?: 1 | 2; serial?: string } = {}) {
  const technician = await signedInUser("technician");
  const serial = opts.serial ?? serialFor("C");
  const res = await controllersRoute(
    jsonRequest("/api/v1/controllers", technician.cookie, "POST", { serial, doorModelId, siteId: opts.siteId ?? (await siteId()), firmwareVersion: "1.4.2", parameterSetVersion: opts.parameterSetVersion ?? 2 }),
    {},
  );
  if (res.status !== 201) throw new Error(`register failed ${res.status}: ${await res.text()}`);
  const body = (await res.json()) as { controllerId: number; token: string };
  return { serial, token: body.token, controllerId: body.controllerId };
}

/** Releases as an admin; returns the response. */
export async function release(admin: Person, body: unknown) {
  return releasesRoute(jsonRequest("/api/v1/releases", admin.cookie, "POST", body), {});
}

/** A device request with a bearer token. */
export function deviceRequest(path: string, token: string | null, init: { method?: string; body?: unknown; headers?: Record<string, string> } = {}) {
  const headers: Record<string, string> = { ...(init.headers ?? {}) };
  if (token) headers.authorization = `Bearer ${token}`;
  if (init.body !== undefined) headers["content-type"] = "application/json";
  return new Request(`http://127.0.0.1:3100${path}`, { method: init.method ?? "GET", headers, body: init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body) });
}
