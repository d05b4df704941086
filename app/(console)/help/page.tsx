import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/help/caution";
import { PageHeader, Panel } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { HELP_SECTIONS } from "@/lib/help/sections";

export const metadata: Metadata = { title: "Help" };

export default async function HelpPage() {
  await requirePageUser("dashboard:read");
  return (
    <>
      <PageHeader
        title="Help"
        intro="How Roostline works, one area a page. The parameter and rule pages are built from the same schemas and rule catalog the editor and the checks use, so they describe what the checks actually do."
      />
      <ul className="grid gap-4 sm:grid-cols-2">
        {HELP_SECTIONS.map((s) => (
          <li key={s.href}>
            <Link href={s.href} className="block h-full text-inherit no-underline hover:no-underline dark:text-inherit">
              <Panel className="h-full transition-colors hover:border-dusk-300 dark:hover:border-dusk-600">
                <h2 className="font-semibold text-dusk-700 dark:text-dusk-200">{s.title}</h2>
                <p className="mt-1 text-sm text-loam-600 dark:text-loam-400">{s.summary}</p>
              </Panel>
            </Link>
          </li>
        ))}
      </ul>
      <div className="mt-6 max-w-3xl">
        <Caution />
      </div>
    </>
  );
}
