"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ProgressBar } from "@/components/ui/progress";
import { Notice } from "@/components/ui/surface";
import { useToast } from "@/components/ui/toast";
import { apiJson, type ApiIssue } from "@/lib/http/client-fetch";
import { RunPlot } from "./run-plot";

type Suggestion = { parameter: string; path: string; value: number; unit: string; reason: string };
type Result = { runId: number; warnings: string[]; suggested: { suggestions: Suggestion[]; caution: string }; series: { tMs: number; counts: number; velocityCps: number }[] };

const MAX = 5 * 1024 * 1024;

/** Upload a recorded run, see it plotted with the suggested parameters, and turn them into a draft overlay. */
export function CalibrationUpload({ serial, canDraft }: { serial: string; canDraft: boolean }) {
  const router = useRouter();
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<{ message: string; issues: ApiIssue[] } | null>(null);
  const [result, setResult] = useState<Result | null>(null);
  const [draft, setDraft] = useState<{ profileId: number } | null>(null);
  const { notify } = useToast();

  async function onFile(file: File | undefined) {
    setError(null);
    setResult(null);
    if (!file) return;
    if (file.size > MAX) return setError({ message: `The file is ${(file.size / 1048576).toFixed(1)} MiB; the limit is 5 MiB.`, issues: [] });
    const csv = await file.text();
    setProgress(0);
    const r = await apiJson<Result>(`/api/v1/controllers/${encodeURIComponent(serial)}/calibrations`, { body: { fileName: file.name, csv }, onUploadProgress: setProgress });
    setProgress(null);
    if (!r.ok) return setError({ message: r.error.message, issues: r.error.issues ?? [] });
    setResult(r.data);
    notify({ tone: "success", title: `Calibration run ${r.data.runId} saved`, description: "Its plot and the suggested values are below." });
    router.refresh();
  }

  async function makeDraft() {
    if (!result) return;
    const r = await apiJson<{ profileId: number }>(`/api/v1/calibrations/${result.runId}/draft`, { body: {} });
    if (!r.ok) return setError({ message: r.error.message, issues: [] });
    setDraft(r.data);
    notify({ tone: "success", title: "Draft overlay saved", description: `An engineer submits it for review; only a release takes it to ${serial}.` });
  }

  return (
    <div className="space-y-3">
      <label htmlFor="calibration-file" className="block text-sm font-medium">
        Recorded run (CSV: time_ms, counts; optional velocity_cps, open_sensor)
      </label>
      <input id="calibration-file" type="file" accept=".csv,text/csv" onChange={(e) => void onFile(e.target.files?.[0])} className="block text-sm" />
      {/* Once the bytes are sent the server still reads and analyses the run, for an unknown time. */}
      {progress !== null && <ProgressBar label={progress < 1 ? "Uploading the run" : "Analysing the run"} value={progress < 1 ? progress : null} />}
      {error && (
        <Notice tone="bad" title="Not uploaded">
          <p>{error.message}</p>
          {error.issues.length > 1 && (
            <ul className="mt-1 list-disc pl-5 text-xs">
              {error.issues.slice(0, 10).map((i) => (
                <li key={i.path + i.message}>
                  {i.path.replace("/rows/", "row ")}: {i.message}
                </li>
              ))}
            </ul>
          )}
        </Notice>
      )}
      {result && (
        <div className="space-y-3">
          <RunPlot series={result.series} title={`Calibration run ${result.runId}`} />
          {result.warnings.length > 0 && (
            <Notice tone="warn" title="Worth a look">
              <ul className="list-disc pl-5">
                {result.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </Notice>
          )}
          <table className="w-full text-sm">
            <caption className="mb-1 text-left font-semibold">Suggested parameters</caption>
            <tbody>
              {result.suggested.suggestions.map((s) => (
                <tr key={s.path} className="border-t border-loam-100 dark:border-loam-800">
                  <td className="py-1 pr-2">{s.parameter}</td>
                  <td className="py-1 pr-2 font-mono tabular-nums">
                    {s.value} {s.unit}
                  </td>
                  <td className="py-1 text-xs text-loam-600 dark:text-loam-400">{s.reason}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <Notice tone="warn">{result.suggested.caution}</Notice>
          {canDraft && !draft && <Button onClick={makeDraft}>Make these a draft overlay for {serial}</Button>}
          {draft && (
            <Notice tone="good">
              Draft overlay saved. <Link href={`/profiles/${draft.profileId}`}>Open it</Link>; an engineer submits it for review.
            </Notice>
          )}
        </div>
      )}
    </div>
  );
}
