import type { Metadata } from "next";
import { NewSiteForm } from "@/components/fleet/new-site-form";
import { DataTable, EmptyState, PageHeader, Panel, Td } from "@/components/ui/surface";
import { hasPermission } from "@/lib/auth/permissions";
import { listSites } from "@/db/queries/fleet";
import { requirePageUser } from "@/lib/auth/guard";
import { formatLocalTime } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Sites" };

function coord(value: number, pos: string, neg: string) {
  return `${Math.abs(value).toFixed(4)}° ${value >= 0 ? pos : neg}`;
}

export default async function SitesPage() {
  const user = await requirePageUser("sites:read");
  const canManage = hasPermission(user.role, "sites:manage");
  const sites = await listSites();
  const now = new Date();
  return (
    <>
      <PageHeader title="Sites" intro="The farms and houses where doors run. A site's position and time zone decide its sunrise and dusk, and so its door times." />
      <div className={`grid gap-6 ${canManage ? "xl:grid-cols-[minmax(0,1fr)_22rem]" : ""}`}>
      {sites.length === 0 ? (
        <EmptyState title="No sites yet">A technician adds each farm with its coordinates and time zone.</EmptyState>
      ) : (
        <DataTable caption="Sites" headers={["Site", "Position", "Time zone", "Local time", "Contact"]}>
          {sites.map((s) => (
            <tr key={s.id}>
              <Td className="font-medium">{s.name}</Td>
              <Td className="font-mono text-xs tabular-nums">
                {coord(s.latitude, "N", "S")}, {coord(s.longitude, "E", "W")}
              </Td>
              <Td>{s.timeZone}</Td>
              <Td className="font-mono tabular-nums">{formatLocalTime(now, s.timeZone)}</Td>
              <Td>{s.contactName ?? "—"}</Td>
            </tr>
          ))}
        </DataTable>
      )}
      {canManage && (
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Add a site</h2>
          <NewSiteForm />
        </Panel>
      )}
      </div>
    </>
  );
}
