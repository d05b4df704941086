// Releases and what each controller is served: the effective configuration of the newest live
// release that covers it and whose stage includes it, signed for the firmware to verify.
import type { KeyObject } from "node:crypto";
import { z } from "zod";
import { getDoorModelForSafety, getSiteForSafety } from "@/db/queries/profile-context";
import { getProfile, getRevisions } from "@/db/queries/profiles";
import { approvedOverlaysOf, insertRelease, listControllersOfModel, listLiveReleases, targetCovers, type ReleaseRow, type ReleaseTarget } from "@/db/queries/releases";
import type { SessionUser } from "@/lib/auth/guard";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/http/errors";
import { inStage } from "@/lib/fleet/stage";
import { privateKeyOf, signPayload } from "@/lib/fleet/signing";
import { BoundedMap, GenerationCache } from "./config-cache";
import { canonicalJson, contentHash } from "@/lib/profiles/canonical";
import { diffParams, type DiffRow } from "@/lib/profiles/diff";
import { mergeLayers, type LayerName } from "@/lib/profiles/merge";
import { checkSafety } from "@/lib/profiles/safety";
import { validateParams, type ParamsVersion } from "@/lib/profiles/schemas";

type ControllerRef = { id: number; serial: string; doorModelId: number; siteId: number; parameterSetVersion: number };

export type Effective = { values: Record<string, unknown>; provenance: Record<string, LayerName>; version: ParamsVersion; baseRevisionId: number; overlayRevisionId: number | null };

type RevisionContent = { id: number; content: Record<string, unknown>; schemaVersion: number };

// Revisions never change once written, so their content may be kept for as long as memory allows.
const revisionContents = new BoundedMap<number, RevisionContent>(2_000);

async function revisionsById(ids: number[]): Promise<Map<number, RevisionContent>> {
  const out = new Map<number, RevisionContent>();
  const missing = ids.filter((id) => {
    const hit = revisionContents.get(id);
    if (hit) out.set(id, hit);
    return !hit;
  });
  for (const r of await getRevisions({ revisionIds: missing })) {
    const kept = { id: r.id, content: r.content as Record<string, unknown>, schemaVersion: r.schemaVersion };
    revisionContents.set(r.id, kept);
    out.set(r.id, kept);
  }
  return out;
}

/** The configuration a release gives one controller: base ← its site's pinned overlay ← its own pinned overlay. */
export async function effectiveFor(release: ReleaseRow, controller: ControllerRef): Promise<Effective> {
  const overlayId = release.overlayRevisionIds[String(controller.siteId)] ?? null;
  const ownId = release.overlayRevisionIds[`serial:${controller.serial}`] ?? null;
  const revisions = await revisionsById([release.baseRevisionId, overlayId, ownId].filter((x): x is number => x !== null));
  const base = revisions.get(release.baseRevisionId);
  if (!base) throw new Error(`release ${release.id} names revision ${release.baseRevisionId}, which does not exist`);
  const overlay = overlayId ? revisions.get(overlayId) : undefined;
  const own = ownId ? revisions.get(ownId) : undefined;
  const layers = [
    { layer: "base" as const, values: base.content },
    ...(overlay ? [{ layer: "site" as const, values: overlay.content }] : []),
    ...(own ? [{ layer: "controller" as const, values: own.content }] : []),
  ];
  const merged = mergeLayers(layers);
  return { values: merged.values, provenance: merged.provenance, version: base.schemaVersion as ParamsVersion, baseRevisionId: base.id, overlayRevisionId: overlay?.id ?? null };
}

function pickAssignment(live: ReleaseRow[], controller: ControllerRef): ReleaseRow | null {
  return live.find((r) => targetCovers(r, controller) && inStage(controller.serial, r.percent)) ?? null;
}

/** The newest live release that covers the controller and whose stage includes it, or null. */
export async function assignmentFor(controller: ControllerRef): Promise<ReleaseRow | null> {
  return pickAssignment(await listLiveReleases({ doorModelId: controller.doorModelId }), controller);
}

export type DeviceConfig = { body: string; etag: string; contentHash: string };

let parsedKey: { text: string; key: KeyObject } | undefined;

