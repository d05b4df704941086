import type { Metadata } from "next";
import { ImportControllersForm } from "@/components/fleet/import-controllers-form";
import { RegisterControllerForm } from "@/components/fleet/register-controller-form";
import { ControllerList } from "@/components/fleet/controller-list";
import { PageHeader, Panel } from "@/components/ui/surface";
import { listDoorModels, listSites } from "@/db/queries/fleet";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Controllers" };

export default async function ControllersPage() {
  const user = await requirePageUser("controllers:read");
  const [models, sites] = await Promise.all([listDoorModels(), listSites()]);
  const canRegister = hasPermission(user.role, "controllers:manage");
  return (
    <>
      <PageHeader title="Controllers" intro="Every installed door controller: its site, door model, firmware and the configuration it reports running. Controllers download only approved, released, signed configurations." />
      <div className={`grid gap-6 ${canRegister ? "xl:grid-cols-[minmax(0,1fr)_22rem]" : ""}`}>
        <ControllerList />
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
