// Edits the Fields view makes to the document: read, set and remove by JSON Pointer, keeping the
// existing key order and putting new keys where the schema lists them.
import { childPointer, cloneJson, getOwn, isPlainObject, setOwn, type JsonObject, type JsonValue } from "@/lib/profiles/json";
import type { ParameterInfo } from "@/lib/profiles/parameter-info";

/** The reference tokens of a pointer, unescaped ("" → []). */
export function pointerTokens(pointer: string): string[] {
  if (pointer === "") return [];
  if (!pointer.startsWith("/")) throw new Error(`not a JSON Pointer: ${pointer}`);
  return pointer
    .slice(1)
    .split("/")
    .map((t) => t.replace(/~1/g, "/").replace(/~0/g, "~"));
}

/** The value at a pointer, or undefined when any step is missing or not an object. */
export function getAt(doc: unknown, pointer: string): JsonValue | undefined {
  let node: unknown = doc;
  for (const token of pointerTokens(pointer)) {
    if (!isPlainObject(node)) return undefined;
    node = getOwn(node, token);
  }
  return node as JsonValue | undefined;
}

/** True when the document itself holds a value at the pointer (not merely inherits it). */
export function hasAt(doc: unknown, pointer: string): boolean {
  return getAt(doc, pointer) !== undefined;
}

/** For each object pointer, its child keys in schema order (from the parameter list's order). */
export function schemaKeyOrder(params: readonly ParameterInfo[]): Map<string, string[]> {
  const order = new Map<string, string[]>();
  for (const p of params) {
    const tokens = pointerTokens(p.path);
    let parent = "";
    for (const token of tokens) {
      const keys = order.get(parent) ?? [];
      if (!keys.includes(token)) keys.push(token);
      order.set(parent, keys);
      parent = childPointer(parent, token);
    }
  }
  return order;
}

// A key the object lacks goes before the first existing key the schema lists after it, else at the end.
function insertOrdered(object: JsonObject, key: string, value: JsonValue, order: readonly string[] | undefined): JsonObject {
  if (Object.hasOwn(object, key) || !order?.includes(key)) {
    const out = { ...object };
    setOwn(out, key, value);
    return out;
  }
  const rank = order.indexOf(key);
  const out: JsonObject = {};
  let placed = false;
  for (const [k, v] of Object.entries(object)) {
    const r = order.indexOf(k);
    if (!placed && r > rank) {
      setOwn(out, key, value);
      placed = true;
    }
    setOwn(out, k, v);
  }
  if (!placed) setOwn(out, key, value);
  return out;
}

/** A copy of the document with the value set at the pointer, creating missing groups on the way. */
export function setAt(doc: JsonObject, pointer: string, value: JsonValue, order?: Map<string, string[]>): JsonObject {
  const tokens = pointerTokens(pointer);
  if (tokens.length === 0) throw new Error("cannot replace the whole document from a field");
  const step = (node: JsonObject, depth: number, at: string): JsonObject => {
    const key = tokens[depth]!;
    const here = childPointer(at, key);
    const next =
      depth === tokens.length - 1
        ? cloneJson(value)
        : step(isPlainObject(getOwn(node, key)) ? (getOwn(node, key) as JsonObject) : {}, depth + 1, here);
    return insertOrdered(node, key, next, order?.get(at));
  };
  return step(doc, 0, "");
}

/**
 * A copy of the document without the pointer's value; groups left empty by the removal go too, so an
 * overlay that inherits everything of a group does not keep an empty `{}` for it.
 */
export function removeAt(doc: JsonObject, pointer: string): JsonObject {
  const tokens = pointerTokens(pointer);
  if (tokens.length === 0) throw new Error("cannot remove the whole document");
  const step = (node: JsonObject, depth: number): JsonObject => {
    const key = tokens[depth]!;
    if (!Object.hasOwn(node, key)) return node;
    const out: JsonObject = {};
    for (const [k, v] of Object.entries(node)) {
      if (k !== key) {
        setOwn(out, k, v);
        continue;
      }
      if (depth === tokens.length - 1) continue;
      if (!isPlainObject(v)) {
        setOwn(out, k, v);
        continue;
      }
      const child = step(v, depth + 1);
      if (Object.keys(child).length > 0) setOwn(out, k, child);
    }
    return out;
  };
  return step(doc, 0);
}

/** The document as the editor stores it: two-space indentation and a final newline. */
export function formatDocument(doc: unknown): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

export type ParsedText = { ok: true; value: unknown } | { ok: false; message: string };

/** JSON.parse without throwing. */
export function parseText(text: string): ParsedText {
  try {
    return { ok: true, value: JSON.parse(text) as unknown };
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
}
