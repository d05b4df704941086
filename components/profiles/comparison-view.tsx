import { Badge, DataTable, Td } from "@/components/ui/surface";
import type { Comparison } from "@/lib/reviews/compare";

function show(value: unknown): string {
  if (value === undefined) return "—";
  return typeof value === "string" ? value : JSON.stringify(value);
}

function percent(r: number | null): string {
  if (r === null) return "";
  const p = r * 100;
  return `${p > 0 ? "+" : ""}${Math.abs(p) < 10 ? p.toFixed(1) : p.toFixed(0)} %`;
}

/** A comparison as a parameter table (safety-relevant rows stand out) and a unified text diff. */
export function ComparisonView({ comparison, layer, comments = [] }: { comparison: Comparison; layer: string; comments?: { path: string; body: string; authorName: string | null }[] }) {
  return (
    <div className="space-y-6">
      {comparison.rows.length === 0 ? (
        <p className="text-sm text-loam-600 dark:text-loam-400">The two documents have the same parameters.</p>
      ) : (
        <DataTable caption="Changed parameters" headers={["Parameter", "Before → after", "Unit", "Change", "Layer", "Safety rules"]}>
          {comparison.rows.map((row) => {
            const here = comments.filter((c) => c.path === row.path);
            return (
              <tr key={row.path} className={row.safety ? "bg-straw-100/60 dark:bg-straw-700/20" : undefined} data-path={row.path}>
                <Td>
                  <span className="font-medium">{row.title ?? row.path}</span>
                  <code className="block font-mono text-xs text-loam-600 dark:text-loam-400">{row.path}</code>
                  {row.safety && (
                    <span className="mt-1 inline-block">
                      <Badge tone="warn">safety-relevant</Badge>
                    </span>
                  )}
                  {here.map((c, i) => (
                    <span key={i} className="mt-1 block rounded bg-dusk-50 px-2 py-1 text-xs dark:bg-dusk-950">
                      {c.authorName}: {c.body}
                    </span>
                  ))}
                </Td>
                <Td className="font-mono text-xs">
                  <span className="text-ember-700 line-through dark:text-ember-100">{show(row.before)}</span> → <span className="text-meadow-700 dark:text-meadow-100">{show(row.after)}</span>
                </Td>
                <Td>{row.unit ?? ""}</Td>
                <Td className="tabular-nums">{row.change === "changed" ? percent(row.relativeChange) : row.change}</Td>
                <Td>{layer}</Td>
                <Td className="font-mono text-xs">{row.rules.join(", ")}</Td>
              </tr>
            );
          })}
        </DataTable>
      )}
      <details>
        <summary className="cursor-pointer text-sm font-medium">Text comparison</summary>
        <pre className="mt-2 overflow-x-auto rounded-lg border border-loam-200 bg-white p-3 font-mono text-xs leading-5 dark:border-loam-800 dark:bg-loam-900" aria-label="Unified diff">
          {comparison.patch.split("\n").map((line, i) => (
            <span
              key={i}
              className={`block ${line.startsWith("+") && !line.startsWith("+++") ? "bg-meadow-100 dark:bg-meadow-700/40" : line.startsWith("-") && !line.startsWith("---") ? "bg-ember-100 dark:bg-ember-700/40" : ""}`}
            >
              {line || " "}
            </span>
          ))}
        </pre>
      </details>
    </div>
  );
}
