"use client";
import Link from "next/link";
import { z } from "zod";
import { DataGrid, LoadError, type DataGridColumn } from "@/components/data/data-grid";
import { useApi } from "@/components/data/use-api";
import { Badge, EmptyState } from "@/components/ui/surface";
import { formatUtc } from "@/lib/time/local-time";

// The fields this list shows from GET /api/v1/reviews; dates arrive as ISO strings.
const answerSchema = z.object({
  queue: z.array(
    z.object({
      revisionId: z.number(),
      number: z.number(),
      message: z.string(),
      submittedAt: z.string().nullable(),
      // A tinyint column: 0 or 1 from the database, a boolean should the query ever map it.
      safetyRelevant: z.union([z.boolean(), z.number()]).transform(Boolean),
      requiredApprovals: z.number(),
      profileId: z.number(),
      profileName: z.string(),
      authorName: z.string().nullable(),
    }),
  ),
});
type QueueRow = z.infer<typeof answerSchema>["queue"][number];

const parseAnswer = (json: unknown) => answerSchema.parse(json).queue;
const submittedMs = (q: QueueRow) => (q.submittedAt ? Date.parse(q.submittedAt) : null);

const COLUMNS: DataGridColumn<QueueRow>[] = [
  {
    id: "change",
    header: "Change",
    accessor: (q) => `r${q.number}: ${q.message}`,
    filterable: true,
    cell: (q) => (
      <Link href={`/reviews/${q.revisionId}`} className="font-medium">
        r{q.number}: {q.message}
      </Link>
    ),
  },
  { id: "profile", header: "Profile", accessor: (q) => q.profileName, filterable: true },
  { id: "author", header: "By", accessor: (q) => q.authorName, filterable: true },
  {
    id: "submitted",
    header: "Submitted",
    accessor: submittedMs,
    className: "whitespace-nowrap font-mono text-xs tabular-nums",
    cell: (q) => (q.submittedAt ? formatUtc(new Date(q.submittedAt)) : "—"),
  },
  {
    id: "approvals",
    header: "Approvals needed",
    accessor: (q) => q.requiredApprovals,
    className: "tabular-nums",
  },
  {
    id: "safety",
    header: "Safety",
    // Safety-relevant changes first when sorted ascending: they are the ones to look at closely.
    accessor: (q) => q.safetyRelevant,
    filterable: true,
    filterText: (q) => (q.safetyRelevant ? "safety" : ""),
    cell: (q) => (q.safetyRelevant ? <Badge tone="warn">safety</Badge> : null),
  },
];

/** Revisions waiting for the signed-in reviewer, fetched from GET /api/v1/reviews (oldest submission first). */
export function ReviewQueue() {
  const { data, error, loading, refetch } = useApi("/api/v1/reviews", parseAnswer);
  return (
    <DataGrid
      caption="Waiting for your review"
      columns={COLUMNS}
      rows={data}
      rowKey={(q) => q.revisionId}
      loading={loading}
      error={error && <LoadError title="The review queue could not be loaded" error={error} onRetry={refetch} retrying={loading} />}
      empty={
        <EmptyState title="Nothing waits for you">
          When an engineer submits a change, it appears here with its comparison, its schema check and its safety findings.
        </EmptyState>
      }
    />
  );
}
