// Leaf-by-leaf comparison of two parameter documents (or overlays) of one version, for review tables.
import { getOwn, isPlainObject, jsonEqual, leafEntries, type JsonObject, type JsonValue } from "./json";
import { FORM_TAG } from "./merge";
import { findParameter } from "./parameter-info";
import type { ParamsVersion } from "./schemas";

export type DiffChange = "added" | "removed" | "changed";

export type DiffRow = {
  path: string;
  change: DiffChange;
  /** Absent when the leaf was added. */
  before?: JsonValue;
  /** Absent when the leaf was removed. */
  after?: JsonValue;
  title: string | null;
  unit: string | null;
  /** (after − before) / |before| for two numbers with before ≠ 0; otherwise null. */
  relativeChange: number | null;
  safety: boolean;
};

function scheduleKind(document: JsonObject): string | null {
  const schedule = getOwn(document, "schedule");
  const kind = isPlainObject(schedule) ? getOwn(schedule, FORM_TAG) : undefined;
  return typeof kind === "string" ? kind : null;
}

function relative(before: JsonValue | undefined, after: JsonValue | undefined): number | null {
  if (typeof before !== "number" || typeof after !== "number" || before === 0) return null;
  return (after - before) / Math.abs(before);
}

/** Changed, added and removed leaves between two documents, sorted by path, with unit and safety flag. */
export function diffParams(before: object, after: object, version: ParamsVersion): DiffRow[] {
  if (!isPlainObject(before) || !isPlainObject(after)) throw new Error("diffParams compares two objects");
  const left = new Map(leafEntries(before));
  const right = new Map(leafEntries(after));
  const paths = [...new Set([...left.keys(), ...right.keys()])].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const rows: DiffRow[] = [];
  for (const path of paths) {
    const b = left.get(path);
    const a = right.get(path);
    const inBefore = left.has(path);
    const inAfter = right.has(path);
    if (inBefore && inAfter && jsonEqual(a, b)) continue;
    // A leaf that only one schedule form has is described by the document that holds it.
    const info = findParameter(version, path, scheduleKind(inAfter ? after : before));
    rows.push({
      path,
      change: !inBefore ? "added" : !inAfter ? "removed" : "changed",
      ...(inBefore ? { before: b } : {}),
      ...(inAfter ? { after: a } : {}),
      title: info?.title ?? null,
      unit: info?.unit ?? null,
      relativeChange: relative(b, a),
      safety: info?.safety ?? false,
    });
  }
  return rows;
}

/** True when any row touches a safety-relevant parameter: such a change needs a second reviewer's care. */
export function touchesSafety(rows: readonly DiffRow[]): boolean {
  return rows.some((r) => r.safety);
}
