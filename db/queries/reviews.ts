import { and, asc, desc, eq, inArray, ne, notExists, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { appSettings, profileRevisions, profiles, reviewComments, reviewDecisions, safetyAcknowledgements, users } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { recordAudit } from "./audit";

const SAFETY_APPROVALS_KEY = "review.safetyApprovals";
export const DEFAULT_SAFETY_APPROVALS = 2;

/** How many approvals from different reviewers a safety-relevant change needs (admins set it). */
export async function getSafetyApprovals(): Promise<number> {
  const [row] = await db.select({ value: appSettings.value }).from(appSettings).where(eq(appSettings.key, SAFETY_APPROVALS_KEY));
  const n = Number(row?.value);
  return Number.isInteger(n) && n >= 1 ? n : DEFAULT_SAFETY_APPROVALS;
}

/** Sets the approvals a safety-relevant change needs (1–5). */
export async function setSafetyApprovals({ actorId, value }: { actorId: string; value: number }) {
  if (!Number.isInteger(value) || value < 1 || value > 5) {
    throw new AppError("invalid_request", "Choose between 1 and 5 approvals.", { issues: [{ path: "/value", message: "must be a whole number from 1 to 5" }] });
  }
  await db.insert(appSettings).values({ key: SAFETY_APPROVALS_KEY, value }).onDuplicateKeyUpdate({ set: { value } });
  await recordAudit({ actorId, action: "settings.safety_approvals", subjectType: "setting", subjectId: SAFETY_APPROVALS_KEY, detail: { value } });
}

export type Acknowledgement = { ruleId: string; reason: string };

/**
 * Puts the head revision up for review. `safetyRelevant` and the acknowledged warnings come from
 * the caller's validation of exactly this content; the content hash binds them.
 */
export async function submitRevision(input: { actorId: string; revisionId: number; safetyRelevant: boolean; acknowledgements: Acknowledgement[] }) {
  const required = input.safetyRelevant ? await getSafetyApprovals() : 1;
  return db.transaction(async (tx) => {
    const [rev] = await tx.select().from(profileRevisions).where(eq(profileRevisions.id, input.revisionId)).for("update");
    if (!rev) throw new AppError("not_found", "No such revision.");
    const [p] = await tx.select({ head: profiles.headRevisionId }).from(profiles).where(eq(profiles.id, rev.profileId));
    if (p?.head !== rev.id) throw new AppError("conflict", "Only the newest revision of a profile can be submitted.");
    if (rev.state !== "draft" && rev.state !== "changes_requested") {
      throw new AppError("conflict", `This revision is ${rev.state.replace("_", " ")}; only drafts can be submitted.`);
    }
    // A fresh review: decisions from an earlier round (changes asked for) no longer count.
    await tx.delete(reviewDecisions).where(eq(reviewDecisions.revisionId, rev.id));
    for (const ack of input.acknowledgements) {
      await tx.insert(safetyAcknowledgements).values({ revisionId: rev.id, ruleId: ack.ruleId, reason: ack.reason, authorId: input.actorId }).onDuplicateKeyUpdate({ set: { reason: ack.reason, authorId: input.actorId } });
    }
    await tx
      .update(profileRevisions)
      .set({ state: "in_review", submittedAt: new Date(), safetyRelevant: input.safetyRelevant ? 1 : 0, requiredApprovals: required })
      .where(eq(profileRevisions.id, rev.id));
    await recordAudit({ actorId: input.actorId, action: "revision.submitted", subjectType: "revision", subjectId: String(rev.id), detail: { hash: rev.contentHash, requiredApprovals: required } }, tx);
    return { profileId: rev.profileId, requiredApprovals: required, authorId: rev.authorId };
  });
}

export type DecisionOutcome = { state: "in_review" | "approved" | "changes_requested"; approvals: number; required: number; authorId: string | null; profileId: number };

/**
 * Records one reviewer's decision. The revision row is locked, so two reviewers acting at once
 * are serialised; the decision is bound to the hash the reviewer saw.
 */
export async function decideRevision(input: { reviewerId: string; revisionId: number; decision: "approve" | "request_changes"; contentHash: string; comment?: string | null }): Promise<DecisionOutcome> {
  return db.transaction(async (tx) => {
    const [rev] = await tx.select().from(profileRevisions).where(eq(profileRevisions.id, input.revisionId)).for("update");
    if (!rev) throw new AppError("not_found", "No such revision.");
    if (rev.state !== "in_review") throw new AppError("conflict", `This revision is ${rev.state.replace("_", " ")}, not waiting for review.`);
    if (rev.authorId === input.reviewerId) throw new AppError("forbidden", "You wrote this revision; another reviewer has to decide on it.");
    if (rev.contentHash !== input.contentHash) {
      throw new AppError("conflict", "The content changed since you opened it; review the current content again.");
    }
    const [already] = await tx.select({ id: reviewDecisions.id }).from(reviewDecisions).where(and(eq(reviewDecisions.revisionId, rev.id), eq(reviewDecisions.reviewerId, input.reviewerId)));
    if (already) throw new AppError("conflict", "You have already decided on this revision.");
    await tx.insert(reviewDecisions).values({ revisionId: rev.id, reviewerId: input.reviewerId, decision: input.decision, contentHash: rev.contentHash, comment: input.comment ?? null });
    const [{ n } = { n: 0 }] = await tx
      .select({ n: sql<number>`COUNT(*)` })
      .from(reviewDecisions)
      .where(and(eq(reviewDecisions.revisionId, rev.id), eq(reviewDecisions.decision, "approve"), eq(reviewDecisions.contentHash, rev.contentHash)));
    const approvals = Number(n);
    let state: DecisionOutcome["state"] = "in_review";
    if (input.decision === "request_changes") state = "changes_requested";
    else if (approvals >= rev.requiredApprovals) state = "approved";
    if (state !== "in_review") await tx.update(profileRevisions).set({ state, decidedAt: new Date() }).where(eq(profileRevisions.id, rev.id));
    await recordAudit(
      { actorId: input.reviewerId, action: input.decision === "approve" ? "revision.approved" : "revision.changes_requested", subjectType: "revision", subjectId: String(rev.id), detail: { hash: rev.contentHash, approvals, required: rev.requiredApprovals, state } },
      tx,
    );
    return { state, approvals, required: rev.requiredApprovals, authorId: rev.authorId, profileId: rev.profileId };
  });
}

/** The author takes a revision back out of review; it becomes a draft again. */
export async function withdrawRevision({ actorId, revisionId }: { actorId: string; revisionId: number }) {
  await db.transaction(async (tx) => {
    const [rev] = await tx.select().from(profileRevisions).where(eq(profileRevisions.id, revisionId)).for("update");
    if (!rev) throw new AppError("not_found", "No such revision.");
    if (rev.authorId !== actorId) throw new AppError("forbidden", "Only the author can withdraw a revision from review.");
    if (rev.state !== "in_review") throw new AppError("conflict", "Only a revision in review can be withdrawn.");
    await tx.delete(reviewDecisions).where(eq(reviewDecisions.revisionId, rev.id));
    await tx.update(profileRevisions).set({ state: "draft", submittedAt: null }).where(eq(profileRevisions.id, rev.id));
    await recordAudit({ actorId, action: "revision.withdrawn", subjectType: "revision", subjectId: String(rev.id), detail: { hash: rev.contentHash } }, tx);
  });
}

/** Adds a reviewer's comment anchored to a parameter path. */
export async function addComment({ authorId, revisionId, path, body }: { authorId: string; revisionId: number; path: string; body: string }) {
  const [rev] = await db.select({ id: profileRevisions.id }).from(profileRevisions).where(eq(profileRevisions.id, revisionId));
  if (!rev) throw new AppError("not_found", "No such revision.");
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(reviewComments).values({ authorId, revisionId, path, body }).$returningId();
    await recordAudit({ actorId: authorId, action: "revision.commented", subjectType: "revision", subjectId: String(revisionId), detail: { path } }, tx);
    return { commentId: row!.id };
  });
}

