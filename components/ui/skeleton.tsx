import type { ReactNode } from "react";

/** A grey placeholder block; it pulses only for people who have not asked for reduced motion. */
export function Skeleton({ className = "" }: { className?: string }) {
  return <div aria-hidden="true" className={`rounded-md bg-loam-100 motion-safe:animate-pulse dark:bg-loam-800 ${className}`} />;
}

/** A loading page: one announcement for screen readers, the placeholder shapes hidden from them. */
export function SkeletonPage({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div role="status" aria-live="polite">
      <span className="sr-only">{label}</span>
      <div aria-hidden="true">{children}</div>
    </div>
  );
}

/** Stands in for PageHeader: a title bar and an intro line. */
export function SkeletonHeader({ action = false }: { action?: boolean }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="w-full max-w-3xl space-y-2">
        <Skeleton className="h-8 w-48" />
        <Skeleton className="h-4 w-full max-w-xl" />
        <Skeleton className="h-4 w-2/3 max-w-md" />
      </div>
      {action && <Skeleton className="h-9 w-32" />}
    </div>
  );
}

/** Stands in for DataTable: a header row and a few body rows. */
export function SkeletonTable({ rows = 6, columns = 4 }: { rows?: number; columns?: number }) {
  const cols = Array.from({ length: columns }, (_, i) => i);
  return (
    <div className="overflow-hidden rounded-lg border border-loam-200 bg-white dark:border-loam-800 dark:bg-loam-900">
      <div className="flex gap-4 border-b border-loam-200 bg-loam-50 px-4 py-3 dark:border-loam-800 dark:bg-loam-950">
        {cols.map((c) => (
          <Skeleton key={c} className="h-3 flex-1" />
        ))}
      </div>
      <div className="divide-y divide-loam-100 dark:divide-loam-800">
        {Array.from({ length: rows }, (_, r) => (
          <div key={r} className="flex gap-4 px-4 py-3">
            {cols.map((c) => (
              <Skeleton key={c} className={`h-4 flex-1 ${c === 0 ? "max-w-[10rem]" : ""}`} />
            ))}
          </div>
        ))}
      </div>
    </div>
  );
}

/** Stands in for a Panel with a heading and a few lines or fields. */
export function SkeletonPanel({ lines = 4, fields = false }: { lines?: number; fields?: boolean }) {
  return (
    <div className="rounded-lg border border-loam-200 bg-white p-5 shadow-sm dark:border-loam-800 dark:bg-loam-900">
      <Skeleton className="mb-4 h-5 w-40" />
      <div className="space-y-3">
        {Array.from({ length: lines }, (_, i) =>
          fields ? (
            <div key={i} className="space-y-1.5">
              <Skeleton className="h-3 w-24" />
              <Skeleton className="h-9 w-full" />
            </div>
          ) : (
            <Skeleton key={i} className={`h-4 ${i % 3 === 2 ? "w-1/2" : "w-full"}`} />
          ),
        )}
      </div>
    </div>
  );
}

/** Stands in for a row of filter fields above a table. */
export function SkeletonFilters({ count = 3 }: { count?: number }) {
  return (
    <div className="mb-4 flex flex-wrap items-end gap-3">
      {Array.from({ length: count }, (_, i) => (
        <div key={i} className="space-y-1.5">
          <Skeleton className="h-3 w-20" />
          <Skeleton className="h-8 w-40" />
        </div>
      ))}
    </div>
  );
}
