import Link from "next/link";
import type { ReactNode } from "react";
import { PageHeader } from "@/components/ui/surface";

export type TocItem = { id: string; label: string };

/** The top of a help page: the way back to the index, the heading and a short table of contents. */
export function HelpPageHeader({ title, intro, toc }: { title: string; intro: ReactNode; toc: readonly TocItem[] }) {
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/help">← Help</Link>
      </p>
      <PageHeader title={title} intro={intro} />
      {toc.length > 0 && (
        <nav aria-label="On this page" className="mb-6 rounded-lg border border-loam-200 bg-white px-4 py-3 text-sm dark:border-loam-800 dark:bg-loam-900">
          <p className="mb-1 text-xs font-semibold uppercase tracking-wide text-loam-600 dark:text-loam-400">On this page</p>
          <ol className="flex flex-wrap gap-x-4 gap-y-1">
            {toc.map((t) => (
              <li key={t.id}>
                <a href={`#${t.id}`}>{t.label}</a>
              </li>
            ))}
          </ol>
        </nav>
      )}
    </>
  );
}

/** One titled part of a help page; the id is its anchor and its table-of-contents target. */
export function HelpSection({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="mt-8 scroll-mt-4">
      <h2 id={`${id}-title`} className="mb-3 text-xl font-semibold tracking-tight">
        {title}
      </h2>
      <div className="max-w-3xl space-y-3 text-[0.95rem] leading-relaxed">{children}</div>
    </section>
  );
}

/** Terms and their meanings as a definition list: stacked on a phone, two columns from small screens up. */
export function Facts({ items, className = "" }: { items: readonly (readonly [string, ReactNode])[]; className?: string }) {
  return (
    <dl className={`grid grid-cols-1 gap-x-4 gap-y-1 text-sm sm:grid-cols-[10rem_minmax(0,1fr)] ${className}`}>
      {items.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="pt-1 font-medium text-loam-600 sm:pt-0 dark:text-loam-400">{term}</dt>
          <dd className="min-w-0 break-words">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Text with `backtick` spans shown as code, as the API descriptions write them. */
export function CodeText({ text }: { text: string }) {
  const parts = text.split("`");
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <code key={i} className="rounded bg-loam-100 px-1 font-mono text-[0.85em] dark:bg-loam-800">
            {part}
          </code>
        ) : (
          part
        ),
      )}
    </>
  );
}

/** A value as code, for parameter names, paths and literal values. */
export function Code({ children }: { children: ReactNode }) {
  return <code className="rounded bg-loam-100 px-1 font-mono text-[0.85em] break-all dark:bg-loam-800">{children}</code>;
}
