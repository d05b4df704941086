import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CalibrationUpload } from "@/components/fleet/calibration-upload";
import { EditControllerForm } from "@/components/fleet/edit-controller-form";
import { listSites } from "@/db/queries/fleet";
import { TokenActions } from "@/components/fleet/token-actions";
import { TrendPlot } from "@/components/fleet/trend-plot";
import { EffectiveTable } from "@/components/profiles/effective-table";
import { Badge, DataTable, Notice, PageHeader, Panel, Td } from "@/components/ui/surface";
import { listCalibrationRuns } from "@/db/queries/calibrations";
import { getControllerBySerial, listCheckIns } from "@/db/queries/controllers";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { contentHash } from "@/lib/profiles/canonical";
import { assignmentFor, effectiveFor } from "@/lib/releases/service";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Controller" };

export default async function ControllerPage({ params }: { params: Promise<{ serial: string }> }) {
  const user = await requirePageUser("controllers:read");
  const serial = decodeURIComponent((await params).serial);
  const controller = await getControllerBySerial({ serial });
  if (!controller) notFound();
  const [release, checkIns, runs] = await Promise.all([assignmentFor(controller), listCheckIns({ controllerId: controller.id, limit: 200 }), listCalibrationRuns({ controllerId: controller.id })]);
  const effective = release ? await effectiveFor(release, controller) : null;
  const assignedHash = effective ? contentHash(effective.values) : null;
  const drift = assignedHash && controller.runningHash && assignedHash !== controller.runningHash;
  const history = [...checkIns].reverse();
  const closePoints = history.filter((c) => c.lastCloseCounts !== null).map((c) => ({ t: c.receivedAt, v: c.lastCloseCounts! }));
  const travelPoints = history.filter((c) => c.lastTravelMs !== null).map((c) => ({ t: c.receivedAt, v: c.lastTravelMs! }));
  const last = checkIns[0];
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/controllers">← Controllers</Link>
      </p>
      <PageHeader title={controller.serial} intro={`Firmware ${controller.firmwareVersion}, parameter set ${controller.parameterSetVersion}. Last seen ${controller.lastSeenAt ? formatUtc(controller.lastSeenAt) : "never"}.`} />
      {drift && <Notice tone="warn" title="Running something other than assigned">It reports {controller.runningHash!.slice(0, 10)}…, assigned is {assignedHash!.slice(0, 10)}…. It may not have polled since the release, or it refused the configuration: see its check-ins.</Notice>}
      <div className="mt-4 grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <Panel>
          <h2 className="mb-2 text-lg font-semibold">Assigned configuration</h2>
          {effective && release ? (
            <>
              <p className="mb-2 text-sm">
                Release #{release.id} at {release.percent} % <Badge tone={drift ? "warn" : "good"}>{drift ? "drift" : controller.runningHash ? "running" : "not yet reported"}</Badge>
              </p>
              <EffectiveTable version={effective.version} merged={effective} />
            </>
          ) : (
            <p className="text-sm text-loam-600 dark:text-loam-400">Nothing released to this controller yet; it keeps the configuration it runs.</p>
          )}
        </Panel>
        <Panel>
          <h2 className="mb-2 text-lg font-semibold">Door health</h2>
          <div className="grid gap-4 sm:grid-cols-2">
            <TrendPlot points={closePoints} label="Close travel counts" unit="counts" />
            <TrendPlot points={travelPoints} label="Travel time" unit="ms" />
          </div>
          <p className="mt-2 text-xs text-loam-600 dark:text-loam-400">A slow rise in close counts or travel time points at a stretching cord or a tiring motor (common practice).</p>
          {last && (
            <p className="mt-2 text-sm">
              {last.doorCycles} cycles, {last.stallEvents} stall events, time fix {last.timeFixAgeS ?? "—"} s old{last.refusedReason ? `; refused: ${last.refusedReason}` : ""}.
            </p>
          )}
        </Panel>
        <Panel>
          <h2 className="mb-2 text-lg font-semibold">Calibration runs</h2>
          {runs.length > 0 && (
            <DataTable caption="Calibration runs" headers={["Run", "File", "By", "Full travel"]}>
              {runs.map((r) => (
                <tr key={r.id}>
                  <Td>#{r.id}</Td>
                  <Td>{r.fileName}</Td>
                  <Td>{r.uploadedByName ?? "—"}</Td>
                  <Td className="tabular-nums">{String((r.analysis as { calibration?: { fullTravelCounts?: number } }).calibration?.fullTravelCounts ?? "—")} counts</Td>
                </tr>
              ))}
            </DataTable>
          )}
          {hasPermission(user.role, "calibrations:upload") && (
            <div className="mt-3">
              <CalibrationUpload serial={controller.serial} canDraft={hasPermission(user.role, "calibrations:upload")} />
            </div>
          )}
        </Panel>
        {hasPermission(user.role, "controllers:manage") && (
          <Panel>
            <h2 className="mb-2 text-lg font-semibold">Place and firmware</h2>
            <EditControllerForm serial={controller.serial} siteId={controller.siteId} firmwareVersion={controller.firmwareVersion} sites={(await listSites()).map((s) => ({ value: String(s.id), label: s.name }))} />
          </Panel>
        )}
        {hasPermission(user.role, "tokens:manage") && (
          <Panel>
            <h2 className="mb-2 text-lg font-semibold">Device token</h2>
            <p className="mb-2 text-sm text-loam-600 dark:text-loam-400">Only a hash is stored. A new token replaces the old one at once; revoking ends access on the next request.</p>
            <TokenActions serial={controller.serial} />
          </Panel>
        )}
      </div>
    </>
  );
}
