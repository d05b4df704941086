"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { apiJson } from "@/lib/http/client-fetch";

type Option = { value: string; label: string };
const MAX_IMPORT_BYTES = 256 * 1024;

/** Starts a base profile or a site overlay, from the schema defaults or an imported JSON file. */
export function NewProfileForm({ doorModels, sites, versions }: { doorModels: Option[]; sites: Option[]; versions: Option[] }) {
  const router = useRouter();
  const [layer, setLayer] = useState<"base" | "site">("base");
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [content, setContent] = useState<Record<string, unknown> | null>(null);
  const [fileNote, setFileNote] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);

  function onFile(file: File | undefined) {
    setContent(null);
    setFileNote(null);
    setFieldErrors((f) => ({ ...f, file: "" }));
    if (!file) return;
    if (file.size > MAX_IMPORT_BYTES) {
      setFieldErrors((f) => ({ ...f, file: `The file is ${(file.size / 1024).toFixed(0)} KiB; the limit is ${MAX_IMPORT_BYTES / 1024} KiB.` }));
      return;
    }
    const reader = new FileReader();
    reader.onprogress = (e) => e.lengthComputable && setProgress(e.loaded / e.total / 2);
    reader.onload = () => {
      setProgress(null);
      try {
        const value: unknown = JSON.parse(String(reader.result));
        if (!value || typeof value !== "object" || Array.isArray(value)) throw new Error("The file must hold one JSON object.");
        setContent(value as Record<string, unknown>);
        setFileNote(`${file.name}: ${Object.keys(value).length} top-level parameters read.`);
      } catch (err) {
        setFieldErrors((f) => ({ ...f, file: `Not usable JSON: ${err instanceof Error ? err.message : "unreadable"}` }));
      }
    };
    reader.onerror = () => setFieldErrors((f) => ({ ...f, file: "The file could not be read." }));
    reader.readAsText(file);
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setError(null);
    setFieldErrors({});
    const body = {
      layer,
      name: String(form.get("name") ?? ""),
      doorModelId: Number(form.get("doorModelId")),
      siteId: layer === "site" ? Number(form.get("siteId")) : undefined,
      schemaVersion: Number(form.get("schemaVersion")),
      ...(content ? { content } : {}),
    };
    setProgress(0);
    const result = await apiJson<{ profileId: number }>("/api/v1/profiles", { body, onUploadProgress: (p) => setProgress(0.5 + p / 2) });
    setProgress(null);
    if (result.ok) {
      router.push(`/profiles/${result.data.profileId}`);
      return;
    }
    setError(result.error.message);
    const fe: Record<string, string> = {};
    for (const i of result.error.issues ?? []) fe[i.path.replace(/^\//, "").split("/")[0] || "file"] ??= i.message;
    if (content && result.error.error === "invalid_profile") fe.file = result.error.message;
    setFieldErrors(fe);
  }

  return (
    <form onSubmit={onSubmit} method="post" noValidate className="space-y-4" aria-label="New profile">
      {error && <Notice tone="bad">{error}</Notice>}
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Layer</legend>
        <div className="flex gap-4 text-sm">
          {(["base", "site"] as const).map((l) => (
            <label key={l} className="flex items-center gap-2">
              <input type="radio" name="layer" value={l} checked={layer === l} onChange={() => setLayer(l)} />
              {l === "base" ? "Base profile of a door model" : "Site overlay"}
            </label>
          ))}
        </div>
      </fieldset>
      <TextField label="Name" name="name" required error={fieldErrors.name} hint="For example “Henhouse 350 standard” or “Lindenhof late dusk”." />
      <SelectField label="Door model" name="doorModelId" options={doorModels} error={fieldErrors.doorModelId} />
      {layer === "site" && <SelectField label="Site" name="siteId" options={sites} error={fieldErrors.siteId} hint="The overlay sets only what differs at this site; the rest comes from the base." />}
      <SelectField label="Parameter set" name="schemaVersion" options={versions} defaultValue={versions.at(-1)?.value} error={fieldErrors.schemaVersion} />
      <div>
        <label htmlFor="profile-file" className="mb-1 block text-sm font-medium">
          Import from a JSON file (optional)
        </label>
        <input id="profile-file" type="file" accept="application/json,.json" onChange={(e) => onFile(e.target.files?.[0])} aria-describedby="profile-file-hint profile-file-error" className="block text-sm" />
        <p id="profile-file-hint" className="mt-1 text-sm text-loam-600 dark:text-loam-400">
          Up to {MAX_IMPORT_BYTES / 1024} KiB. Without a file a base profile starts from the schema defaults and an overlay starts empty.
        </p>
        {fileNote && <p className="mt-1 text-sm text-meadow-700 dark:text-meadow-100">{fileNote}</p>}
        {fieldErrors.file && (
          <p id="profile-file-error" role="alert" className="mt-1 text-sm font-medium text-ember-700 dark:text-ember-100">
            {fieldErrors.file}
          </p>
        )}
      </div>
      {progress !== null && <progress className="w-full" value={progress} max={1} aria-label="Import progress" />}
      <Button type="submit" disabled={progress !== null}>
        Create draft
      </Button>
    </form>
  );
}