function signingKey(): KeyObject {
  const text = getEnv().DEVICE_SIGNING_KEY;
  if (!text) throw new AppError("unavailable", "Configuration signing is not set up on this server.", { retryAfterSeconds: 300 });
  if (parsedKey?.text !== text) parsedKey = { text, key: privateKeyOf(text) };
  return parsedKey.key;
}

/** The signed configuration document a release gives a controller. */
async function buildDeviceConfig(release: ReleaseRow, controller: ControllerRef): Promise<DeviceConfig> {
  const eff = await effectiveFor(release, controller);
  const hash = contentHash(eff.values);
  const payload = {
    serial: controller.serial,
    parameterSetVersion: eff.version,
    parameters: eff.values,
    contentHash: hash,
    releaseId: release.id,
    baseRevisionId: eff.baseRevisionId,
    overlayRevisionId: eff.overlayRevisionId,
    // The release's own time, so the same assignment always gives the same bytes (and ETag).
    issuedAt: release.updatedAt.toISOString(),
  };
  const canonical = canonicalJson(payload);
  const signature = signPayload(canonical, signingKey());
  const body = JSON.stringify({ ...payload, signature: { algorithm: "Ed25519", value: signature, signed: "canonical JSON of this object without `signature`" } });
  return { body, etag: `"${contentHash({ canonical, signature }).slice(0, 40)}"`, contentHash: hash };
}

// Enough for a large fleet per instance (≈ 2 KB each); beyond it the oldest are recomputed.
const liveByModel = new GenerationCache<ReleaseRow[]>(1_000);
const configByController = new GenerationCache<DeviceConfig | null>(50_000);

/**
 * The signed configuration for a polling controller, or null when nothing is released to it. Kept per
 * process under the generation read with the token, so a steady-state poll makes no query of its own.
 */
export async function deviceConfigFor(controller: ControllerRef & { configGeneration: number }): Promise<DeviceConfig | null> {
  const gen = controller.configGeneration;
  const key = `${controller.id}:${controller.serial}:${controller.doorModelId}:${controller.siteId}:${controller.parameterSetVersion}`;
  return configByController.get(gen, key, async () => {
    const live = await liveByModel.get(gen, String(controller.doorModelId), () => listLiveReleases({ doorModelId: controller.doorModelId }));
    const release = pickAssignment(live, controller);
    return release ? buildDeviceConfig(release, controller) : null;
  });
}

export const releaseSchema = z.object({
  baseRevisionId: z.coerce.number().int().positive("must be an approved base revision"),
  target: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("door_model") }),
    z.object({ kind: z.literal("site"), siteId: z.coerce.number().int().positive("Choose a site") }),
    z.object({ kind: z.literal("controllers"), serials: z.array(z.string().min(1).max(32)).min(1, "List at least one serial").max(1000) }),
  ]),
  percent: z.coerce.number().int().min(1, "At least 1 %").max(100, "At most 100 %"),
  note: z.string().trim().max(500).optional(),
});

export type ReleaseProblem = { serial: string; reasons: string[] };
export type ReleasePreview = { affected: number; inFirstStage: number; problems: ReleaseProblem[]; safetyChanges: DiffRow[]; overlayRevisionIds: Record<string, number>; doorModelId: number };

