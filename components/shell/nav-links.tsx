"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { navTourId } from "@/lib/tour/targets";

export type NavLink = { href: string; label: string };

function isActive(pathname: string, href: string) {
  return href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(href + "/");
}

/** The console menu; the server decides which links a role gets. */
export function NavLinks({ items, onNavigate }: { items: NavLink[]; onNavigate?: () => void }) {
  const pathname = usePathname();
  return (
    <ul className="space-y-0.5">
      {items.map((item) => {
        const active = isActive(pathname, item.href);
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              onClick={onNavigate}
              aria-current={active ? "page" : undefined}
              data-tour={navTourId(item.href)}
              className={`block rounded-md px-3 py-2 text-sm font-medium no-underline hover:no-underline ${
                active
                  ? "bg-dusk-100 text-dusk-800 dark:bg-dusk-800 dark:text-dusk-50"
                  : "text-loam-800 hover:bg-loam-100 dark:text-loam-200 dark:hover:bg-loam-800"
              }`}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
