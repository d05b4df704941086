import type { Metadata } from "next";
import { z } from "zod";
import Link from "next/link";
import { AuditTable } from "@/components/audit/audit-table";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Audit" };

const FILTERS = [
  { value: "", label: "Everything" },
  { value: "user.", label: "People" },
  { value: "profile.", label: "Profiles created" },
  { value: "revision.", label: "Revisions and reviews" },
  { value: "settings.", label: "Settings" },
];

export default async function AuditPage({ searchParams }: { searchParams: Promise<{ action?: string; actor?: string }> }) {
  await requirePageUser("audit:read");
  const params = await searchParams;
  const action = FILTERS.some((f) => f.value === params.action) ? params.action! : "";
  const actor = typeof params.actor === "string" && z.email().safeParse(params.actor).success ? params.actor.slice(0, 191) : "";
  const csv = `/api/v1/audit?format=csv&limit=5000${action ? `&action=${encodeURIComponent(action)}` : ""}${actor ? `&actor=${encodeURIComponent(actor)}` : ""}`;
  return (
    <>
      <PageHeader
        title="Audit"
        intro="Every change to people, profiles and reviews, with who made it and the content hash before and after. Entries are written with the change itself and never edited."
        actions={
          <a href={csv} className={buttonClass("secondary")} download>
            Export CSV
          </a>
        }
      />
      <form method="get" className="mb-4 flex flex-wrap items-end gap-3" aria-label="Filter the audit log">
        <div>
          <label htmlFor="audit-action" className="mb-1 block text-sm font-medium">
            Show
          </label>
          <select id="audit-action" name="action" defaultValue={action} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900">
            {FILTERS.map((f) => (
              <option key={f.value} value={f.value}>
                {f.label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="audit-actor" className="mb-1 block text-sm font-medium">
            By (e-mail)
          </label>
          <input id="audit-actor" name="actor" type="email" defaultValue={actor} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900" />
        </div>
        <button type="submit" className={buttonClass("secondary")}>
          Filter
        </button>
        {(action || actor) && <Link href="/audit">Clear</Link>}
      </form>
      <AuditTable action={action} actor={actor} />
    </>
  );
}
