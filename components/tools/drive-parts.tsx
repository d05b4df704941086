import type { ReactNode } from "react";
import { Badge, Notice } from "@/components/ui/surface";
import { TRAPPING_CAUTION, type DriveWarning } from "@/lib/drive/warnings";

/** Label–value pairs of a result, as a description list. */
export function ResultList({ rows }: { rows: [ReactNode, ReactNode][] }) {
  return (
    <dl className="divide-y divide-loam-100 text-sm dark:divide-loam-800">
      {rows.map(([label, value], i) => (
        <div key={i} className="flex flex-wrap justify-between gap-x-4 gap-y-1 py-2">
          <dt className="text-loam-600 dark:text-loam-400">{label}</dt>
          <dd className="font-mono tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** A figure that matters most, large. */
export function KeyFigure({ label, value, unit }: { label: string; value: string; unit?: string }) {
  return (
    <div className="rounded-md bg-loam-50 p-3 dark:bg-loam-950">
      <p className="text-xs font-medium uppercase tracking-wide text-loam-600 dark:text-loam-400">{label}</p>
      <p className="mt-1 font-mono text-2xl tabular-nums">
        {value}
        {unit && <span className="ml-1 text-base text-loam-600 dark:text-loam-400">{unit}</span>}
      </p>
    </div>
  );
}

/** Plausibility and safety warnings, each with where its limit comes from. */
export function WarningList({ warnings }: { warnings: DriveWarning[] }) {
  if (!warnings.length) return <Notice tone="good">No warnings for these inputs.</Notice>;
  return (
    <ul className="space-y-2">
      {warnings.map((w, i) => (
        <li key={`${w.code}-${i}`}>
          <Notice tone={w.severity}>
            <span>{w.message}</span> <Badge tone="neutral">{w.basis}</Badge>
          </Notice>
        </li>
      ))}
    </ul>
  );
}

/** Formulas as a monospaced list. */
export function Formulas({ lines }: { lines: string[] }) {
  return (
    <ul className="space-y-1 rounded-md bg-loam-50 p-3 font-mono text-sm dark:bg-loam-950">
      {lines.map((l) => (
        <li key={l}>{l}</li>
      ))}
    </ul>
  );
}

/** The caution shown wherever a value affects trapping or injury. */
export function TrappingCaution() {
  return (
    <Notice tone="warn" title="Caution">
      {TRAPPING_CAUTION}
    </Notice>
  );
}

/** A titled group of fields. */
export function FieldGroup({ legend, children }: { legend: string; children: ReactNode }) {
  return (
    <fieldset className="space-y-3">
      <legend className="mb-2 text-sm font-semibold">{legend}</legend>
      {children}
    </fieldset>
  );
}

/** Shown in place of results while a field is wrong. */
export function FixFields() {
  return <Notice tone="neutral">Correct the marked fields to see the results.</Notice>;
}
