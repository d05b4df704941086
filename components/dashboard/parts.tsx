import Link from "next/link";
import type { ReactNode } from "react";
import { Panel } from "@/components/ui/surface";

/** A dashboard panel with its heading (h2) and an optional link on the right. */
export function DashPanel({ id, title, intro, link, children }: { id: string; title: string; intro?: ReactNode; link?: { href: string; label: string }; children: ReactNode }) {
  return (
    <Panel className="min-w-0">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 id={id} className="text-lg font-semibold">
          {title}
        </h2>
        {link && (
          <Link href={link.href} className="text-sm">
            {link.label}
          </Link>
        )}
      </div>
      {intro && <p className="-mt-1 mb-3 text-sm text-loam-600 dark:text-loam-400">{intro}</p>}
      {children}
    </Panel>
  );
}

/** What a panel shows while its data streams in. */
export function PanelSkeleton({ title }: { title: string }) {
  return (
    <Panel className="min-w-0">
      <h2 className="mb-3 text-lg font-semibold">{title}</h2>
      <div aria-hidden className="space-y-2">
        <div className="h-4 w-2/3 animate-pulse rounded bg-loam-100 dark:bg-loam-800" />
        <div className="h-4 w-1/2 animate-pulse rounded bg-loam-100 dark:bg-loam-800" />
      </div>
      <p className="sr-only" role="status">
        Loading {title.toLowerCase()}…
      </p>
    </Panel>
  );
}

/** "and 12 more" under a capped list, linking to where the whole list lives. */
export function MoreLink({ more, href, what }: { more: number; href: string; what: string }) {
  if (more <= 0) return null;
  return (
    <p className="mt-2 text-sm">
      <Link href={href}>
        and {more} more {what}
      </Link>
    </p>
  );
}

/** A link to a controller's page by serial. */
export function ControllerLink({ serial }: { serial: string }) {
  return (
    <Link href={`/controllers/${encodeURIComponent(serial)}`} className="font-mono text-sm">
      {serial}
    </Link>
  );
}

/** Secondary text under or beside a row's main text. */
export function Quiet({ children }: { children: ReactNode }) {
  return <span className="text-sm text-loam-600 dark:text-loam-400">{children}</span>;
}
