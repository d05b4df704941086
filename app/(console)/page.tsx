import type { Metadata } from "next";
import { Suspense } from "react";
import { AreasList } from "@/components/dashboard/areas-list";
import { DoorTimesPanel } from "@/components/dashboard/door-times-panel";
import { FleetHealthPanel } from "@/components/dashboard/fleet-health-panel";
import { PanelSkeleton } from "@/components/dashboard/parts";
import { ReleasesPanel } from "@/components/dashboard/releases-panel";
import { WaitingPanel } from "@/components/dashboard/waiting-panel";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission, ROLE_SUMMARIES } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Overview" };

export default async function OverviewPage() {
  const user = await requirePageUser("dashboard:read");
  const now = new Date();
  const fleet = hasPermission(user.role, "controllers:read");
  // Each panel streams in on its own, so a slow fleet query never holds up the reviews list.
  return (
    <>
      <PageHeader title={`Good to see you, ${user.name.split(" ")[0]}`} intro={ROLE_SUMMARIES[user.role]} />
      <div className="space-y-6">
        <Suspense fallback={<PanelSkeleton title="Waiting for you" />}>
          <WaitingPanel user={user} now={now} />
        </Suspense>
        {fleet && (
          <>
            <Suspense fallback={<PanelSkeleton title="Fleet health" />}>
              <FleetHealthPanel now={now} />
            </Suspense>
            <Suspense fallback={<PanelSkeleton title="Door times today" />}>
              <DoorTimesPanel now={now} />
            </Suspense>
            <Suspense fallback={<PanelSkeleton title="Releases in progress" />}>
              <ReleasesPanel />
            </Suspense>
          </>
        )}
        <AreasList role={user.role} />
      </div>
    </>
  );
}
