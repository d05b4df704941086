"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { ProfileWorkbench, type WorkbenchState } from "@/components/profiles/editor/profile-workbench";
import type { EditorSafetyContext } from "@/components/profiles/editor/check-document";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/surface";
import { apiJson, type ApiError } from "@/lib/http/client-fetch";

type Props = {
  profileId: number;
  revisionId: number;
  revisionNumber: number;
  state: string;
  version: 1 | 2;
  layer: "base" | "site" | "controller";
  initialText: string;
  baseValues?: object;
  safetyContext?: EditorSafetyContext;
  canEdit: boolean;
};

/** The head revision in the editor, with save (a new revision) and submit-for-review. */
/** Moves focus to an element once React has rendered it. */
function focusSoon(id: string) {
  setTimeout(() => document.getElementById(id)?.focus(), 50);
}

export function RevisionWorkspace(props: Props) {
  const router = useRouter();
  const latest = useRef<WorkbenchState | null>(null);
  const [message, setMessage] = useState("");
  const [messageError, setMessageError] = useState<string | undefined>();
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [submitOpen, setSubmitOpen] = useState(false);
  const [reasons, setReasons] = useState<Record<string, string>>({});
  const [reasonErrors, setReasonErrors] = useState<Record<string, string>>({});
  const submittable = props.state === "draft" || props.state === "changes_requested";

  async function save(text: string) {
    setError(null);
    setNotice(null);
    if (message.trim().length < 3) {
      setMessageError("Say in a few words what changed (at least 3 characters).");
      document.getElementById("revision-message")?.focus();
      return;
    }
    let content: unknown;
    try {
      content = JSON.parse(text);
    } catch {
      setError({ status: 400, error: "invalid_request", message: "The text is not valid JSON yet; fix the marked syntax error first." });
      return;
    }
    setMessageError(undefined);
    setBusy(true);
    const result = await apiJson<{ revisionId: number }>(`/api/v1/profiles/${props.profileId}/revisions`, { body: { parentRevisionId: props.revisionId, message, content } });
    setBusy(false);
    if (!result.ok) {
      setError(result.error);
      return;
    }
    setMessage("");
    setNotice("Saved as a new revision.");
    router.refresh();
    focusSoon("workspace-notice");
  }

  function openSubmit() {
    setError(null);
    if (latest.current?.dirty) {
      setError({ status: 400, error: "invalid_request", message: "Save your changes first: a review always covers a saved revision." });
      return;
    }
    setSubmitOpen(true);
    focusSoon("submit-title");
  }

  const warnings = (latest.current?.findings ?? []).filter((f) => f.severity === "warning").filter((f, i, all) => all.findIndex((g) => g.ruleId === f.ruleId) === i);
  const errors = (latest.current?.findings ?? []).filter((f) => f.severity === "error");

  async function submit() {
    setError(null);
    const short = warnings.filter((w) => (reasons[w.ruleId] ?? "").trim().length < 10).map((w) => w.ruleId);
    setReasonErrors(Object.fromEntries(short.map((id) => [id, "Give a reason of at least 10 characters."])));
    if (short.length) {
      document.getElementById(`ack-${short[0]}`)?.focus();
      return;
    }
    setBusy(true);
    const acknowledgements = warnings.map((w) => ({ ruleId: w.ruleId, reason: reasons[w.ruleId] ?? "" }));
    const result = await apiJson<{ requiredApprovals: number }>(`/api/v1/revisions/${props.revisionId}/submit`, { body: { acknowledgements } });
    setBusy(false);
    if (!result.ok) {
      setError(result.error);
      return;
    }
    setSubmitOpen(false);
    focusSoon("workspace-notice");
    setNotice(`Submitted. It needs ${result.data.requiredApprovals} approval${result.data.requiredApprovals > 1 ? "s" : ""} from reviewers other than you.`);
    router.refresh();
  }

  return (
    <div className="space-y-4">
      {notice && (
        // Focus lands here after a save or a submission: the workbench below remounts on the new revision.
        <div id="workspace-notice" tabIndex={-1} className="outline-none">
          <Notice tone="good">{notice}</Notice>
        </div>
      )}
      {error && (
        <Notice tone="bad" title={error.status === 409 ? "Not saved: someone was quicker" : "Not done"}>
          <p>{error.message}</p>
          {error.issues && error.issues.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {error.issues.slice(0, 8).map((i) => (
                <li key={i.path + i.message}>
                  <code className="font-mono text-xs">{i.path || "(document)"}</code> {i.message}
                </li>
              ))}
            </ul>
          )}
          {error.status === 409 && (
            <p className="mt-1">
              Your text is still in the editor. <Link href={`/profiles/${props.profileId}`}>Open the newest revision</Link> in another tab, compare, and save your changes on top of it.
            </p>
          )}
        </Notice>
      )}
      {props.canEdit && props.state === "in_review" && (
        <Notice tone="info">r{props.revisionNumber} is with the reviewers. Saving a change now replaces it with a new draft, and its review starts over.</Notice>
      )}
      {props.canEdit && (
        <div className="flex flex-wrap items-end gap-3">
          <div className="min-w-64 flex-1">
            <label htmlFor="revision-message" className="mb-1 block text-sm font-medium">
              What changed (saved with the revision)
            </label>
            <input
              id="revision-message"
              value={message}
              onChange={(e) => setMessage(e.target.value)}
              maxLength={500}
              aria-invalid={messageError ? true : undefined}
              aria-describedby={messageError ? "revision-message-error" : undefined}
              className="block w-full rounded-md border border-loam-200 bg-white px-3 py-2 text-sm dark:border-loam-800 dark:bg-loam-900"
            />
            {messageError && (
              <p id="revision-message-error" role="alert" className="mt-1 text-sm text-ember-700 dark:text-ember-100">
                {messageError}
              </p>
            )}
          </div>
        </div>
      )}
      {submitOpen && (
        <div role="dialog" aria-modal="false" aria-labelledby="submit-title" className="rounded-lg border border-dusk-300 bg-dusk-50 p-4 dark:border-dusk-700 dark:bg-dusk-950">
          <h2 id="submit-title" tabIndex={-1} className="text-lg font-semibold outline-none">
            Submit revision {props.revisionNumber} for review
          </h2>
          <p className="mt-1 text-sm">
            Reviewers check it against the schema and the safety rules. Controllers will move doors with animals nearby on what they approve: test on a door before release.
          </p>
          {errors.length > 0 && (
            <Notice tone="bad" title="Safety errors block the submission">
              <ul className="list-disc pl-5">
                {errors.map((e) => (
                  <li key={e.ruleId + e.message}>{e.message}</li>
                ))}
              </ul>
            </Notice>
          )}
          {warnings.length > 0 && (
            <div className="mt-3 space-y-3">
              <p className="text-sm font-medium">Each warning needs your reason for going ahead:</p>
              {warnings.map((w) => (
                <div key={w.ruleId}>
                  <label htmlFor={`ack-${w.ruleId}`} className="block text-sm">
                    <span className="font-mono text-xs">{w.ruleId}</span> — {w.message}
                  </label>
                  <textarea
                    id={`ack-${w.ruleId}`}
                    rows={2}
                    aria-invalid={reasonErrors[w.ruleId] ? true : undefined}
                    aria-describedby={reasonErrors[w.ruleId] ? `ack-${w.ruleId}-error` : undefined}
                    value={reasons[w.ruleId] ?? ""}
                    onChange={(e) => setReasons((r) => ({ ...r, [w.ruleId]: e.target.value }))}
                    className="mt-1 block w-full rounded-md border border-loam-200 bg-white px-3 py-2 text-sm dark:border-loam-800 dark:bg-loam-900"
                  />
                  {reasonErrors[w.ruleId] && (
                    <p id={`ack-${w.ruleId}-error`} role="alert" className="mt-1 text-sm text-ember-700 dark:text-ember-100">
                      {reasonErrors[w.ruleId]}
                    </p>
                  )}
                </div>
              ))}
            </div>
          )}
          <div className="mt-4 flex gap-2">
            <Button onClick={submit} disabled={busy || errors.length > 0}>
              {busy ? "Submitting…" : `Submit revision ${props.revisionNumber}`}
            </Button>
            <Button variant="ghost" onClick={() => setSubmitOpen(false)}>
              Cancel
            </Button>
          </div>
        </div>
      )}
      <ProfileWorkbench
        key={props.revisionId}
        version={props.version}
        layer={props.layer}
        initialText={props.initialText}
        baseValues={props.baseValues}
        safetyContext={props.safetyContext}
        readOnly={!props.canEdit}
        busy={busy}
        onSave={props.canEdit ? (text) => void save(text) : undefined}
        onSubmit={props.canEdit && submittable ? () => openSubmit() : undefined}
        onChange={(s) => {
          latest.current = s;
        }}
      />
    </div>
  );
}
