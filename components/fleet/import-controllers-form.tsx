"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ProgressBar } from "@/components/ui/progress";
import { Notice } from "@/components/ui/surface";
import { useToast } from "@/components/ui/toast";
import { apiJson, type ApiIssue } from "@/lib/http/client-fetch";

const MAX_BYTES = 1024 * 1024;

/** Imports controllers from a CSV file, all or nothing unless the good rows alone are chosen. */
export function ImportControllersForm() {
  const router = useRouter();
  const [text, setText] = useState<string | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [onlyGood, setOnlyGood] = useState(false);
  const [issues, setIssues] = useState<ApiIssue[]>([]);
  const [message, setMessage] = useState<{ tone: "good" | "bad"; text: string } | null>(null);
  const [tokensCsv, setTokensCsv] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const { notify } = useToast();

  function onFile(file: File | undefined) {
    setText(null);
    setFileError(null);
    if (!file) return;
    if (file.size > MAX_BYTES) return setFileError(`The file is ${(file.size / 1024).toFixed(0)} KiB; the limit is 1 MiB.`);
    file.text().then(setText, () => setFileError("The file could not be read."));
  }

  async function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    if (!text) return setFileError("Choose a CSV file first.");
    setProgress(0);
    setIssues([]);
    setMessage(null);
    const r = await apiJson<{ imported: { serial: string; token: string }[]; skipped: ApiIssue[] }>("/api/v1/controllers/import", { body: { csv: text, onlyGoodRows: onlyGood }, onUploadProgress: setProgress });
    setProgress(null);
    if (!r.ok) {
      setMessage({ tone: "bad", text: r.error.message });
      setIssues(r.error.issues ?? []);
      return;
    }
    setIssues(r.data.skipped);
    const summary = `${r.data.imported.length} controller${r.data.imported.length === 1 ? "" : "s"} registered${r.data.skipped.length ? `; ${r.data.skipped.length} problem${r.data.skipped.length > 1 ? "s" : ""} skipped` : ""}.`;
    setMessage({ tone: "good", text: summary });
    notify({ tone: "success", title: "Controllers imported", description: r.data.imported.length > 0 ? `${summary} Download their tokens now; they are shown once.` : summary });
    setTokensCsv(["serial,token", ...r.data.imported.map((i) => `${i.serial},${i.token}`)].join("\n") + "\n");
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Import controllers from CSV">
      <div>
        <label htmlFor="controllers-csv" className="mb-1 block text-sm font-medium">
          CSV file
        </label>
        <input id="controllers-csv" type="file" accept=".csv,text/csv" onChange={(e) => onFile(e.target.files?.[0])} aria-describedby="controllers-csv-hint" className="block text-sm" />
        <p id="controllers-csv-hint" className="mt-1 text-xs text-loam-600 dark:text-loam-400">
          Columns: serial, door_model_code, site_slug, firmware_version, parameter_set_version. Up to 5,000 rows.
        </p>
        {fileError && (
          <p role="alert" className="mt-1 text-sm text-ember-700 dark:text-ember-100">
            {fileError}
          </p>
        )}
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={onlyGood} onChange={(e) => setOnlyGood(e.target.checked)} />
        Import the good rows even if others are wrong
      </label>
      {/* Once the file is sent the server checks and registers every row, for an unknown time. */}
      {progress !== null && <ProgressBar label={progress < 1 ? "Uploading the file" : "Checking and registering the rows"} value={progress < 1 ? progress : null} />}
      <Button type="submit" variant="secondary" disabled={progress !== null}>
        Import
      </Button>
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      {issues.length > 0 && (
        <ul className="max-h-48 list-disc overflow-y-auto pl-5 text-xs">
          {issues.map((i) => (
            <li key={i.path + i.message}>
              <code className="font-mono">{i.path.replace("/rows/", "row ").replace(/\//g, " · ")}</code> {i.message}
            </li>
          ))}
        </ul>
      )}
      {tokensCsv && (
        <Notice tone="info" title="Tokens, shown this once">
          <a href={`data:text/csv;charset=utf-8,${encodeURIComponent(tokensCsv)}`} download="controller-tokens.csv">
            Download the serials and tokens
          </a>{" "}
          and load each into its controller.
        </Notice>
      )}
    </form>
  );
}
