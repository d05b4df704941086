"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { apiJson } from "@/lib/http/client-fetch";

/** Adds a site with its position and time zone (which decide its sunrise and dusk). */
export function NewSiteForm() {
  const router = useRouter();
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "good" | "bad"; text: string } | null>(null);
  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formEl = event.currentTarget;
    const f = new FormData(formEl);
    const body = Object.fromEntries(["slug", "name", "latitude", "longitude", "timeZone", "contactName", "contactEmail"].map((k) => [k, String(f.get(k) ?? "")]));
    const r = await apiJson("/api/v1/sites", { body });
    if (!r.ok) {
      setMessage({ tone: "bad", text: r.error.message });
      setFieldErrors(Object.fromEntries((r.error.issues ?? []).map((i) => [i.path.replace(/^\//, ""), i.message])));
      return;
    }
    setFieldErrors({});
    setMessage({ tone: "good", text: `${body.name} added.` });
    formEl.reset();
    router.refresh();
  }
  return (
    <form onSubmit={onSubmit} method="post" noValidate className="space-y-3" aria-label="Add a site">
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      <TextField label="Name" name="name" error={fieldErrors.name} required />
      <TextField label="Short name" name="slug" error={fieldErrors.slug} hint="Lower case with hyphens, used in CSV imports: north-barn." required />
      <div className="grid grid-cols-2 gap-3">
        <TextField label="Latitude (°)" name="latitude" inputMode="decimal" error={fieldErrors.latitude} hint="North positive." required />
        <TextField label="Longitude (°)" name="longitude" inputMode="decimal" error={fieldErrors.longitude} hint="East positive." required />
      </div>
      <TextField label="Time zone" name="timeZone" error={fieldErrors.timeZone} hint="IANA name, e.g. Europe/London." required />
      <TextField label="Contact" name="contactName" error={fieldErrors.contactName} />
      <TextField label="Contact e-mail" name="contactEmail" type="email" error={fieldErrors.contactEmail} />
      <Button type="submit">Add site</Button>
    </form>
  );
}