/** Comments on a revision, oldest first, with author names. */
export async function listComments({ revisionId }: { revisionId: number }) {
  return db
    .select({ id: reviewComments.id, path: reviewComments.path, body: reviewComments.body, createdAt: reviewComments.createdAt, authorName: users.name })
    .from(reviewComments)
    .leftJoin(users, eq(users.id, reviewComments.authorId))
    .where(eq(reviewComments.revisionId, revisionId))
    .orderBy(asc(reviewComments.id));
}

/** Decisions on a revision, with reviewer names. */
export async function listDecisions({ revisionId }: { revisionId: number }) {
  return db
    .select({ id: reviewDecisions.id, decision: reviewDecisions.decision, comment: reviewDecisions.comment, contentHash: reviewDecisions.contentHash, createdAt: reviewDecisions.createdAt, reviewerName: users.name, reviewerId: reviewDecisions.reviewerId })
    .from(reviewDecisions)
    .leftJoin(users, eq(users.id, reviewDecisions.reviewerId))
    .where(eq(reviewDecisions.revisionId, revisionId))
    .orderBy(asc(reviewDecisions.id));
}

/** Acknowledged safety warnings of a revision. */
export async function listAcknowledgements({ revisionId }: { revisionId: number }) {
  return db.select({ ruleId: safetyAcknowledgements.ruleId, reason: safetyAcknowledgements.reason }).from(safetyAcknowledgements).where(eq(safetyAcknowledgements.revisionId, revisionId));
}