/** Checks a release before it happens: every affected controller's effective configuration against the schema and the safety rules. */
export async function previewRelease(input: z.infer<typeof releaseSchema>): Promise<ReleasePreview> {
  const [revision] = await getRevisions({ revisionIds: [input.baseRevisionId] });
  if (!revision) throw new AppError("not_found", "No such revision.");
  if (revision.state !== "approved") throw new AppError("conflict", "Only approved revisions can be released.");
  const profile = await getProfile({ profileId: revision.profileId });
  if (!profile || profile.layer !== "base" || !profile.doorModelId) throw new AppError("invalid_request", "Release a base profile's revision; its approved site overlays come with it.", { issues: [{ path: "/baseRevisionId", message: "not a base profile revision" }] });
  const doorModelId = profile.doorModelId;
  const overlayRevisionIds = await approvedOverlaysOf({ doorModelId });
  const draft = { id: 0, baseRevisionId: revision.id, doorModelId, overlayRevisionIds, targetKind: input.target.kind, targetSiteId: input.target.kind === "site" ? input.target.siteId : null, targetSerials: input.target.kind === "controllers" ? input.target.serials : null, percent: input.percent, state: "active", note: null, createdBy: null, createdAt: new Date(), updatedAt: new Date() } as ReleaseRow;
  const all = await listControllersOfModel({ doorModelId });
  const affected = all.filter((c) => targetCovers(draft, c));
  if (input.target.kind === "controllers") {
    const unknown = input.target.serials.filter((s) => !affected.some((c) => c.serial === s));
    if (unknown.length) throw new AppError("invalid_request", `Not controllers of this door model: ${unknown.slice(0, 10).join(", ")}.`, { issues: [{ path: "/target/serials", message: "unknown serial" }] });
  }
  const doorModel = await getDoorModelForSafety({ doorModelId });
  const problems: ReleaseProblem[] = [];
  const siteCache = new Map<number, Awaited<ReturnType<typeof getSiteForSafety>>>();
  // Controllers at one site without an overlay of their own, on one parameter set, get the same
  // configuration: check it once for all of them.
  const reasonsByKey = new Map<string, string[]>();
  for (const c of affected) {
    const own = draft.overlayRevisionIds[`serial:${c.serial}`] ? c.serial : "";
    const key = `${c.siteId}:${own}:${c.parameterSetVersion}`;
    let reasons = reasonsByKey.get(key);
    if (!reasons) {
      reasons = [];
      const eff = await effectiveFor(draft, c);
      if (c.parameterSetVersion !== eff.version) reasons.push(`runs parameter set ${c.parameterSetVersion}, the release is set ${eff.version}`);
      const check = validateParams(eff.version, eff.values);
      for (const i of check.issues) reasons.push(`${i.path || "document"}: ${i.message}`);
      if (check.ok) {
        if (!siteCache.has(c.siteId)) siteCache.set(c.siteId, await getSiteForSafety({ siteId: c.siteId }));
        const site = siteCache.get(c.siteId);
        const findings = checkSafety(eff.version, eff.values, { now: new Date(), ...(doorModel ? { doorModel } : {}), ...(site ? { site: { latitude: site.latitude, longitude: site.longitude, timeZone: site.timeZone } } : {}) });
        for (const f of findings.filter((x) => x.severity === "error")) reasons.push(`${f.ruleId}: ${f.message}`);
      }
      reasonsByKey.set(key, reasons);
    }
    if (reasons.length) problems.push({ serial: c.serial, reasons });
  }
  const previous = (await listLiveReleases({ doorModelId }))[0];
  const before = previous ? (await getRevisions({ revisionIds: [previous.baseRevisionId] }))[0]?.content ?? {} : {};
  const safetyChanges = diffParams(before, revision.content, revision.schemaVersion as ParamsVersion).filter((r) => r.safety);
  return { affected: affected.length, inFirstStage: affected.filter((c) => inStage(c.serial, input.percent)).length, problems, safetyChanges, overlayRevisionIds, doorModelId };
}

/** Creates a release after checking it again; refused (400) with every controller that would get an invalid configuration. */
export async function createRelease({ actor, input }: { actor: SessionUser; input: z.infer<typeof releaseSchema> }) {
  const preview = await previewRelease(input);
  if (preview.problems.length) {
    throw new AppError("invalid_request", `Refused: ${preview.problems.length} controller${preview.problems.length > 1 ? "s" : ""} would get an invalid configuration.`, {
      issues: preview.problems.slice(0, 100).map((p) => ({ path: `/controllers/${p.serial}`, message: p.reasons.join("; ") })),
    });
  }
  const target: ReleaseTarget = input.target;
  const { releaseId } = await insertRelease({ actorId: actor.id, baseRevisionId: input.baseRevisionId, doorModelId: preview.doorModelId, overlayRevisionIds: preview.overlayRevisionIds, target, percent: input.percent, note: input.note });
  return { releaseId, affected: preview.affected, inFirstStage: preview.inFirstStage };
}
