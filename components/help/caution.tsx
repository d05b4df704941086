import { CAUTION_POINTS, CAUTION_SHORT, CAUTION_TITLE } from "@/lib/help/caution-text";

/**
 * The trapping caution: the full form at the top of a page, the short form beside a parameter. An
 * aside, not a live region, since it never changes after the page loads.
 */
export function Caution({ short = false }: { short?: boolean }) {
  const frame = "rounded-md border-l-4 border-ember-500 bg-ember-100/50 text-sm text-loam-900 dark:bg-ember-700/25 dark:text-loam-100";
  if (short) {
    return (
      <aside aria-label="Caution" className={`${frame} px-3 py-2`}>
        <span className="font-semibold text-ember-700 dark:text-ember-100">Caution: </span>
        {CAUTION_SHORT}
      </aside>
    );
  }
  return (
    <aside aria-label="Caution" className={`${frame} p-4`}>
      <p className="font-semibold text-ember-700 dark:text-ember-100">
        {CAUTION_TITLE}
      </p>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {CAUTION_POINTS.map((point) => (
          <li key={point}>{point}</li>
        ))}
      </ul>
    </aside>
  );
}
