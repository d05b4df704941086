"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/surface";
import { apiJson } from "@/lib/http/client-fetch";

/** Moves a version 1 profile to parameter set 2 as a new draft revision. */
export function MigrateButton({ profileId, revisionId }: { profileId: number; revisionId: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function migrate() {
    setBusy(true);
    setError(null);
    const r = await apiJson(`/api/v1/profiles/${profileId}/migrate`, { body: { parentRevisionId: revisionId } });
    setBusy(false);
    if (!r.ok) setError(r.error.message);
    else router.refresh();
  }
  return (
    <div className="space-y-2">
      <Notice tone="info" title="This profile uses parameter set 1">
        Firmware with parameter set 2 groups the stall, schedule-step and clock settings. Migrating writes a new draft revision with the same values in the new layout; it is reviewed like any change.
      </Notice>
      {error && <Notice tone="bad">{error}</Notice>}
      <Button variant="secondary" onClick={migrate} disabled={busy}>
        {busy ? "Migrating…" : "Migrate to parameter set 2"}
      </Button>
    </div>
  );
}
