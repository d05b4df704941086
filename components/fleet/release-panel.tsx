"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog, doorCaution } from "@/components/ui/confirm-dialog";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { useToast } from "@/components/ui/toast";
import { apiJson } from "@/lib/http/client-fetch";

type Preview = { affected: number; inFirstStage: number; problems: { serial: string; reasons: string[] }[]; safetyChanges: { path: string; title: string | null; before?: unknown; after?: unknown; unit: string | null }[] };

/** Releases an approved base revision: choose target and share, preview, confirm with the caution. */
export function ReleasePanel({ revisionId, revisionNumber, sites }: { revisionId: number; revisionNumber: number; sites: { value: string; label: string }[] }) {
  const [target, setTarget] = useState("door_model");
  const [preview, setPreview] = useState<Preview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<number | null>(null);
  const [busy, setBusy] = useState(false);
  const [form, setForm] = useState({ siteId: sites[0]?.value ?? "", percent: "10", note: "" });
  const { notify } = useToast();

  const body = () => ({
    baseRevisionId: revisionId,
    target: target === "site" ? { kind: "site", siteId: Number(form.siteId) } : { kind: "door_model" },
    percent: Number(form.percent),
    note: form.note || undefined,
  });

  async function check() {
    setBusy(true);
    setError(null);
    const r = await apiJson<Preview>("/api/v1/releases/preview", { body: body() });
    setBusy(false);
    if (r.ok) setPreview(r.data);
    else setError(r.error.message);
  }
  async function confirmRelease() {
    setBusy(true);
    const r = await apiJson<{ releaseId: number }>("/api/v1/releases", { body: body() });
    setBusy(false);
    if (r.ok) {
      setDone(r.data.releaseId);
      notify({ tone: "success", title: `Release ${r.data.releaseId} is live`, description: `r${revisionNumber} goes to ${form.percent} % of the target as controllers poll.` });
    } else setError(r.error.message);
  }

  if (done) return <Notice tone="good">Released as release {done}. <Link href="/releases">Follow its adoption</Link>.</Notice>;
  return (
    <div className="space-y-3">
      <h2 className="font-semibold">Release r{revisionNumber}</h2>
      {error && <Notice tone="bad">{error}</Notice>}
      <SelectField label="To" name="target" value={target} onChange={(e) => { setTarget(e.target.value); setPreview(null); }} options={[{ value: "door_model", label: "Every site with this door model" }, { value: "site", label: "One site" }]} />
      {target === "site" && <SelectField label="Site" name="siteId" value={form.siteId} onChange={(e) => { setForm({ ...form, siteId: e.target.value }); setPreview(null); }} options={sites} />}
      <TextField label="First stage (% of the target)" name="percent" type="number" min={1} max={100} value={form.percent} onChange={(e) => { setForm({ ...form, percent: e.target.value }); setPreview(null); }} hint="Widen it by hand later; a controller's stage never changes." />
      <TextField label="Note" name="note" value={form.note} onChange={(e) => setForm({ ...form, note: e.target.value })} />
      <Button variant="secondary" onClick={check} disabled={busy}>
        Check the release
      </Button>
      {preview && (
        <div className="space-y-2 rounded-lg border border-straw-500 bg-straw-100/40 p-3 text-sm dark:bg-straw-700/20" role="region" aria-label="Release check">
          <p>
            {preview.affected} controller{preview.affected === 1 ? "" : "s"} in the target; {preview.inFirstStage} in the first stage.
          </p>
          {preview.safetyChanges.length > 0 && (
            <div>
              <p className="font-medium">Safety-relevant changes against the current release:</p>
              <ul className="list-disc pl-5">
                {preview.safetyChanges.map((c) => (
                  <li key={c.path}>
                    {c.title ?? c.path}: {JSON.stringify(c.before) ?? "—"} → {JSON.stringify(c.after) ?? "—"} {c.unit ?? ""}
                  </li>
                ))}
              </ul>
            </div>
          )}
          {preview.problems.length > 0 ? (
            <Notice tone="bad" title="This release would give some controllers an invalid configuration">
              <ul className="list-disc pl-5">
                {preview.problems.slice(0, 20).map((p) => (
                  <li key={p.serial}>
                    <span className="font-mono text-xs">{p.serial}</span>: {p.reasons.join("; ")}
                  </li>
                ))}
              </ul>
            </Notice>
          ) : (
            <>
              <p className="font-medium">Controllers will move doors with animals nearby on this configuration. Check that the first stage is doors someone can watch.</p>
              <ConfirmDialog
                trigger={
                  <Button disabled={busy}>
                    Release to {form.percent} %
                  </Button>
                }
                title={`Release r${revisionNumber} to ${form.percent} %?`}
                description={`${preview.inFirstStage} of the ${preview.affected} controller${preview.affected === 1 ? "" : "s"} in the target are in the first stage and start on this configuration; the rest follow only when you widen the release.`}
                caution={
                  <>
                    {preview.safetyChanges.length > 0 && <p className="mb-1 font-medium">It changes {preview.safetyChanges.length} safety-relevant value{preview.safetyChanges.length === 1 ? "" : "s"} (listed in the check).</p>}
                    <p>{doorCaution(preview.inFirstStage)}</p>
                  </>
                }
                confirmLabel="Yes, release"
                onConfirm={confirmRelease}
              />
            </>
          )}
        </div>
      )}
    </div>
  );
}
