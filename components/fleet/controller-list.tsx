"use client";
import Link from "next/link";
import { z } from "zod";
import { DataGrid, LoadError, type DataGridColumn } from "@/components/data/data-grid";
import { useApi } from "@/components/data/use-api";
import { Badge, EmptyState } from "@/components/ui/surface";
import { formatUtc } from "@/lib/time/local-time";

// The fields this list shows from GET /api/v1/controllers; dates arrive as ISO strings.
const answerSchema = z.object({
  controllers: z.array(
    z.object({
      id: z.number(),
      serial: z.string(),
      firmwareVersion: z.string(),
      parameterSetVersion: z.number(),
      runningHash: z.string().nullable(),
      lastSeenAt: z.string().nullable(),
      siteName: z.string(),
      doorModelName: z.string(),
    }),
  ),
});
type Row = z.infer<typeof answerSchema>["controllers"][number];

const parseAnswer = (json: unknown) => answerSchema.parse(json).controllers;

const COLUMNS: DataGridColumn<Row>[] = [
  {
    id: "serial",
    header: "Serial",
    accessor: (c) => c.serial,
    filterable: true,
    className: "font-mono text-xs",
    cell: (c) => <Link href={`/controllers/${encodeURIComponent(c.serial)}`}>{c.serial}</Link>,
  },
  { id: "site", header: "Site", accessor: (c) => c.siteName, filterable: true },
  { id: "model", header: "Door model", accessor: (c) => c.doorModelName, filterable: true },
  { id: "firmware", header: "Firmware", accessor: (c) => c.firmwareVersion, filterable: true, cell: (c) => <>{c.firmwareVersion} <Badge>set {c.parameterSetVersion}</Badge></> },
  { id: "running", header: "Running", accessor: (c) => c.runningHash, className: "font-mono text-xs", cell: (c) => (c.runningHash ? c.runningHash.slice(0, 10) : "—") },
  {
    id: "seen",
    header: "Last seen",
    accessor: (c) => (c.lastSeenAt ? Date.parse(c.lastSeenAt) : null),
    className: "whitespace-nowrap font-mono text-xs",
    cell: (c) => (c.lastSeenAt ? formatUtc(new Date(c.lastSeenAt)) : "never"),
  },
];

/** Every controller, fetched from GET /api/v1/controllers, sortable, filterable and paged. */
export function ControllerList() {
  const { data, error, loading, refetch } = useApi("/api/v1/controllers", parseAnswer);
  return (
    <DataGrid
      caption="Controllers"
      columns={COLUMNS}
      rows={data}
      rowKey={(c) => c.id}
      loading={loading}
      initialSort={{ columnId: "serial", direction: "asc" }}
      error={error && <LoadError title="The controllers could not be loaded" error={error} onRetry={refetch} retrying={loading} />}
      empty={<EmptyState title="No controllers registered yet">A technician registers each controller by its serial number and receives a device token once.</EmptyState>}
    />
  );
}
