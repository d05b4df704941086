import { Badge } from "@/components/ui/surface";
import type { RuleHelp } from "@/lib/help/rule-help";
import { Code, Facts } from "./help-page";

const SEVERITY = {
  error: { tone: "bad", label: "error", text: "At worst an error: it blocks submission and release until fixed. Milder cases may come as warnings." },
  warning: { tone: "warn", label: "warning", text: "A warning: submitting needs an acknowledgement with a reason, which reviewers see." },
} as const;

/** One safety rule: what it checks, why, and what to do when it fires. */
export function RuleEntry({ rule }: { rule: RuleHelp }) {
  const severity = SEVERITY[rule.severity];
  return (
    <article id={rule.anchor} className="scroll-mt-4 rounded-lg border border-loam-200 bg-white p-4 dark:border-loam-800 dark:bg-loam-900">
      <header className="mb-2">
        <div className="flex flex-wrap items-center gap-2">
          <a href={`#${rule.anchor}`} className="font-mono text-sm font-semibold break-all">
            {rule.id}
          </a>
          <Badge tone={severity.tone}>{severity.label}</Badge>
          {rule.trapping && <Badge tone="bad">trapping risk</Badge>}
        </div>
        <h3 className="mt-1 text-base font-semibold">{rule.title}</h3>
      </header>
      <Facts
        items={[
          ["What it checks", rule.checks],
          ["Why it matters", rule.why],
          [
            "When it fires",
            <ol key="actions" className="list-decimal space-y-0.5 pl-5">
              {rule.actions.map((a) => (
                <li key={a}>{a}</li>
              ))}
            </ol>,
          ],
          ["Severity", severity.text],
          [
            "Looks at",
            <ul key="paths" className="space-y-0.5">
              {rule.parameters.map((p) => (
                <li key={p.path}>
                  <a href={`/help/parameters#${p.anchor}`}>
                    <Code>{p.path}</Code>
                  </a>
                  {p.v1Path && p.v1Path !== p.path && <span className="text-xs text-loam-600 dark:text-loam-400"> (version 1: {p.v1Path})</span>}
                </li>
              ))}
            </ul>,
          ],
          ...(rule.inVersionOne ? [] : [["Version 1", "Not checked: version 1 has none of these parameters."] as const]),
        ]}
      />
    </article>
  );
}
