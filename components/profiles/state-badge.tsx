import { Badge } from "@/components/ui/surface";

const STATES: Record<string, { label: string; tone: "neutral" | "good" | "warn" | "bad" | "info" }> = {
  draft: { label: "Draft", tone: "neutral" },
  in_review: { label: "Awaiting review", tone: "info" },
  changes_requested: { label: "Sent back", tone: "warn" },
  approved: { label: "Approved", tone: "good" },
  withdrawn: { label: "Withdrawn", tone: "neutral" },
  superseded: { label: "Replaced", tone: "neutral" },
};

/** A revision's state in our own words. */
export function StateBadge({ state }: { state: string }) {
  const s = STATES[state] ?? { label: state, tone: "neutral" as const };
  return <Badge tone={s.tone}>{s.label}</Badge>;
}
