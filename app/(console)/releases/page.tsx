import type { Metadata } from "next";
import Link from "next/link";
import { ReleaseControls } from "@/components/fleet/release-controls";
import { Badge, DataTable, EmptyState, PageHeader, Td } from "@/components/ui/surface";
import { listReleases } from "@/db/queries/releases";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { adoptionOf } from "@/lib/releases/adoption";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Releases" };

const TARGET = { door_model: "every site", site: "one site", controllers: "listed controllers" } as const;

export default async function ReleasesPage() {
  const user = await requirePageUser("controllers:read");
  const releases = await listReleases({ limit: 50 });
  const adoption = await Promise.all(releases.map((r) => (r.release.state === "rolled_back" ? null : adoptionOf(r.release))));
  const canManage = hasPermission(user.role, "releases:manage");
  return (
    <>
      <PageHeader title="Releases" intro="Which approved revision goes to which controllers, in stages. A controller's stage comes from a stable hash of its serial, so widening only ever adds controllers." />
      {releases.length === 0 ? (
        <EmptyState title="Nothing released yet">An admin releases an approved base profile from its profile page, first to a share of the target.</EmptyState>
      ) : (
        <DataTable caption="Releases" headers={canManage ? ["Release", "Profile", "Target", "Stage", "Adoption", "State", "Actions"] : ["Release", "Profile", "Target", "Stage", "Adoption", "State"]}>
          {releases.map(({ release: r, profileName, revisionNumber }, i) => {
            const a = adoption[i];
            return (
              <tr key={r.id}>
                <Td>
                  #{r.id}
                  <span className="block font-mono text-xs text-loam-600 dark:text-loam-400">{formatUtc(r.createdAt)}</span>
                </Td>
                <Td>
                  {profileName} r{revisionNumber}
                  {r.note && <span className="block text-xs text-loam-600 dark:text-loam-400">{r.note}</span>}
                </Td>
                <Td>{TARGET[r.targetKind]}</Td>
                <Td className="tabular-nums">{r.percent} %</Td>
                <Td className="tabular-nums" data-testid={`adoption-${r.id}`}>
                  {a ? (
                    <>
                      {a.running} of {a.staged} running
                      <span className="block text-xs text-loam-600 dark:text-loam-400">{a.target} in target</span>
                      {a.history.length > 0 && (
                        <span className="block text-xs text-loam-600 dark:text-loam-400" title="Controllers reporting this release's configuration, per day (UTC)">
                          {a.history.map((h) => `${h.day.slice(5)}: ${h.controllers}`).join(" · ")}
                        </span>
                      )}
                    </>
                  ) : (
                    "—"
                  )}
                </Td>
                <Td>
                  <Badge tone={r.state === "active" ? "good" : r.state === "paused" ? "warn" : "neutral"}>{r.state.replace("_", " ")}</Badge>
                </Td>
                {canManage && (
                  <Td>
                    <ReleaseControls releaseId={r.id} percent={r.percent} state={r.state} inTarget={a?.target} />
                  </Td>
                )}
              </tr>
            );
          })}
        </DataTable>
      )}
      <p className="mt-4 text-sm">
        Controllers verify each configuration with the <Link href="/api/v1/device/public-key">published Ed25519 key</Link>.
      </p>
    </>
  );
}
