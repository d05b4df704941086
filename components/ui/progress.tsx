"use client";
import { Progress } from "radix-ui";
import { useId } from "react";

/** Whole percent for a fraction 0…1, clamped; null stays null (not known yet). */
export function percentOf(fraction: number | null): number | null {
  if (fraction === null || !Number.isFinite(fraction)) return null;
  return Math.round(Math.min(1, Math.max(0, fraction)) * 100);
}

/**
 * A labelled progress bar with its value as text beside it. `value` is a fraction 0…1, or null
 * while the amount is unknown (sent, waiting for the server), which shows a pulsing bar.
 */
export function ProgressBar({ label, value, status }: { label: string; value: number | null; status?: string }) {
  const id = useId();
  const pct = percentOf(value);
  const text = status ?? (pct === null ? "Working…" : `${pct} %`);
  return (
    <div className="space-y-1">
      <div className="flex items-baseline justify-between gap-3 text-sm">
        <span id={id} className="font-medium">
          {label}
        </span>
        <span className="tabular-nums text-loam-600 dark:text-loam-400" aria-hidden="true">
          {text}
        </span>
      </div>
      <Progress.Root
        value={pct}
        max={100}
        aria-labelledby={id}
        getValueLabel={(v) => (status ? `${status}, ${v} %` : `${v} %`)}
        // Radix names only known values; an unknown one is described by the status text instead.
        {...(pct === null ? { "aria-valuetext": text } : {})}
        className="relative h-2 w-full overflow-hidden rounded-full bg-loam-100 dark:bg-loam-800"
      >
        <Progress.Indicator
          className={`h-full rounded-full bg-dusk-600 dark:bg-dusk-400 ${pct === null ? "w-full opacity-70 motion-safe:animate-pulse" : "motion-safe:transition-[width] motion-safe:duration-200"}`}
          style={pct === null ? undefined : { width: `${pct}%` }}
        />
      </Progress.Root>
    </div>
  );
}
