// One pass over the editor's text: parse, lay the overlay over the values beneath, validate against the
// pinned schema, run the safety rules, and list every problem with the place it points at.
import { childPointer, isPlainObject, type JsonObject } from "@/lib/profiles/json";
import { mergeLayers, type LayerName } from "@/lib/profiles/merge";
import { findParameter } from "@/lib/profiles/parameter-info";
import { checkSafety, type SafetyContext, type SafetyFinding } from "@/lib/profiles/safety";
import { getSchema, validateParams, type ParamsVersion, type ValidationIssue } from "@/lib/profiles/schemas";
import { getAt, hasAt, pointerTokens } from "./document-edits";
import { indexRanges, type RangeIndex } from "./json-pointer-ranges";

export type EditorSafetyContext = Omit<SafetyContext, "now" | "year">;

export type Problem = {
  id: string;
  source: "syntax" | "schema" | "safety";
  severity: "error" | "warning";
  /** Where the problem points: the first of `pointers`; null for a syntax error. */
  pointer: string | null;
  /** Every pointer a marker goes on (a safety finding can name several). */
  pointers: string[];
  /** For a syntax error, the text offset where the JSON breaks. */
  offset?: number;
  /** Mark the key rather than the value (an unknown key). */
  markKey?: boolean;
  /** The parameter's title or the rule's title. */
  title: string;
  message: string;
  ruleId?: string;
  /** For an overlay: the place is not set in this layer but in the values beneath. */
  inherited: boolean;
};

export type DocumentCheck = {
  text: string;
  index: RangeIndex;
  parsed: unknown | null;
  /** What the controller would get: the overlay over the values beneath, or the document itself. */
  effective: unknown | null;
  schemaIssues: ValidationIssue[];
  findings: SafetyFinding[];
  /** Why the safety rules did not run, when they did not. */
  safetySkipped: string | null;
  problems: Problem[];
};

export type CheckInput = {
  version: ParamsVersion;
  layer: LayerName;
  text: string;
  baseValues?: object;
  safetyContext?: EditorSafetyContext;
  now: Date;
};

type Node = Record<string, unknown>;
const asNode = (v: unknown): Node => (typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Node) : {});

/** The schema title of the group or parameter at a pointer, looking through schedule forms. */
export function titleAt(version: ParamsVersion, pointer: string, doc?: unknown): string {
  const kind = getAt(doc, "/schedule/kind");
  const param = findParameter(version, pointer, typeof kind === "string" ? kind : null);
  if (param?.title) return param.title;
  let nodes: Node[] = [getSchema(version).schema];
  for (const token of pointerTokens(pointer)) {
    nodes = nodes.flatMap((n) => [n, ...(Array.isArray(n.oneOf) ? n.oneOf.map(asNode) : [])]).map((n) => asNode(asNode(n.properties)[token]));
  }
  const titled = nodes.find((n) => typeof n.title === "string");
  return typeof titled?.title === "string" ? titled.title : pointer || "Document";
}

/** The values in effect: an overlay laid over the values beneath it, or the document itself. */
export function effectiveValues(input: Pick<CheckInput, "layer" | "baseValues">, parsed: unknown): unknown {
  if (input.layer === "base" || !isPlainObject(input.baseValues) || !isPlainObject(parsed)) return parsed;
  return mergeLayers([
    { layer: "base", values: input.baseValues },
    { layer: input.layer, values: parsed },
  ]).values;
}

function schemaIssuesOf(input: CheckInput, effective: unknown): ValidationIssue[] {
  const issues = validateParams(input.version, effective).issues;
  // With nothing beneath an overlay, missing keys are expected: the lower layers will supply them.
  if (input.layer !== "base" && !input.baseValues) return issues.filter((i) => i.keyword !== "required" && i.keyword !== "discriminator");
  return issues;
}

function runSafety(input: CheckInput, effective: unknown, schemaOk: boolean): { findings: SafetyFinding[]; skipped: string | null } {
  if (input.layer !== "base" && !input.baseValues) return { findings: [], skipped: "The safety rules need the values beneath this overlay." };
  if (!schemaOk) return { findings: [], skipped: "The safety rules run once the schema issues are fixed." };
  try {
    return { findings: checkSafety(input.version, effective, { ...input.safetyContext, now: input.now }), skipped: null };
  } catch (e) {
    return { findings: [], skipped: `The safety rules could not run: ${e instanceof Error ? e.message : String(e)}` };
  }
}

function issuePointer(issue: ValidationIssue): string {
  return issue.property !== undefined ? childPointer(issue.path, issue.property) : issue.path;
}

/** Parses, merges, validates and safety-checks the editor's text, and lists the problems found. */
export function checkDocument(input: CheckInput): DocumentCheck {
  const { text, version, layer } = input;
  const index = indexRanges(text);
  if (!index.ok) {
    const problem: Problem = {
      id: "syntax",
      source: "syntax",
      severity: "error",
      pointer: null,
      pointers: [],
      offset: index.offset,
      title: "Not valid JSON",
      message: index.message,
      inherited: false,
    };
    return { text, index, parsed: null, effective: null, schemaIssues: [], findings: [], safetySkipped: "The text is not valid JSON.", problems: [problem] };
  }
  const parsed = JSON.parse(text) as unknown;
  const effective = effectiveValues(input, parsed);
  const schemaIssues = schemaIssuesOf(input, effective);
  const { findings, skipped } = runSafety(input, effective, schemaIssues.length === 0);
  const inherited = (pointer: string) => layer !== "base" && pointer !== "" && !hasAt(parsed, pointer);
  const problems: Problem[] = [
    ...schemaIssues.map((issue, i): Problem => {
      const pointer = issuePointer(issue);
      return {
        id: `schema-${i}`,
        source: "schema",
        severity: "error",
        pointer,
        pointers: [pointer],
        markKey: issue.keyword === "additionalProperties",
        title: titleAt(version, issue.keyword === "additionalProperties" ? issue.path : pointer, effective),
        message: issue.message,
        inherited: inherited(pointer),
      };
    }),
    ...findings.map((f, i): Problem => {
      const pointer = f.paths[0] ?? "";
      return {
        id: `safety-${i}`,
        source: "safety",
        severity: f.severity,
        pointer,
        pointers: f.paths.length > 0 ? f.paths : [""],
        title: f.title,
        message: f.message,
        ruleId: f.ruleId,
        inherited: f.paths.length > 0 && f.paths.every(inherited),
      };
    }),
  ];
  return { text, index, parsed, effective, schemaIssues, findings, safetySkipped: skipped, problems };
}

/** The overlay-free value beneath a pointer, for "inherited" displays. */
export function inheritedValue(baseValues: object | undefined, pointer: string): unknown {
  return baseValues ? getAt(baseValues as JsonObject, pointer) : undefined;
}
