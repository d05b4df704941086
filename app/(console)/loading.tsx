export default function Loading() {
  return (
    <div aria-busy="true" aria-live="polite" className="animate-pulse space-y-4">
      <span className="sr-only">Loading…</span>
      <div className="h-8 w-64 rounded bg-loam-200 dark:bg-loam-800" />
      <div className="h-4 w-96 max-w-full rounded bg-loam-200 dark:bg-loam-800" />
      <div className="grid gap-4 sm:grid-cols-3">
        {[0, 1, 2].map((i) => (
          <div key={i} className="h-28 rounded-lg bg-loam-200 dark:bg-loam-800" />
        ))}
      </div>
    </div>
  );
}
