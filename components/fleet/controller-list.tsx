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
      assignedHash: z.string().nullable(),
      drift: z.boolean(),
      doorCycles: z.number().nullable(),
      timeFixAgeS: z.number().nullable(),
      stallEvents: z.number().nullable(),
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
  {
    id: "running",
    header: "Assigned / running",
    accessor: (c) => (c.drift ? 0 : 1),
    filterable: true,
    filterText: (c) => (c.drift ? "drift" : c.assignedHash ? "in step" : "unassigned"),
    className: "font-mono text-xs",
    cell: (c) => (
      <>
        {c.assignedHash ? c.assignedHash.slice(0, 8) : "—"} / {c.runningHash ? c.runningHash.slice(0, 8) : "—"}{" "}
        {c.drift ? <Badge tone="warn">drift</Badge> : c.assignedHash ? <Badge tone="good">in step</Badge> : null}
      </>
    ),
  },
  { id: "cycles", header: "Cycles", accessor: (c) => c.doorCycles, className: "tabular-nums", cell: (c) => c.doorCycles ?? "—" },
  {
    id: "fix",
    header: "Time fix",
    accessor: (c) => c.timeFixAgeS,
    className: "tabular-nums",
    cell: (c) => (c.timeFixAgeS === null ? "—" : c.timeFixAgeS > 86400 ? <Badge tone="warn">{Math.round(c.timeFixAgeS / 3600)} h old</Badge> : `${Math.round(c.timeFixAgeS / 60)} min`),
  },
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
