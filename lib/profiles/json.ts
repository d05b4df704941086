// Plain JSON values and JSON Pointer paths (RFC 6901), shared by merge, diff and migration.

export type JsonPrimitive = string | number | boolean | null;
export type JsonValue = JsonPrimitive | JsonValue[] | JsonObject;
export type JsonObject = { [key: string]: JsonValue };

/** True for a plain object (not an array, not null, not a class instance such as Date). */
export function isPlainObject(value: unknown): value is JsonObject {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return false;
  const proto = Object.getPrototypeOf(value);
  return proto === Object.prototype || proto === null;
}

/** One JSON Pointer reference token, escaped ("~" → "~0", "/" → "~1"). */
export function escapePointerToken(key: string): string {
  return key.replace(/~/g, "~0").replace(/\//g, "~1");
}

/** The parent pointer joined with one more key. */
export function childPointer(parent: string, key: string): string {
  return `${parent}/${escapePointerToken(key)}`;
}

/** Own-property read that never reaches the prototype (a "__proto__" key in parsed JSON is data). */
export function getOwn(object: JsonObject, key: string): JsonValue | undefined {
  return Object.hasOwn(object, key) ? object[key] : undefined;
}

/** Own-property write; plain assignment of "__proto__" would replace the prototype instead. */
export function setOwn(object: JsonObject, key: string, value: JsonValue): void {
  Object.defineProperty(object, key, { value, enumerable: true, writable: true, configurable: true });
}

/** A deep copy of a JSON value, so merged or migrated results never share objects with their inputs. */
export function cloneJson<T extends JsonValue>(value: T): T {
  if (Array.isArray(value)) return value.map((v) => cloneJson(v)) as T;
  if (isPlainObject(value)) {
    const out: JsonObject = {};
    for (const [k, v] of Object.entries(value)) setOwn(out, k, cloneJson(v));
    return out as T;
  }
  return value;
}

/**
 * Every leaf of a JSON value with its pointer. Arrays are leaves (they are replaced whole, never merged);
 * an empty object has no leaves.
 */
export function leafEntries(value: JsonValue, path = ""): [string, JsonValue][] {
  if (!isPlainObject(value)) return [[path, value]];
  return Object.entries(value).flatMap(([k, v]) => leafEntries(v, childPointer(path, k)));
}

/** Structural equality of two JSON values (key order ignored). */
export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => jsonEqual(v, b[i]));
  if (isPlainObject(a) && isPlainObject(b)) {
    const ka = Object.keys(a);
    if (ka.length !== Object.keys(b).length) return false;
    return ka.every((k) => Object.hasOwn(b, k) && jsonEqual(a[k], b[k]));
  }
  return false;
}
