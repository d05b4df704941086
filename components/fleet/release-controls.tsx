"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { apiJson } from "@/lib/http/client-fetch";

/** Widen, pause, resume or roll back one release. */
export function ReleaseControls({ releaseId, percent, state }: { releaseId: number; percent: number; state: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [next, setNext] = useState(String(Math.min(100, percent < 50 ? 50 : 100)));
  async function change(body: object, confirmText: string) {
    if (!window.confirm(confirmText)) return;
    const r = await apiJson(`/api/v1/releases/${releaseId}`, { method: "PATCH", body });
    setMessage(r.ok ? null : r.error.message);
    router.refresh();
  }
  if (state === "rolled_back") return <span className="text-xs text-loam-600 dark:text-loam-400">rolled back</span>;
  return (
    <div className="space-y-1">
      <div className="flex flex-wrap items-center gap-2">
        {percent < 100 && state === "active" && (
          <>
            <label htmlFor={`widen-${releaseId}`} className="sr-only">
              New share in percent
            </label>
            <input id={`widen-${releaseId}`} type="number" min={percent} max={100} value={next} onChange={(e) => setNext(e.target.value)} className="w-16 rounded border border-loam-200 px-1 py-0.5 text-sm dark:border-loam-800 dark:bg-loam-900" />
            <Button size="sm" onClick={() => change({ percent: Number(next) }, `Widen release ${releaseId} to ${next} %? More doors with animals nearby will move on it.`)}>
              Widen
            </Button>
          </>
        )}
        {state === "active" ? (
          <Button size="sm" variant="secondary" onClick={() => change({ state: "paused" }, `Pause release ${releaseId}? Controllers already on it keep it; it stops widening.`)}>
            Pause
          </Button>
        ) : (
          <Button size="sm" variant="secondary" onClick={() => change({ state: "active" }, `Resume release ${releaseId}?`)}>
            Resume
          </Button>
        )}
        <Button size="sm" variant="danger" onClick={() => change({ state: "rolled_back" }, `Roll back release ${releaseId}? Its controllers return to the previous release on their next poll.`)}>
          Roll back
        </Button>
      </div>
      {message && (
        <p role="alert" className="text-xs text-ember-700 dark:text-ember-100">
          {message}
        </p>
      )}
    </div>
  );
}
