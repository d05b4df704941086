import type { Metadata } from "next";
import { NewProfileForm } from "@/components/profiles/new-profile-form";
import { ProfileList } from "@/components/profiles/profile-list";
import { DataTable, PageHeader, Panel, Td } from "@/components/ui/surface";
import { listDoorModels, listSites } from "@/db/queries/fleet";
import { listSchemaVersions } from "@/db/queries/profiles";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Profiles" };

export default async function ProfilesPage() {
  const user = await requirePageUser("profiles:read");
  const [models, sites, versions] = await Promise.all([listDoorModels(), listSites(), listSchemaVersions()]);
  const canEdit = hasPermission(user.role, "profiles:edit");
  return (
    <>
      <PageHeader
        title="Profiles"
        intro="A door model's base profile holds its parameters; a site overlay changes only what differs at one site. Every save is a revision; only approved revisions ever reach a controller."
      />
      <div className={`grid gap-6 ${canEdit ? "xl:grid-cols-[1fr_24rem]" : ""}`}>
        <div className="space-y-6">
          <ProfileList canEdit={canEdit} />
          <section>
            <h2 className="mb-2 text-lg font-semibold">Door models</h2>
            <DataTable caption="Door models" headers={["Model", "Door (W × travel)", "Spool / cord", "Gearbox", "Encoder", "Motor"]}>
              {models.map((m) => (
                <tr key={m.id}>
                  <Td>
                    <span className="font-medium">{m.name}</span>
                    <span className="block font-mono text-xs text-loam-600 dark:text-loam-400">{m.code}</span>
                  </Td>
                  <Td className="tabular-nums">
                    {m.doorWidthMm} × {m.doorTravelMm} mm
                  </Td>
                  <Td className="tabular-nums">
                    Ø {m.spoolDiameterMm} mm / {m.cordDiameterMm} mm
                  </Td>
                  <Td className="tabular-nums">{m.gearboxRatio} : 1</Td>
                  <Td className="tabular-nums">
                    {m.encoderPulsesPerRev} PPR, {m.encoderDecoding.replace("x", "×")}
                  </Td>
                  <Td className="tabular-nums">{m.motorNoLoadRpm} rpm no-load</Td>
                </tr>
              ))}
            </DataTable>
          </section>
        </div>
        {canEdit && (
          <Panel>
            <h2 className="mb-3 text-lg font-semibold">New profile</h2>
            <NewProfileForm
              doorModels={models.map((m) => ({ value: String(m.id), label: `${m.name} (${m.code})` }))}
              sites={sites.map((s) => ({ value: String(s.id), label: s.name }))}
              versions={versions.map((v) => ({ value: String(v.version), label: `Version ${v.version}` }))}
            />
          </Panel>
        )}
      </div>
    </>
  );
}
