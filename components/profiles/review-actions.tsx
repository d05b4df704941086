"use client";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Notice } from "@/components/ui/surface";
import { useToast } from "@/components/ui/toast";
import { apiJson } from "@/lib/http/client-fetch";

type PathOption = { path: string; label: string };

const APPROVE_CAUTION =
  "Stall detection is a second line of defence, not a guarantee: judge the travel, stall and timeout values as if it were not there. Once released, test the obstacle stop on site, and follow local codes and licensed practice for powered doors and animal-welfare rules.";

/** Approve / request changes (bound to the hash on screen) and comments anchored to a parameter. */
const FOCUS_KEY = "roostline-focus-after-refresh";

export function ReviewActions({ revisionId, contentHash, canDecide, canComment, paths, safetyRelevant }: { revisionId: number; contentHash: string; canDecide: boolean; canComment: boolean; paths: PathOption[]; safetyRelevant: boolean }) {
  const router = useRouter();
  // Focus to restore once a refresh has re-rendered the page (a disabled button would drop it).
  const [refreshing, startRefresh] = useTransition();
  const focusAfterRefresh = useRef<string | null>(null);
  // Kept in sessionStorage too, because the refreshed page may mount this form anew.
  useEffect(() => {
    if (refreshing) return;
    const id = focusAfterRefresh.current ?? sessionStorage.getItem(FOCUS_KEY);
    if (!id) return;
    document.getElementById(id)?.focus();
    focusAfterRefresh.current = null;
    sessionStorage.removeItem(FOCUS_KEY);
  }, [refreshing]);
  const [comment, setComment] = useState("");
  const [note, setNote] = useState("");
  const [path, setPath] = useState(paths[0]?.path ?? "");
  const [error, setError] = useState<string | null>(null);
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const { notify } = useToast();

  async function decide(decision: "approve" | "request_changes") {
    setError(null);
    setFieldError(undefined);
    if (decision === "request_changes" && !comment.trim()) {
      setFieldError("Say what should change.");
      document.getElementById("decision-comment")?.focus();
      return;
    }
    setBusy(true);
    const r = await apiJson<{ state: string; approvals: number; required: number }>(`/api/v1/revisions/${revisionId}/decision`, { body: { decision, contentHash, comment: comment.trim() || undefined } });
    setBusy(false);
    if (!r.ok) {
      setError(r.error.message);
      return;
    }
    const outcome = r.data.state === "approved" ? "Approved." : r.data.state === "changes_requested" ? "Sent back to the author." : `Your approval is recorded (${r.data.approvals} of ${r.data.required}).`;
    setDone(outcome);
    notify({ tone: "success", title: r.data.state === "approved" ? "Revision approved" : r.data.state === "changes_requested" ? "Revision sent back" : "Approval recorded", description: outcome });
    router.refresh();
  }

  async function addComment() {
    setError(null);
    if (!note.trim()) return;
    setBusy(true);
    const r = await apiJson(`/api/v1/revisions/${revisionId}/comments`, { body: { path, body: note } });
    setBusy(false);
    if (!r.ok) {
      setError(r.error.message);
      return;
    }
    setNote("");
    // The button disables itself once the note is cleared; keep the keyboard where the next comment goes.
    document.getElementById("comment-body")?.focus();
    focusAfterRefresh.current = "comment-body";
    sessionStorage.setItem(FOCUS_KEY, "comment-body");
    startRefresh(() => router.refresh());
  }

  return (
    <div className="space-y-4">
      {error && <Notice tone="bad">{error}</Notice>}
      {done && <Notice tone="good">{done}</Notice>}
      {canComment && (
        <div className="space-y-2">
          <h3 className="font-semibold">Comment on a parameter</h3>
          <label htmlFor="comment-path" className="block text-sm font-medium">
            Parameter
          </label>
          <select id="comment-path" value={path} onChange={(e) => setPath(e.target.value)} className="block w-full rounded-md border border-loam-200 bg-white px-2 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900">
            {paths.map((p) => (
              <option key={p.path} value={p.path}>
                {p.label}
              </option>
            ))}
          </select>
          <label htmlFor="comment-body" className="block text-sm font-medium">
            Comment
          </label>
          <textarea id="comment-body" rows={2} value={note} onChange={(e) => setNote(e.target.value)} maxLength={2000} className="block w-full rounded-md border border-loam-200 bg-white px-3 py-2 text-sm dark:border-loam-800 dark:bg-loam-900" />
          <Button variant="secondary" size="sm" onClick={addComment} disabled={busy || !note.trim()}>
            Add comment
          </Button>
        </div>
      )}
      {canDecide && (
        <div className="space-y-2 border-t border-loam-200 pt-4 dark:border-loam-800">
          <h3 className="font-semibold">Your decision</h3>
          <label htmlFor="decision-comment" className="block text-sm font-medium">
            Note to the author (needed when sending back)
          </label>
          <textarea
            id="decision-comment"
            rows={3}
            value={comment}
            onChange={(e) => setComment(e.target.value)}
            maxLength={2000}
            aria-invalid={fieldError ? true : undefined}
            aria-describedby={fieldError ? "decision-comment-error" : undefined}
            className="block w-full rounded-md border border-loam-200 bg-white px-3 py-2 text-sm dark:border-loam-800 dark:bg-loam-900"
          />
          {fieldError && (
            <p id="decision-comment-error" role="alert" className="text-sm text-ember-700 dark:text-ember-100">
              {fieldError}
            </p>
          )}
          <p className="text-xs text-loam-600 dark:text-loam-400">
            Your decision applies to content <code className="font-mono">{contentHash.slice(0, 12)}…</code>; any later revision needs a fresh review.
          </p>
          <div className="flex gap-2">
            <ConfirmDialog
              trigger={<Button disabled={busy}>Approve</Button>}
              title="Approve this revision?"
              description={
                safetyRelevant ? (
                  <p>
                    This change touches safety-relevant parameters. Controllers will move doors with animals nearby on what you approve, once an admin releases it. Your approval
                    applies to content <code className="font-mono">{contentHash.slice(0, 12)}…</code> only.
                  </p>
                ) : (
                  <p>
                    Your approval applies to content <code className="font-mono">{contentHash.slice(0, 12)}…</code> only; it reaches doors once an admin releases it.
                  </p>
                )
              }
              caution={safetyRelevant ? APPROVE_CAUTION : undefined}
              confirmLabel="Yes, approve"
              onConfirm={() => decide("approve")}
            />
            <Button variant="secondary" onClick={() => decide("request_changes")} disabled={busy}>
              Send back
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}
