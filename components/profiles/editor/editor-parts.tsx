// Small pieces shared by the workbench's views: the safety caution and the severity labels.
import type { ReactNode } from "react";
import { Badge } from "@/components/ui/surface";

export const EDITOR_CAUTION =
  "Stall detection is a second line of defence, not a guarantee. A powered door can trap or injure an animal or a hand: test every door on site after a change, and follow local codes and licensed practice for powered doors, mains wiring and animal welfare.";

/** The caution beside values that can hurt an animal or a person. */
export function SafetyCaution({ compact = false, id }: { compact?: boolean; id?: string }) {
  return (
    <div
      id={id}
      role="note"
      className={`rounded-md border-l-4 border-straw-500 bg-straw-100/60 text-loam-900 dark:bg-straw-700/25 dark:text-loam-50 ${compact ? "px-3 py-2 text-xs" : "p-3 text-sm"}`}
    >
      <span className="font-semibold">Caution: </span>
      {EDITOR_CAUTION}
    </div>
  );
}

/** "Error" / "Warning" in words and colour, so the colour is never the only signal. */
export function SeverityBadge({ severity, children }: { severity: "error" | "warning"; children?: ReactNode }) {
  return <Badge tone={severity === "error" ? "bad" : "warn"}>{children ?? (severity === "error" ? "Error" : "Warning")}</Badge>;
}

/** Marks a parameter whose value affects trapping or injury. */
export function SafetyBadge() {
  return <Badge tone="neutral">Safety-relevant</Badge>;
}
