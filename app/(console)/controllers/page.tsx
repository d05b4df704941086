import type { Metadata } from "next";
import { EmptyState, PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Controllers" };

export default async function ControllersPage() {
  await requirePageUser("controllers:read");
  return (
    <>
      <PageHeader title="Controllers" intro="Every installed door controller: its site, door model, firmware and the configuration it reports running." />
      <EmptyState title="No controllers registered yet">
        A technician registers each controller by its serial number and receives a device token once; the controller then downloads only approved,
        signed configurations.
      </EmptyState>
    </>
  );
}
