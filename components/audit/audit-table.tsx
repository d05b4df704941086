"use client";
import { z } from "zod";
import { DataGrid, LoadError, type DataGridColumn } from "@/components/data/data-grid";
import { useApi } from "@/components/data/use-api";
import { EmptyState } from "@/components/ui/surface";
import { formatUtc } from "@/lib/time/local-time";
import { actionLabel } from "./action-labels";

// The fields this table shows from GET /api/v1/audit; dates arrive as ISO strings.
const answerSchema = z.object({
  events: z.array(
    z.object({
      id: z.number(),
      action: z.string(),
      subjectType: z.string(),
      subjectId: z.string(),
      detail: z.unknown(),
      createdAt: z.string(),
      actorName: z.string().nullable(),
    }),
  ),
});
type AuditRow = z.infer<typeof answerSchema>["events"][number];

const parseAnswer = (json: unknown) => answerSchema.parse(json).events;

// Content hashes are 64 hex digits; ten are enough to tell them apart by eye.
function describeDetail(detail: unknown): string {
  if (detail === null || detail === undefined) return "";
  if (typeof detail !== "object" || Array.isArray(detail)) return JSON.stringify(detail);
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${typeof v === "string" && /^[0-9a-f]{64}$/.test(v) ? v.slice(0, 10) + "…" : typeof v === "object" && v !== null ? JSON.stringify(v) : String(v)}`)
    .join(", ");
}

const COLUMNS: DataGridColumn<AuditRow>[] = [
  {
    id: "when",
    header: "When",
    // Ids grow with time and break ties within one millisecond.
    accessor: (e) => e.id,
    className: "whitespace-nowrap font-mono text-xs tabular-nums",
    cell: (e) => formatUtc(new Date(e.createdAt)),
  },
  { id: "who", header: "Who", accessor: (e) => e.actorName, filterable: true, cell: (e) => e.actorName ?? "(removed user)" },
  { id: "what", header: "What", accessor: (e) => actionLabel(e.action), filterable: true, filterText: (e) => `${actionLabel(e.action)} ${e.action}` },
  {
    id: "subject",
    header: "Subject",
    accessor: (e) => `${e.subjectType} ${e.subjectId}`,
    filterable: true,
    className: "font-mono text-xs",
    cell: (e) => `${e.subjectType} ${e.subjectId.slice(0, 8)}`,
  },
  { id: "detail", header: "Detail", accessor: (e) => describeDetail(e.detail), filterable: true, sortable: false, className: "text-xs" },
];

export type AuditTableProps = {
  /** An action prefix such as "revision." ("" or undefined for everything). */
  action?: string;
  /** Only events by this e-mail address. */
  actor?: string;
  /** How many of the newest events to load (the route allows 1–5000). */
  limit?: number;
};

/** The audit log, newest first, fetched from GET /api/v1/audit with the page's filters. */
export function AuditTable({ action, actor, limit = 200 }: AuditTableProps) {
  const params = new URLSearchParams({ limit: String(limit) });
  if (action) params.set("action", action);
  if (actor) params.set("actor", actor);
  const { data, error, loading, refetch } = useApi(`/api/v1/audit?${params}`, parseAnswer);
  const filtered = Boolean(action || actor);
  return (
    <DataGrid
      caption="Audit events"
      columns={COLUMNS}
      rows={data}
      rowKey={(e) => e.id}
      loading={loading}
      initialSort={{ columnId: "when", direction: "desc" }}
      toolbar={
        data !== undefined && data.length >= limit ? (
          <p className="pb-1.5 text-sm text-loam-600 dark:text-loam-400">The newest {limit} events are loaded; narrow the log with Show or By to reach older ones.</p>
        ) : null
      }
      error={error && <LoadError title="The audit log could not be loaded" error={error} onRetry={refetch} retrying={loading} />}
      empty={
        <EmptyState title={filtered ? "No changes match these filters" : "No changes recorded here"}>
          {filtered ? "Choose “Everything” or clear the e-mail address to see more." : "Changes appear as soon as someone invites a colleague, edits a profile or decides on a review."}
        </EmptyState>
      }
    />
  );
}
