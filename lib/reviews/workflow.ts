// Saving, submitting and deciding on profile revisions: validation and safety checks run here on
// the server for every save and submit, with the same functions the editor runs live.
import { z } from "zod";
import { enqueueMail } from "@/db/queries/mail";
import { getBaseContent, getDoorModelForSafety, getSiteForSafety } from "@/db/queries/profile-context";
import { getControllerBySerial } from "@/db/queries/controllers";
import { getProfile, getRevision, getRevisions, latestApprovedRevision, saveRevision, type ProfileSummary } from "@/db/queries/profiles";
import { approvedOverlaysOf } from "@/db/queries/releases";
import { decideRevision, submitRevision, reviewerAddresses } from "@/db/queries/reviews";
import { findUserById } from "@/db/queries/users";
import type { SessionUser } from "@/lib/auth/guard";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/http/errors";
import { deliverDueMail } from "@/lib/mail/outbox";
import { diffParams, touchesSafety } from "@/lib/profiles/diff";
import { isPlainObject } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";
import { checkSafety, type SafetyContext, type SafetyFinding } from "@/lib/profiles/safety";
import { validateParams, type ParamsVersion, type ValidationIssue } from "@/lib/profiles/schemas";
import { withinJsonDepth } from "@/lib/http/validation";

export type Evaluation = {
  schemaIssues: ValidationIssue[];
  findings: SafetyFinding[];
  /** The effective document the checks ran on (base ← overlay for overlays), or null when it could not be built. */
  effective: Record<string, unknown> | null;
  /** For overlays: which base revision the check used, and whether it is approved. */
  base: { revisionId: number; approved: boolean } | null;
};

/** What the editor needs besides the content: the values beneath an overlay and the safety context. */
export async function loadEditingContext(profile: ProfileSummary) {
  const doorModel = profile.doorModelId ? await getDoorModelForSafety({ doorModelId: profile.doorModelId }) : null;
  // A controller overlay sits at its controller's site, on top of that site's approved overlay.
  const controller = profile.layer === "controller" && profile.controllerSerial ? await getControllerBySerial({ serial: profile.controllerSerial }) : null;
  const siteId = profile.siteId ?? controller?.siteId ?? null;
  const site = siteId ? await getSiteForSafety({ siteId }) : null;
  let base = profile.layer !== "base" && profile.doorModelId ? await getBaseContent({ doorModelId: profile.doorModelId }) : null;
  if (base && controller && profile.doorModelId) {
    const siteOverlayId = (await approvedOverlaysOf({ doorModelId: profile.doorModelId }))[String(controller.siteId)];
    const [siteOverlay] = siteOverlayId ? await getRevisions({ revisionIds: [siteOverlayId] }) : [];
    if (siteOverlay) base = { ...base, content: mergeLayers([{ layer: "base", values: base.content }, { layer: "site", values: siteOverlay.content }]).values };
  }
  return { doorModel, site, base };
}

/** Runs the schema and the safety rules on a profile layer's content, as a save or submit would. */
export async function evaluateProfileContent({ profile, version, content, now = new Date() }: { profile: ProfileSummary; version: ParamsVersion; content: Record<string, unknown>; now?: Date }): Promise<Evaluation> {
  const { doorModel, site, base } = await loadEditingContext(profile);
  const ctx: SafetyContext = { now, ...(doorModel ? { doorModel } : {}), ...(site ? { site: { latitude: site.latitude, longitude: site.longitude, timeZone: site.timeZone } } : {}) };
  let effective: Record<string, unknown> = content;
  if (profile.layer !== "base") {
    if (!base) {
      return { schemaIssues: [{ path: "", keyword: "base", message: "This door model has no base profile yet: create that first." }], findings: [], effective: null, base: null };
    }
    if (base.schemaVersion !== version) {
      return { schemaIssues: [{ path: "/parameterSetVersion", keyword: "base", message: `The base profile uses parameter set ${base.schemaVersion}; an overlay must use the same.` }], findings: [], effective: null, base: { revisionId: base.revisionId, approved: base.approved } };
    }
    effective = mergeLayers([{ layer: "base", values: base.content }, { layer: profile.layer, values: content }]).values;
  }
  const result = validateParams(version, effective);
  const findings = result.ok ? checkSafety(version, effective, ctx) : [];
  return { schemaIssues: result.issues, findings, effective, base: base ? { revisionId: base.revisionId, approved: base.approved } : null };
}

export const saveSchema = z.object({
  parentRevisionId: z.coerce.number().int().positive("must be the revision you edited"),
  message: z.string().trim().min(3, "Say in a few words what changed").max(500, "Keep the message under 500 characters"),
  content: z.record(z.string(), z.unknown(), { error: "must be a JSON object" }).refine((v) => withinJsonDepth(v, 30), "must nest at most 30 levels deep"),
});

/** Validates and saves a new revision; refuses (400 invalid_profile) content that fails its schema. */
export async function saveProfileRevision({ actor, profileId, input }: { actor: SessionUser; profileId: number; input: z.infer<typeof saveSchema> }) {
  const profile = await getProfile({ profileId });
  if (!profile) throw new AppError("not_found", "No such profile.");
  const version = profile.schemaVersion;
  if (isPlainObject(input.content) && input.content.parameterSetVersion !== undefined && input.content.parameterSetVersion !== version) {
    throw new AppError("invalid_request", `This profile is pinned to parameter set ${version}; the document says ${String(input.content.parameterSetVersion)}. Migrate it first.`, {
      issues: [{ path: "/parameterSetVersion", message: `must be ${version}` }],
    });
  }
  const evaluation = await evaluateProfileContent({ profile, version, content: input.content });
  if (evaluation.schemaIssues.length) throw invalidProfile(evaluation.schemaIssues);
  const { revisionId } = await saveRevision({ actorId: actor.id, profileId, parentRevisionId: input.parentRevisionId, content: input.content, message: input.message });
  return { revisionId, findings: evaluation.findings };
}

