import type { ReactNode } from "react";
import { ControllerLink, MoreLink } from "./parts";

export type HealthItem = { serial: string; siteName: string; detail: ReactNode };

/**
 * One fleet-health figure: how many controllers it concerns, the rule that puts them there, and the
 * first of them with a link each; "and N more" goes to the controllers list.
 */
export function HealthCard({ id, title, count, unit, rule, items, more, calm, extra }: { id: string; title: string; count: number; unit?: string; rule: ReactNode; items: HealthItem[]; more: number; calm: string; extra?: ReactNode }) {
  const alarm = count > 0;
  return (
    <section aria-labelledby={id} className={`min-w-0 rounded-md border p-4 ${alarm ? "border-straw-500 bg-straw-100/40 dark:border-straw-700 dark:bg-straw-700/10" : "border-loam-200 dark:border-loam-800"}`}>
      <h3 id={id} className="flex items-baseline justify-between gap-2 text-sm font-semibold">
        <span>{title}</span>
        <span className={`text-2xl tabular-nums ${alarm ? "text-straw-700 dark:text-straw-300" : "text-meadow-700 dark:text-meadow-100"}`}>
          {count}
          {unit && <span className="sr-only"> {unit}</span>}
        </span>
      </h3>
      <p className="mt-1 text-xs text-loam-600 dark:text-loam-400">{rule}</p>
      {items.length === 0 ? (
        <p className="mt-3 text-sm text-meadow-700 dark:text-meadow-100">{calm}</p>
      ) : (
        <ul className="mt-3 space-y-1.5">
          {items.map((i) => (
            <li key={i.serial} className="grid grid-cols-[minmax(0,1fr)_auto] items-baseline gap-x-2 text-sm">
              <span className="min-w-0">
                <ControllerLink serial={i.serial} />
                <span className="block truncate text-xs text-loam-600 dark:text-loam-400">{i.siteName}</span>
              </span>
              <span className="whitespace-nowrap tabular-nums">{i.detail}</span>
            </li>
          ))}
        </ul>
      )}
      <MoreLink more={more} href="/controllers" what="controllers" />
      {extra && <p className="mt-2 text-xs text-loam-600 dark:text-loam-400">{extra}</p>}
    </section>
  );
}
