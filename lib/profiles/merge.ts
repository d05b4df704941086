// Effective configuration from layers: base ← site overlay ← controller overlay.
import { childPointer, cloneJson, getOwn, isPlainObject, leafEntries, setOwn, type JsonObject, type JsonValue } from "./json";

export const LAYERS = ["base", "site", "controller"] as const;
export type LayerName = (typeof LAYERS)[number];

// Typed documents (generated interfaces) have no index signature, so inputs are any object, checked at run time.
export type LayerInput = { layer: LayerName; values: object };
export type MergeResult = { values: JsonObject; provenance: Record<string, LayerName> };

/** The key that tells an object's forms apart (a schedule's `kind`). */
export const FORM_TAG = "kind";

// Merging fields of one schedule form into another would leave a mix neither schema allows
// (fixed times next to sun offsets), so a change of form replaces the whole object.
function formChanges(current: JsonObject, overlay: JsonObject): boolean {
  return Object.hasOwn(overlay, FORM_TAG) && getOwn(overlay, FORM_TAG) !== getOwn(current, FORM_TAG);
}

function forget(provenance: Record<string, LayerName>, path: string): void {
  for (const key of Object.keys(provenance)) {
    if (key === path || key.startsWith(`${path}/`)) delete provenance[key];
  }
}

function mergeInto(target: JsonObject, overlay: JsonObject, path: string, layer: LayerName, provenance: Record<string, LayerName>): void {
  for (const [key, value] of Object.entries(overlay)) {
    const here = childPointer(path, key);
    const current = getOwn(target, key);
    if (isPlainObject(value) && isPlainObject(current) && !formChanges(current, value)) {
      mergeInto(current, value, here, layer, provenance);
      continue;
    }
    setOwn(target, key, cloneJson(value as JsonValue));
    forget(provenance, here);
    for (const [leaf] of leafEntries(value, here)) provenance[leaf] = layer;
  }
}

function checkOrder(layers: readonly LayerInput[]): void {
  if (layers[0]?.layer !== "base") throw new Error("the first layer must be the base profile");
  for (let i = 1; i < layers.length; i++) {
    const prev = LAYERS.indexOf(layers[i - 1]!.layer);
    const next = LAYERS.indexOf(layers[i]!.layer);
    if (next <= prev) {
      throw new Error(`layers must come in the order ${LAYERS.join(" ← ")}, each at most once; got ${layers.map((l) => l.layer).join(", ")}`);
    }
  }
}

/**
 * Deep-merges overlays (deep partial objects) over the base: objects merge key by key, arrays and other
 * values replace, and an object whose `kind` changes is replaced whole. Provenance names the layer that
 * set each leaf of the result.
 */
export function mergeLayers(layers: readonly LayerInput[]): MergeResult {
  checkOrder(layers);
  const values: JsonObject = {};
  const provenance: Record<string, LayerName> = {};
  for (const { layer, values: overlay } of layers) {
    if (!isPlainObject(overlay)) throw new Error(`the ${layer} layer must be an object`);
    mergeInto(values, overlay, "", layer, provenance);
  }
  return { values, provenance: sortKeys(provenance) };
}

function sortKeys<T>(record: Record<string, T>): Record<string, T> {
  return Object.fromEntries(Object.entries(record).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}
