// What an author's open revision needs next, from the same checks a save or submit runs
// (lib/reviews/workflow.ts evaluateProfileContent): schema issues and safety errors block a submit,
// each safety warning needs a reason, and a revision sent back needs another revision.

export type RevisionChecks = { schemaIssues: number; safetyErrors: number; warnings: number };
export type Tone = "bad" | "warn" | "info" | "good";
export type Todo = { rank: number; tone: Tone; status: string; action: string };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The next step for one of the author's revisions; lower `rank` sorts first. Null when it waits on others. */
export function revisionTodo(state: string, checks: RevisionChecks | null): Todo | null {
  if (state === "in_review") return null;
  const sentBack = state === "changes_requested";
  if (checks && checks.schemaIssues > 0) {
    return { rank: 0, tone: "bad", status: plural(checks.schemaIssues, "schema error", "schema errors"), action: "Fix the content" };
  }
  if (checks && checks.safetyErrors > 0) {
    return { rank: 0, tone: "bad", status: plural(checks.safetyErrors, "safety error", "safety errors"), action: "Fix before submitting" };
  }
  if (sentBack) return { rank: 1, tone: "warn", status: "Changes requested", action: "Save a new revision" };
  if (checks && checks.warnings > 0) {
    return { rank: 2, tone: "warn", status: plural(checks.warnings, "warning", "warnings"), action: "Give reasons, then submit" };
  }
  if (!checks) return { rank: 3, tone: "info", status: "Not checked here", action: "Open to check" };
  return { rank: 3, tone: "good", status: "Checks pass", action: "Submit for review" };
}

/** Distinct warning rules, as a submit asks one reason per rule rather than per finding. */
export function countChecks({ schemaIssues, findings }: { schemaIssues: readonly unknown[]; findings: readonly { ruleId: string; severity: string }[] }): RevisionChecks {
  return {
    schemaIssues: schemaIssues.length,
    safetyErrors: findings.filter((f) => f.severity === "error").length,
    warnings: new Set(findings.filter((f) => f.severity === "warning").map((f) => f.ruleId)).size,
  };
}
