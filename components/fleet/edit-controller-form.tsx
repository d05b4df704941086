"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { apiJson } from "@/lib/http/client-fetch";

/** Moves a controller to another site or records new firmware. */
export function EditControllerForm({ serial, siteId, firmwareVersion, sites }: { serial: string; siteId: number; firmwareVersion: string; sites: { value: string; label: string }[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "good" | "bad"; text: string } | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    const r = await apiJson(`/api/v1/controllers/${encodeURIComponent(serial)}`, { method: "PATCH", body: { siteId: Number(f.get("siteId")), firmwareVersion: String(f.get("firmwareVersion") ?? "") } });
    if (!r.ok) {
      setMessage({ tone: "bad", text: r.error.message });
      setFieldErrors(Object.fromEntries((r.error.issues ?? []).map((i) => [i.path.replace(/^\//, ""), i.message])));
      return;
    }
    setFieldErrors({});
    setMessage({ tone: "good", text: "Saved. The controller gets the configuration for its new place on its next poll." });
    router.refresh();
  }
  return (
    <form onSubmit={onSubmit} method="post" noValidate className="space-y-3" aria-label="Change controller">
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      <SelectField label="Site" name="siteId" defaultValue={String(siteId)} options={sites} error={fieldErrors.siteId} />
      <TextField label="Firmware version" name="firmwareVersion" defaultValue={firmwareVersion} error={fieldErrors.firmwareVersion} />
      <Button type="submit" variant="secondary">
        Save
      </Button>
    </form>
  );
}
