import type React from "react";
import type { ReactNode } from "react";

/** A raised panel. */
export function Panel({ children, className = "" }: { children: ReactNode; className?: string }) {
  return (
    <section className={`rounded-lg border border-loam-200 bg-white p-5 shadow-sm dark:border-loam-800 dark:bg-loam-900 ${className}`}>
      {children}
    </section>
  );
}

/** The heading block at the top of every console page. */
export function PageHeader({ title, intro, actions }: { title: string; intro?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="max-w-3xl">
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        {intro && <p className="mt-1 text-loam-600 dark:text-loam-400">{intro}</p>}
      </div>
      {actions && <div className="flex gap-2">{actions}</div>}
    </header>
  );
}

/** What an empty area shows: what belongs here and how it gets filled. */
export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-loam-200 bg-white/60 px-6 py-10 text-center dark:border-loam-800 dark:bg-loam-900/40">
      <h2 className="text-lg font-semibold">{title}</h2>
      <div className="mx-auto mt-2 max-w-xl text-loam-600 dark:text-loam-400">{children}</div>
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}

type Tone = "neutral" | "good" | "warn" | "bad" | "info";
const TONES: Record<Tone, string> = {
  neutral: "bg-loam-100 text-loam-800 dark:bg-loam-800 dark:text-loam-100",
  good: "bg-meadow-100 text-meadow-700 dark:bg-meadow-700 dark:text-meadow-100",
  warn: "bg-straw-100 text-straw-800 dark:bg-straw-800 dark:text-straw-100",
  bad: "bg-ember-100 text-ember-700 dark:bg-ember-700 dark:text-ember-100",
  info: "bg-dusk-100 text-dusk-700 dark:bg-dusk-700 dark:text-dusk-100",
};

/** A small status label. */
export function Badge({ tone = "neutral", children }: { tone?: Tone; children: ReactNode }) {
  return <span className={`inline-flex items-center whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium ${TONES[tone]}`}>{children}</span>;
}

/** A message block; `role=alert` for errors so screen readers announce them. */
export function Notice({ tone = "info", title, children }: { tone?: Tone; title?: string; children: ReactNode }) {
  const border: Record<Tone, string> = {
    neutral: "border-loam-200",
    good: "border-meadow-500",
    warn: "border-straw-500",
    bad: "border-ember-500",
    info: "border-dusk-400",
  };
  return (
    <div role={tone === "bad" ? "alert" : "status"} className={`rounded-md border-l-4 bg-white p-3 text-sm dark:bg-loam-900 ${border[tone]}`}>
      {title && <p className="font-semibold">{title}</p>}
      <div>{children}</div>
    </div>
  );
}

/** A data table with our styling; columns are passed as header labels. */
export function DataTable({ headers, children, caption }: { headers: string[]; children: ReactNode; caption?: string }) {
  return (
    // Focusable, so a keyboard can scroll a table wider than the screen.
    <div tabIndex={0} role="region" aria-label={caption ?? headers.join(", ")} className="overflow-x-auto rounded-lg border border-loam-200 bg-white dark:border-loam-800 dark:bg-loam-900">
      <table className="w-full text-left text-sm">
        {caption && <caption className="sr-only">{caption}</caption>}
        <thead className="border-b border-loam-200 bg-loam-50 text-xs uppercase tracking-wide text-loam-600 dark:border-loam-800 dark:bg-loam-950 dark:text-loam-400">
          <tr>
            {headers.map((h) => (
              <th key={h} scope="col" className="px-4 py-2.5 font-semibold">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-loam-100 dark:divide-loam-800">{children}</tbody>
      </table>
    </div>
  );
}

export function Td({ children, className = "", ...rest }: { children?: ReactNode; className?: string } & Omit<React.TdHTMLAttributes<HTMLTableCellElement>, "className" | "children">) {
  return (
    <td className={`px-4 py-2.5 align-top ${className}`} {...rest}>
      {children}
    </td>
  );
}
