import type { Metadata } from "next";
import { DataTable, EmptyState, PageHeader, Td } from "@/components/ui/surface";
import { listDoorModels } from "@/db/queries/fleet";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Profiles" };

export default async function ProfilesPage() {
  await requirePageUser("profiles:read");
  const models = await listDoorModels();
  return (
    <>
      <PageHeader
        title="Profiles"
        intro="Each door model carries a base parameter profile; sites and single controllers may override parts of it. Below are the door models and the drive trains their profiles are computed from."
      />
      {models.length === 0 ? (
        <EmptyState title="No door models yet">Add a door model with its spool, gearbox and encoder; its base profile starts from those numbers.</EmptyState>
      ) : (
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
      )}
    </>
  );
}
