"use client";
import { useDeferredValue, useMemo, useState, type ChangeEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { DataTable, Notice, Panel, Td } from "@/components/ui/surface";
import { EVENT_LABELS, sunDay, type EventKind, type SunEvent } from "@/lib/sun/events";
import { clockTime, formatDuration } from "@/lib/sun/format";
import { sunDayInputSchema } from "@/lib/sun/inputs";
import { listTimeZones } from "@/lib/sun/time-zone";
import { sunYear } from "@/lib/sun/year";
import { SunYearChart } from "./sun-year-chart";

type Form = { lat: string; lon: string; tz: string; date: string };
type FieldName = keyof Form;

const KINDS: EventKind[] = ["civilDawn", "sunrise", "solarNoon", "sunset", "civilDusk"];

function offsetOf(e: SunEvent): string {
  return e.time === null ? "" : `UTC${e.time.slice(19)}`;
}

/** The sun calculator: a site and a date in, the day's events and the year's chart out, live. */
export function SunTool({ initial }: { initial: Form }) {
  const [form, setForm] = useState<Form>(initial);
  const deferred = useDeferredValue(form);
  const parsed = useMemo(() => sunDayInputSchema.safeParse(deferred), [deferred]);
  const zones = useMemo(() => listTimeZones(), []);

  const errors: Partial<Record<FieldName, string>> = {};
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = issue.path[0] as FieldName | undefined;
      if (key && !errors[key]) errors[key] = issue.message;
    }
  }
  const input = parsed.success ? parsed.data : null;
  const yearNumber = input ? Number(input.date.slice(0, 4)) : null;
  const day = useMemo(() => (input ? sunDay(input) : null), [input]);
  const year = useMemo(
    () => (input && yearNumber !== null ? sunYear({ lat: input.lat, lon: input.lon, tz: input.tz, year: yearNumber }) : null),
    // The year only depends on the site, the zone and the year, not on the day within it.
    [input?.lat, input?.lon, input?.tz, yearNumber],
  );

  const set = (name: FieldName) => (e: ChangeEvent<HTMLInputElement>) => setForm((f) => ({ ...f, [name]: e.target.value }));
  const firsts = year ? year.days.filter((d) => d.date.endsWith("-01")) : [];

  return (
    <div className="space-y-6">
      <Panel>
        <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Site and date" className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          <TextField label="Latitude (°)" name="lat" inputMode="decimal" value={form.lat} onChange={set("lat")} error={errors.lat} hint="North positive, -90 to 90." />
          <TextField label="Longitude (°)" name="lon" inputMode="decimal" value={form.lon} onChange={set("lon")} error={errors.lon} hint="East positive, -180 to 180." />
          <div>
            <TextField label="Time zone" name="tz" list="sun-tz-list" autoComplete="off" value={form.tz} onChange={set("tz")} error={errors.tz} hint="IANA name, e.g. Europe/Berlin." />
            <datalist id="sun-tz-list">
              {zones.map((z) => (
                <option key={z} value={z} />
              ))}
            </datalist>
            <Button variant="ghost" size="sm" className="mt-1" onClick={() => setForm((f) => ({ ...f, tz: Intl.DateTimeFormat().resolvedOptions().timeZone }))}>
              Use this browser’s zone
            </Button>
          </div>
          <TextField label="Date" name="date" type="date" min="1900-01-01" max="2100-12-31" value={form.date} onChange={set("date")} error={errors.date} hint="A local calendar day in that zone." />
        </form>
      </Panel>

      {!day || !year ? (
        <Notice tone="warn">Correct the highlighted fields to see the sun times.</Notice>
      ) : (
        <>
          <Panel>
            <h2 className="mb-3 text-lg font-semibold">
              {day.date} in {day.timeZone} (UTC{day.utcOffset})
            </h2>
            <dl className="grid grid-cols-[8rem_5rem_1fr] gap-y-2 text-sm">
              {KINDS.map((kind) => {
                const e = day[kind];
                return (
                  <div key={kind} className="contents">
                    <dt className="text-loam-600 dark:text-loam-400">{EVENT_LABELS[kind]}</dt>
                    <dd className="font-mono text-base">{clockTime(e)}</dd>
                    <dd className="text-loam-600 dark:text-loam-400">{e.time === null ? e.reason : [offsetOf(e), e.note].filter(Boolean).join(" · ")}</dd>
                  </div>
                );
              })}
              <dt className="text-loam-600 dark:text-loam-400">day length</dt>
              <dd className="col-span-2">{formatDuration(day.dayLengthMinutes)}</dd>
            </dl>
            <p className="mt-4 text-xs text-loam-600 dark:text-loam-400">
              Local clock times rounded to the nearest minute. Sunrise and sunset: the Sun’s upper edge on the horizon with standard refraction (−0.833°); civil dawn and dusk: its centre 6° below the horizon. Within about a minute up to 65° latitude; nearer the poles, around the first and last days of midnight sun or polar night, treat times as approximate.
            </p>
          </Panel>

          <Panel>
            <h2 className="mb-3 text-lg font-semibold">The year {year.year}</h2>
            <SunYearChart year={year} selectedDate={day.date} />
          </Panel>

          <DataTable caption={`Sun times on the first of each month, ${year.year}`} headers={["Date", "Civil dawn", "Sunrise", "Sunset", "Civil dusk", "Day length"]}>
            {firsts.map((d) => (
              <tr key={d.date}>
                <Td>{d.date}</Td>
                <Td className="font-mono">{clockTime(d.civilDawn)}</Td>
                <Td className="font-mono">{clockTime(d.sunrise)}</Td>
                <Td className="font-mono">{clockTime(d.sunset)}</Td>
                <Td className="font-mono">{clockTime(d.civilDusk)}</Td>
                <Td>{formatDuration(d.dayLengthMinutes)}</Td>
              </tr>
            ))}
          </DataTable>
        </>
      )}

      <Notice tone="info" title="Using these times for a door schedule">
        <p>
          A door schedule typically opens at sunrise plus an offset and closes after civil dusk plus an offset. Hens go to roost around dusk (common practice), so a close shortly after civil dusk usually finds them inside.
        </p>
        <p className="mt-2 font-medium">
          Check that all birds are in before relying on a dusk close — late birds are shut out. Stall detection on the door is a second line of defence, not a guarantee; follow local rules and licensed practice for powered doors where animals or people can be trapped, for mains wiring and for animal welfare.
        </p>
      </Notice>
    </div>
  );
}
