// A starting document built from each parameter's schema default.
import { getSchema, type ParamsVersion } from "./schemas";

type Node = { type?: string; default?: unknown; properties?: Record<string, Node>; oneOf?: Node[]; anyOf?: Node[] };

function fromNode(node: Node): unknown {
  if (node.default !== undefined) return structuredClone(node.default);
  if (node.properties) {
    const out: Record<string, unknown> = {};
    for (const [key, child] of Object.entries(node.properties)) {
      const value = fromNode(child);
      if (value !== undefined) out[key] = value;
    }
    return out;
  }
  const first = node.oneOf?.[0] ?? node.anyOf?.[0];
  return first ? fromNode(first) : undefined;
}

/** A full document of a parameter-set version filled with the schema's defaults. */
export function defaultDocument(version: ParamsVersion): Record<string, unknown> {
  return fromNode(getSchema(version).schema as Node) as Record<string, unknown>;
}
