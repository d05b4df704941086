import type { Metadata } from "next";
import Link from "next/link";
import { ImportControllersForm } from "@/components/fleet/import-controllers-form";
import { RegisterControllerForm } from "@/components/fleet/register-controller-form";
import { TokenActions } from "@/components/fleet/token-actions";
import { Badge, DataTable, EmptyState, PageHeader, Panel, Td } from "@/components/ui/surface";
import { listControllers } from "@/db/queries/controllers";
import { listDoorModels, listSites } from "@/db/queries/fleet";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Controllers" };

export default async function ControllersPage() {
  const user = await requirePageUser("controllers:read");
  const [controllers, models, sites] = await Promise.all([listControllers(), listDoorModels(), listSites()]);
  const canRegister = hasPermission(user.role, "controllers:manage");
  const canTokens = hasPermission(user.role, "tokens:manage");
  return (
    <>
      <PageHeader title="Controllers" intro="Every installed door controller: its site, door model, firmware and the configuration it reports running. Controllers download only approved, released, signed configurations." />
      <div className={`grid gap-6 ${canRegister ? "xl:grid-cols-[minmax(0,1fr)_22rem]" : ""}`}>
        {controllers.length === 0 ? (
          <EmptyState title="No controllers registered yet">A technician registers each controller by its serial number and receives a device token once.</EmptyState>
        ) : (
          <DataTable caption="Controllers" headers={canTokens ? ["Serial", "Site", "Door model", "Firmware", "Running", "Last seen", "Token"] : ["Serial", "Site", "Door model", "Firmware", "Running", "Last seen"]}>
            {controllers.map((c) => (
              <tr key={c.id}>
                <Td className="font-mono text-xs">
                  <Link href={`/controllers/${encodeURIComponent(c.serial)}`}>{c.serial}</Link>
                </Td>
                <Td>{c.siteName}</Td>
                <Td>{c.doorModelName}</Td>
                <Td>
                  {c.firmwareVersion} <Badge>set {c.parameterSetVersion}</Badge>
                </Td>
                <Td className="font-mono text-xs">{c.runningHash ? c.runningHash.slice(0, 10) : "—"}</Td>
                <Td className="whitespace-nowrap font-mono text-xs">{c.lastSeenAt ? formatUtc(c.lastSeenAt) : "never"}</Td>
                {canTokens && (
                  <Td>
                    <TokenActions serial={c.serial} />
                  </Td>
                )}
              </tr>
            ))}
          </DataTable>
        )}
        {canRegister && (
          <div className="space-y-6">
            <Panel>
              <h2 className="mb-3 text-lg font-semibold">Register a controller</h2>
              <RegisterControllerForm doorModels={models.map((m) => ({ value: String(m.id), label: `${m.name} (${m.code})` }))} sites={sites.map((s) => ({ value: String(s.id), label: s.name }))} />
            </Panel>
            <Panel>
              <h2 className="mb-3 text-lg font-semibold">Import many</h2>
              <ImportControllersForm />
            </Panel>
          </div>
        )}
      </div>
    </>
  );
}
