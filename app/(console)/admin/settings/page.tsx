import type { Metadata } from "next";
import { PageHeader, Panel } from "@/components/ui/surface";
import { getSafetyApprovals } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { ApprovalsForm } from "./approvals-form";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  await requirePageUser("settings:manage");
  const approvals = await getSafetyApprovals();
  return (
    <>
      <PageHeader title="Settings" intro="Rules that apply to the whole team." />
      <Panel>
        <h2 className="mb-1 text-lg font-semibold">Reviews</h2>
        <p className="mb-4 max-w-2xl text-sm text-loam-600 dark:text-loam-400">
          A change to close travel, the stall check, the travel timeout, homing, the power-up mode or the schedule decides whether a door stops on a bird or shuts the flock
          in at dusk. Such changes need more than one pair of eyes.
        </p>
        <ApprovalsForm current={approvals} />
      </Panel>
    </>
  );
}
