"use client";
import Link from "next/link";
import { z } from "zod";
import { DataGrid, LoadError, type DataGridColumn } from "@/components/data/data-grid";
import { useApi } from "@/components/data/use-api";
import { Badge, EmptyState } from "@/components/ui/surface";
import { StateBadge } from "./state-badge";

const LAYER_LABEL = { base: "Base", site: "Site overlay", controller: "Controller overlay" } as const;

// The fields this list shows from GET /api/v1/profiles; anything else in the answer is ignored.
const answerSchema = z.object({
  profiles: z.array(
    z.object({
      id: z.number(),
      layer: z.enum(["base", "site", "controller"]),
      name: z.string(),
      schemaVersion: z.number(),
      doorModelName: z.string().nullable(),
      siteName: z.string().nullable(),
      headNumber: z.number().nullable(),
      headState: z.string().nullable(),
    }),
  ),
});
type ProfileRow = z.infer<typeof answerSchema>["profiles"][number];

const parseAnswer = (json: unknown) => answerSchema.parse(json).profiles;
const appliesTo = (p: ProfileRow) => [p.doorModelName, p.siteName].filter(Boolean).join(" at ");

const COLUMNS: DataGridColumn<ProfileRow>[] = [
  {
    id: "name",
    header: "Profile",
    accessor: (p) => p.name,
    filterable: true,
    cell: (p) => (
      <Link href={`/profiles/${p.id}`} className="font-medium">
        {p.name}
      </Link>
    ),
  },
  { id: "layer", header: "Layer", accessor: (p) => LAYER_LABEL[p.layer], filterable: true },
  { id: "appliesTo", header: "Applies to", accessor: (p) => appliesTo(p), filterable: true, cell: (p) => appliesTo(p) || "—" },
  {
    id: "head",
    header: "Newest revision",
    accessor: (p) => p.headNumber,
    filterable: true,
    filterText: (p) => (p.headNumber ? `r${p.headNumber} ${(p.headState ?? "draft").replace(/_/g, " ")}` : ""),
    cell: (p) =>
      p.headNumber ? (
        <span className="inline-flex items-center gap-2">
          r{p.headNumber} <StateBadge state={p.headState ?? "draft"} />
        </span>
      ) : (
        "—"
      ),
  },
  { id: "schemaVersion", header: "Parameter set", accessor: (p) => p.schemaVersion, cell: (p) => <Badge>v{p.schemaVersion}</Badge> },
];

/** Every profile, fetched from GET /api/v1/profiles, sortable and filterable. */
export function ProfileList({ canEdit }: { canEdit: boolean }) {
  const { data, error, loading, refetch } = useApi("/api/v1/profiles", parseAnswer);
  return (
    <DataGrid
      caption="Profiles"
      columns={COLUMNS}
      rows={data}
      rowKey={(p) => p.id}
      loading={loading}
      error={error && <LoadError title="The profiles could not be loaded" error={error} onRetry={refetch} retrying={loading} />}
      empty={
        <EmptyState title="No profiles yet">
          {canEdit ? "Start a base profile for a door model with the form beside this list." : "An engineer starts a base profile for each door model."}
        </EmptyState>
      }
    />
  );
}
