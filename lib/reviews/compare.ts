// Comparison of two parameter documents: a unified text diff and a parameter table with the
// safety rules each change touches. Pure, so the review page and the API share it.
import { createTwoFilesPatch } from "diff";
import { canonicalJson } from "@/lib/profiles/canonical";
import { diffParams, type DiffRow } from "@/lib/profiles/diff";
import { safetyRulesFor } from "@/lib/profiles/safety";
import type { ParamsVersion } from "@/lib/profiles/schemas";

export type ComparisonRow = DiffRow & { rules: string[] };
export type Comparison = { rows: ComparisonRow[]; patch: string; safetyChanged: boolean };

/** Pretty JSON with sorted keys, so a text diff shows only real changes. */
export function stableText(value: unknown): string {
  return JSON.stringify(JSON.parse(canonicalJson(value)), null, 2) + "\n";
}

/** Compares `before` with `after` (both of `version`); labels name the two sides in the patch. */
export function compareDocuments(before: object, after: object, version: ParamsVersion, labels: { before: string; after: string }): Comparison {
  const rules = safetyRulesFor(version);
  const rows = diffParams(before, after, version).map((row) => ({
    ...row,
    rules: rules.filter((r) => r.paths.some((p) => row.path === p || row.path.startsWith(p + "/") || p.startsWith(row.path + "/"))).map((r) => r.id),
  }));
  const patch = createTwoFilesPatch(labels.before, labels.after, stableText(before), stableText(after), "", "", { context: 3 });
  return { rows, patch, safetyChanged: rows.some((r) => r.safety || r.rules.length > 0) };
}