function invalidProfile(issues: ValidationIssue[]) {
  return new AppError("invalid_profile", `The profile does not match its schema (${issues[0]?.path || "document"}: ${issues[0]?.message}).`, {
    issues: issues.map((i) => ({ path: i.property ? `${i.path}/${i.property}` : i.path, message: i.message })),
  });
}

export const submitSchema = z.object({
  acknowledgements: z
    .array(z.object({ ruleId: z.string().min(1).max(64), reason: z.string().trim().min(10, "Give a reason of at least 10 characters").max(1000) }))
    .max(50)
    .default([]),
});

/**
 * Submits a revision for review after checking it again: schema issues and safety errors block,
 * and each safety warning needs an acknowledgement with a reason.
 */
export async function submitForReview({ actor, revisionId, input }: { actor: SessionUser; revisionId: number; input: z.infer<typeof submitSchema> }) {
  const revision = await getRevision({ revisionId });
  if (!revision) throw new AppError("not_found", "No such revision.");
  const profile = await getProfile({ profileId: revision.profileId });
  if (!profile) throw new AppError("not_found", "No such profile.");
  const version = revision.schemaVersion as ParamsVersion;
  const evaluation = await evaluateProfileContent({ profile, version, content: revision.content });
  if (evaluation.schemaIssues.length) throw invalidProfile(evaluation.schemaIssues);
  const errors = evaluation.findings.filter((f) => f.severity === "error");
  if (errors.length) {
    throw new AppError("invalid_request", `Fix the safety errors first: ${errors.map((e) => e.title).join("; ")}.`, {
      issues: errors.map((e) => ({ path: e.paths[0] ?? "", message: `${e.ruleId}: ${e.message}` })),
    });
  }
  const acked = new Map(input.acknowledgements.map((a) => [a.ruleId, a.reason]));
  const missing = [...new Set(evaluation.findings.filter((f) => f.severity === "warning" && !acked.has(f.ruleId)).map((f) => f.ruleId))];
  if (missing.length) {
    throw new AppError("invalid_request", `Acknowledge each safety warning with a reason: ${missing.join(", ")}.`, {
      issues: missing.map((ruleId) => ({ path: `/acknowledgements/${ruleId}`, message: "needs a reason" })),
    });
  }
  const approved = await latestApprovedRevision({ profileId: profile.id });
  const safetyRelevant = touchesSafety(diffParams(approved?.content ?? {}, revision.content, version));
  const acknowledgements = evaluation.findings
    .filter((f) => f.severity === "warning")
    .map((f) => ({ ruleId: f.ruleId, reason: acked.get(f.ruleId)! }))
    .filter((a, i, all) => all.findIndex((b) => b.ruleId === a.ruleId) === i);
  const result = await submitRevision({ actorId: actor.id, revisionId, safetyRelevant, acknowledgements });
  const link = new URL(`/reviews/${revisionId}`, getEnv().APP_URL).toString();
  for (const r of await reviewerAddresses({ exceptUserId: actor.id })) {
    await enqueueMail({
      kind: "notice",
      toAddress: r.email,
      subject: `Review wanted: ${profile.name} revision ${revision.number}`,
      textBody: `Hello ${r.name},\n\n${actor.name} submitted revision ${revision.number} of "${profile.name}" for review: ${revision.message}\n${safetyRelevant ? `It changes safety-relevant parameters and needs ${result.requiredApprovals} approvals.\n` : ""}\n${link}\n`,
    });
  }
  void deliverDueMail();
  return { requiredApprovals: result.requiredApprovals, safetyRelevant };
}

export const decisionSchema = z.object({
  decision: z.enum(["approve", "request_changes"], { error: "must be approve or request_changes" }),
  contentHash: z.string().regex(/^[0-9a-f]{64}$/, "must be the 64-character content hash you reviewed"),
  comment: z.string().trim().max(2000, "Keep the comment under 2000 characters").optional(),
});

/** A reviewer approves or sends back a revision; the author hears by mail. */
export async function decideOnRevision({ actor, revisionId, input }: { actor: SessionUser; revisionId: number; input: z.infer<typeof decisionSchema> }) {
  if (input.decision === "request_changes" && !input.comment) {
    throw new AppError("invalid_request", "Say what should change.", { issues: [{ path: "/comment", message: "A comment is needed when sending a revision back" }] });
  }
  const outcome = await decideRevision({ reviewerId: actor.id, revisionId, decision: input.decision, contentHash: input.contentHash, comment: input.comment ?? null });
  const author = outcome.authorId ? await findUserById({ userId: outcome.authorId }) : null;
  const revision = await getRevision({ revisionId });
  if (author && revision) {
    const verdict = outcome.state === "approved" ? "is approved" : outcome.state === "changes_requested" ? "needs changes" : `has ${outcome.approvals} of ${outcome.required} approvals`;
    await enqueueMail({
      kind: "notice",
      toAddress: author.email,
      subject: `Revision ${revision.number} ${verdict}`,
      textBody: `Hello ${author.name},\n\n${actor.name} ${input.decision === "approve" ? "approved" : "asked for changes to"} revision ${revision.number}: ${revision.message}\n${input.comment ? `\n"${input.comment}"\n` : ""}\nIt now ${verdict}.\n\n${new URL(`/profiles/${outcome.profileId}`, getEnv().APP_URL).toString()}\n`,
    });
    void deliverDueMail();
  }
  return outcome;
}
