"use client";
import { useMemo, useState, type ChangeEvent } from "react";
import { TextField } from "@/components/ui/field";
import { Notice, Panel } from "@/components/ui/surface";
import { distanceInputSchema } from "@/lib/timecode/inputs";
import { transmitterDistance } from "@/lib/timecode/transmitters";
import type { Standard } from "@/lib/timecode/types";

type Form = { lat: string; lon: string };

/** Distance and direction from a site to the chosen transmitter, with a reception note. */
export function TimecodeDistance({ standard }: { standard: Standard }) {
  const [form, setForm] = useState<Form>({ lat: "52.20", lon: "0.12" });
  const set = (name: keyof Form) => (e: ChangeEvent<HTMLInputElement>) => setForm((f) => ({ ...f, [name]: e.target.value }));
  const parsed = useMemo(() => distanceInputSchema.safeParse({ standard, ...form }), [standard, form]);
  const errors: Partial<Record<keyof Form, string>> = {};
  if (!parsed.success) {
    for (const i of parsed.error.issues) {
      const k = i.path[0] as keyof Form | undefined;
      if (k && !errors[k]) errors[k] = i.message;
    }
  }
  const d = parsed.success ? transmitterDistance(standard, parsed.data) : null;
  return (
    <Panel>
      <h2 className="mb-3 text-lg font-semibold">Distance to the transmitter</h2>
      <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Site for the distance" className="grid gap-4 sm:grid-cols-2">
        <TextField label="Site latitude (°)" name="lat" inputMode="decimal" autoComplete="off" value={form.lat} onChange={set("lat")} error={errors.lat} hint="North positive, -90 to 90." />
        <TextField label="Site longitude (°)" name="lon" inputMode="decimal" autoComplete="off" value={form.lon} onChange={set("lon")} error={errors.lon} hint="East positive, -180 to 180." />
      </form>
      {d && (
        <div className="mt-4 space-y-3">
          <dl className="grid grid-cols-[10rem_1fr] gap-y-1.5 text-sm">
            <dt className="text-loam-600 dark:text-loam-400">Transmitter</dt>
            <dd>
              {d.transmitter.callSign}, {d.transmitter.frequencyKHz} kHz, {d.transmitter.site}
            </dd>
            <dt className="text-loam-600 dark:text-loam-400">Distance</dt>
            <dd className="font-mono">{Math.round(d.distanceKm).toLocaleString("en-GB")} km (great circle)</dd>
            <dt className="text-loam-600 dark:text-loam-400">Bearing from site</dt>
            <dd className="font-mono">{Math.round(d.bearingDeg)}° from true north</dd>
            <dt className="text-loam-600 dark:text-loam-400">Ferrite rod along</dt>
            <dd className="font-mono">
              {Math.round(d.rodAxisDeg)}° / {Math.round(d.rodAxisDeg) + 180}° (broadside to the station)
            </dd>
          </dl>
          <Notice tone={d.withinUsualRange ? "good" : "warn"} title={d.withinUsualRange ? "Within the usual range" : "Beyond the usual range"}>
            {d.note}
          </Notice>
        </div>
      )}
    </Panel>
  );
}
