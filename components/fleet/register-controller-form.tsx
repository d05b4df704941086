"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { apiJson } from "@/lib/http/client-fetch";

type Option = { value: string; label: string };

/** Registers a controller and shows its token once. */
export function RegisterControllerForm({ doorModels, sites }: { doorModels: Option[]; sites: Option[] }) {
  const router = useRouter();
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [issued, setIssued] = useState<{ serial: string; token: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    // React clears currentTarget once the handler awaits; keep the element for the reset below.
    const formEl = event.currentTarget;
    const form = new FormData(formEl);
    const body = {
      serial: String(form.get("serial") ?? ""),
      doorModelId: Number(form.get("doorModelId")),
      siteId: Number(form.get("siteId")),
      firmwareVersion: String(form.get("firmwareVersion") ?? ""),
      parameterSetVersion: Number(form.get("parameterSetVersion")),
    };
    setBusy(true);
    setError(null);
    setFieldErrors({});
    const r = await apiJson<{ token: string }>("/api/v1/controllers", { body });
    setBusy(false);
    if (!r.ok) {
      setError(r.error.message);
      setFieldErrors(Object.fromEntries((r.error.issues ?? []).map((i) => [i.path.replace(/^\//, ""), i.message])));
      return;
    }
    setIssued({ serial: body.serial.toUpperCase(), token: r.data.token });
    formEl.reset();
    router.refresh();
  }

  return (
    <div className="space-y-4">
      {issued && (
        <Notice tone="good" title={`${issued.serial} registered`}>
          <p>Store this token in the controller now. It is shown only this once; Roostline keeps just its hash.</p>
          <code className="mt-2 block break-all rounded bg-loam-100 p-2 font-mono text-xs dark:bg-loam-800" data-testid="new-token">
            {issued.token}
          </code>
        </Notice>
      )}
      <form onSubmit={onSubmit} method="post" noValidate className="space-y-4" aria-label="Register a controller">
        {error && <Notice tone="bad">{error}</Notice>}
        <TextField label="Serial" name="serial" required error={fieldErrors.serial} hint="As printed on the controller, e.g. HM350-0042." />
        <SelectField label="Door model" name="doorModelId" options={doorModels} error={fieldErrors.doorModelId} />
        <SelectField label="Site" name="siteId" options={sites} error={fieldErrors.siteId} />
        <TextField label="Firmware version" name="firmwareVersion" defaultValue="1.4.2" error={fieldErrors.firmwareVersion} />
        <SelectField label="Parameter set" name="parameterSetVersion" defaultValue="2" options={[{ value: "2", label: "Version 2" }, { value: "1", label: "Version 1" }]} error={fieldErrors.parameterSetVersion} />
        <Button type="submit" disabled={busy}>
          {busy ? "Registering…" : "Register and issue a token"}
        </Button>
      </form>
    </div>
  );
}