/** Revisions waiting for this reviewer: in review, not theirs, not yet decided by them. */
export async function listReviewQueue({ reviewerId }: { reviewerId: string }) {
  return db
    .select({
      revisionId: profileRevisions.id,
      number: profileRevisions.number,
      message: profileRevisions.message,
      submittedAt: profileRevisions.submittedAt,
      safetyRelevant: profileRevisions.safetyRelevant,
      requiredApprovals: profileRevisions.requiredApprovals,
      profileId: profiles.id,
      profileName: profiles.name,
      layer: profiles.layer,
      authorName: users.name,
    })
    .from(profileRevisions)
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .leftJoin(users, eq(users.id, profileRevisions.authorId))
    .where(
      and(
        eq(profileRevisions.state, "in_review"),
        ne(profileRevisions.authorId, reviewerId),
        notExists(db.select({ one: sql`1` }).from(reviewDecisions).where(and(eq(reviewDecisions.revisionId, profileRevisions.id), eq(reviewDecisions.reviewerId, reviewerId)))),
      ),
    )
    .orderBy(asc(profileRevisions.submittedAt));
}

/** An author's revisions that are drafts or were sent back. */
export async function listMyOpenRevisions({ authorId }: { authorId: string }) {
  return db
    .select({ revisionId: profileRevisions.id, number: profileRevisions.number, state: profileRevisions.state, message: profileRevisions.message, profileId: profiles.id, profileName: profiles.name })
    .from(profileRevisions)
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .where(and(eq(profileRevisions.authorId, authorId), inArray(profileRevisions.state, ["draft", "changes_requested", "in_review"])))
    .orderBy(desc(profileRevisions.id))
    .limit(50);
}

/** E-mail addresses of active reviewers other than `exceptUserId`. */
export async function reviewerAddresses({ exceptUserId }: { exceptUserId: string | null }) {
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(and(eq(users.role, "reviewer"), sql`(${users.banned} IS NULL OR ${users.banned} = 0)`));
  return rows.filter((r) => r.id !== exceptUserId);
}
