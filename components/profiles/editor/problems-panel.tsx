"use client";
// The list of everything wrong with the document: JSON syntax, schema issues, safety findings. Choosing
// one moves to it in the current view.
import type { Problem } from "./check-document";
import { SeverityBadge } from "./editor-parts";

export type ProblemsPanelProps = {
  problems: readonly Problem[];
  safetySkipped: string | null;
  /** The text has changed since the last check. */
  pending: boolean;
  overlay: boolean;
  headingId: string;
  onSelect: (problem: Problem) => void;
};

function count(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** A one-line account of the problems, announced politely as it changes. */
export function problemSummary(problems: readonly Problem[]): string {
  const syntax = problems.some((p) => p.source === "syntax");
  if (syntax) return "The text is not valid JSON.";
  const schema = problems.filter((p) => p.source === "schema").length;
  const errors = problems.filter((p) => p.source === "safety" && p.severity === "error").length;
  const warnings = problems.filter((p) => p.source === "safety" && p.severity === "warning").length;
  if (schema + errors + warnings === 0) return "No schema issues and no safety findings.";
  const parts = [schema && count(schema, "schema issue"), errors && count(errors, "safety error"), warnings && count(warnings, "safety warning")];
  return `${parts.filter(Boolean).join(", ")}.`;
}

function Item({ problem, overlay, onSelect }: { problem: Problem; overlay: boolean; onSelect: (p: Problem) => void }) {
  return (
    <li>
      <button
        type="button"
        onClick={() => onSelect(problem)}
        className="w-full rounded-md px-2 py-2 text-left text-sm hover:bg-loam-100 dark:hover:bg-loam-800"
      >
        <span className="flex flex-wrap items-center gap-1.5">
          <SeverityBadge severity={problem.severity} />
          <span className="font-medium">{problem.title}</span>
        </span>
        <span className="mt-0.5 block text-loam-800 dark:text-loam-100">{problem.message}</span>
        <span className="mt-0.5 block text-xs text-loam-600 dark:text-loam-400">
          {problem.pointer !== null && <code>{problem.pointer || "/"}</code>}
          {problem.ruleId && <span> · rule {problem.ruleId}</span>}
          {overlay && problem.inherited && <span> · set beneath this layer</span>}
        </span>
      </button>
    </li>
  );
}

function Section({ title, problems, overlay, onSelect }: { title: string; problems: readonly Problem[]; overlay: boolean; onSelect: (p: Problem) => void }) {
  if (problems.length === 0) return null;
  return (
    <div>
      <h3 className="px-2 text-xs font-semibold uppercase tracking-wide text-loam-600 dark:text-loam-400">
        {title} ({problems.length})
      </h3>
      <ul className="mt-1 space-y-0.5">
        {problems.map((p) => (
          <Item key={p.id} problem={p} overlay={overlay} onSelect={onSelect} />
        ))}
      </ul>
    </div>
  );
}

/** Syntax, schema and safety problems, each a button that moves to its place. */
export function ProblemsPanel({ problems, safetySkipped, pending, overlay, headingId, onSelect }: ProblemsPanelProps) {
  const safety = problems.filter((p) => p.source === "safety");
  return (
    <div className="space-y-3">
      <div>
        <h2 id={headingId} tabIndex={-1} className="text-base font-semibold">
          Problems
        </h2>
        <p aria-live="polite" className="text-sm text-loam-600 dark:text-loam-400">
          {pending ? "Checking…" : problemSummary(problems)}
        </p>
        {overlay && <p className="mt-1 text-xs text-loam-600 dark:text-loam-400">Checked on this layer laid over the values beneath it.</p>}
      </div>
      <Section title="JSON" problems={problems.filter((p) => p.source === "syntax")} overlay={overlay} onSelect={onSelect} />
      <Section title="Schema" problems={problems.filter((p) => p.source === "schema")} overlay={overlay} onSelect={onSelect} />
      <Section title="Safety rules" problems={safety} overlay={overlay} onSelect={onSelect} />
      {safetySkipped && <p className="px-2 text-sm text-loam-600 dark:text-loam-400">{safetySkipped}</p>}
    </div>
  );
}
