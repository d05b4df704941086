"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog, doorCaution } from "@/components/ui/confirm-dialog";
import { useToast } from "@/components/ui/toast";
import { apiJson } from "@/lib/http/client-fetch";

type Change = { percent: number } | { state: "active" | "paused" | "rolled_back" };

/**
 * Widen, pause, resume or roll back one release, each after a confirmation. `inTarget` (the
 * target's controller count), when the page passes it, makes the widening caution concrete.
 */
export function ReleaseControls({ releaseId, percent, state, inTarget }: { releaseId: number; percent: number; state: string; inTarget?: number }) {
  const router = useRouter();
  const { notify } = useToast();
  const [message, setMessage] = useState<string | null>(null);
  const [next, setNext] = useState(String(Math.min(100, percent < 50 ? 50 : 100)));

  async function change(body: Change, done: string) {
    const r = await apiJson(`/api/v1/releases/${releaseId}`, { method: "PATCH", body });
    setMessage(r.ok ? null : r.error.message);
    if (r.ok) notify({ tone: "success", title: done });
    router.refresh();
  }

  if (state === "rolled_back") return <span className="text-xs text-loam-600 dark:text-loam-400">rolled back</span>;
  const wider = Number(next);
  const widenable = Number.isInteger(wider) && wider > percent && wider <= 100;
  return (
    <div className="space-y-1">
      <div className="flex flex-wrap items-center gap-2">
        {percent < 100 && state === "active" && (
          <>
            <label htmlFor={`widen-${releaseId}`} className="sr-only">
              New share in percent
            </label>
            <input id={`widen-${releaseId}`} type="number" min={percent} max={100} value={next} onChange={(e) => setNext(e.target.value)} className="w-16 rounded border border-loam-200 px-1 py-0.5 text-sm dark:border-loam-800 dark:bg-loam-900" />
            <ConfirmDialog
              trigger={<Button size="sm">Widen</Button>}
              title={`Widen release ${releaseId} to ${next} %?`}
              description={
                widenable
                  ? "More doors with animals nearby will move on it. Controllers already in the stage keep it; the wider stage adds controllers and never removes any."
                  : `Choose a share above ${percent} % and at most 100 %; the server will refuse anything else.`
              }
              caution={doorCaution(inTarget === undefined ? undefined : `about ${Math.round((inTarget * (widenable ? wider : percent)) / 100)} of the ${inTarget} controllers in the target`, "this release's configuration")}
              confirmLabel="Yes, widen"
              onConfirm={() => change({ percent: wider }, `Release ${releaseId} widened to ${next} %`)}
            />
          </>
        )}
        {state === "active" ? (
          <ConfirmDialog
            trigger={
              <Button size="sm" variant="secondary">
                Pause
              </Button>
            }
            title={`Pause release ${releaseId}?`}
            description="It stops widening. Controllers already on it keep this configuration, and doors go on opening and closing on it, until you resume or roll back."
            confirmLabel="Yes, pause"
            onConfirm={() => change({ state: "paused" }, `Release ${releaseId} paused`)}
          />
        ) : (
          <ConfirmDialog
            trigger={
              <Button size="sm" variant="secondary">
                Resume
              </Button>
            }
            title={`Resume release ${releaseId}?`}
            description="It can be widened again. Controllers in its stage go on running it; nothing changes at the doors until you widen it."
            confirmLabel="Yes, resume"
            onConfirm={() => change({ state: "active" }, `Release ${releaseId} resumed`)}
          />
        )}
        <ConfirmDialog
          trigger={
            <Button size="sm" variant="danger">
              Roll back
            </Button>
          }
          title={`Roll back release ${releaseId}?`}
          description="Its controllers return to the previous release covering them on their next poll. A rolled-back release cannot be resumed; to bring it back, release the revision again."
          caution={doorCaution(undefined, "the previous release's parameters")}
          confirmLabel="Yes, roll back"
          destructive
          typeToConfirm={{ expected: String(releaseId), label: `Type the release number “${releaseId}” to confirm` }}
          onConfirm={() => change({ state: "rolled_back" }, `Release ${releaseId} rolled back`)}
        />
      </div>
      {message && (
        <p role="alert" className="text-xs text-ember-700 dark:text-ember-100">
          {message}
        </p>
      )}
    </div>
  );
}
