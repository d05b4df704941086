import type { ReactNode } from "react";
import { Badge } from "@/components/ui/surface";
import type { ParameterGroup, ParameterHelp } from "@/lib/help/parameter-help";
import { helpHref } from "@/lib/help/links";
import { Caution } from "./caution";
import { Code, Facts } from "./help-page";

function approvalsText(n: number): string {
  return n === 1 ? "one approval" : `${n} approvals from different reviewers`;
}

/** One parameter: what it does, its limits and default, and who checks it. */
export function ParameterEntry({ p, safetyApprovals }: { p: ParameterHelp; safetyApprovals: number }) {
  const items: [string, ReactNode][] = [["Unit", p.unit ?? "—"]];
  items.push([
    "Allowed",
    p.choices ? (
      <>
        {p.allowed}:{" "}
        {p.choices.map((c, i) => (
          <span key={c}>
            {i > 0 && ", "}
            <Code>{c}</Code>
          </span>
        ))}
      </>
    ) : (
      p.allowed
    ),
  ]);
  items.push(["Default", p.defaultText === null ? "—" : <Code>{p.defaultText}</Code>]);
  if (p.typical) items.push(["Typical", p.typical]);
  items.push(["Safety-relevant", p.safety ? `Yes: a revision that changes it needs ${approvalsText(safetyApprovals)}.` : "No: a change to it alone needs one approval."]);
  if (p.variant) items.push(["Schedule form", <>Only with <Code>{`kind: ${p.variant}`}</Code></>]);
  if (p.rules.length) {
    items.push([
      "Checked by",
      <ul key="rules" className="flex flex-wrap gap-x-3">
        {p.rules.map((r) => (
          <li key={r.id}>
            <a href={helpHref({ ruleId: r.id })} title={r.title}>
              {r.id}
            </a>
          </li>
        ))}
      </ul>,
    ]);
  }
  items.push(["In version 1", p.v1Path ? <Code>{p.v1Path}</Code> : "Not in version 1"]);
  return (
    <article id={p.anchor} className="scroll-mt-4 rounded-lg border border-loam-200 bg-white p-4 dark:border-loam-800 dark:bg-loam-900">
      <header className="mb-2 flex flex-wrap items-baseline gap-x-2 gap-y-1">
        <h3 className="text-base font-semibold">{p.title}</h3>
        {p.safety && <Badge tone="warn">safety-relevant</Badge>}
        <a href={`#${p.anchor}`} className="ml-auto font-mono text-xs break-all" title={`Link to ${p.title}`}>
          {p.path}
        </a>
      </header>
      <p className="mb-3 text-sm">{p.description}</p>
      <Facts items={items} />
      {p.caution && (
        <div className="mt-3">
          <Caution short />
        </div>
      )}
    </article>
  );
}

/** A group of parameters under its heading, as the schema groups them. */
export function ParameterGroupSection({ group, safetyApprovals }: { group: ParameterGroup; safetyApprovals: number }) {
  return (
    <section id={group.anchor} aria-labelledby={`${group.anchor}-title`} className="mt-8 scroll-mt-4">
      <h2 id={`${group.anchor}-title`} className="text-xl font-semibold tracking-tight">
        {group.title}
      </h2>
      {group.intro && <p className="mt-1 max-w-3xl text-sm text-loam-600 dark:text-loam-400">{group.intro}</p>}
      <div className="mt-3 grid items-start gap-4 lg:grid-cols-2">
        {group.parameters.map((p) => (
          <ParameterEntry key={p.anchor} p={p} safetyApprovals={safetyApprovals} />
        ))}
      </div>
    </section>
  );
}
