import Link from "next/link";
import { navFor } from "@/lib/nav";

/** The areas this role may open, as one compact line of links. */
export function AreasList({ role }: { role: string }) {
  const areas = navFor(role).filter((n) => n.href !== "/");
  return (
    <nav aria-label="Your areas" className="text-sm">
      <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-loam-600 dark:text-loam-400">Your areas</h2>
      <ul className="flex flex-wrap gap-2">
        {areas.map((a) => (
          <li key={a.href}>
            <Link href={a.href} title={a.description} className="inline-block rounded-md border border-loam-200 bg-white px-3 py-1.5 font-medium no-underline hover:border-dusk-400 hover:no-underline dark:border-loam-800 dark:bg-loam-900">
              {a.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
