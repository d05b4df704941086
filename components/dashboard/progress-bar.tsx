import type { Progress } from "@/lib/dashboard/format";

/** A labelled progress bar; the value and its words are exposed to assistive technology. */
export function ProgressBar({ label, progress, tone = "good" }: { label: string; progress: Progress; tone?: "good" | "warn" }) {
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={progress.max}
      aria-valuenow={progress.value}
      aria-valuetext={progress.text}
      className="h-2.5 w-full overflow-hidden rounded-full bg-loam-100 dark:bg-loam-800"
    >
      <div className={`h-full rounded-full ${tone === "good" ? "bg-meadow-500" : "bg-straw-500"}`} style={{ width: `${progress.percent}%` }} />
    </div>
  );
}
