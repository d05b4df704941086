// A flat list of a schema's leaf parameters, for form views, comparison tables and hover docs.
import { childPointer, jsonEqual, type JsonValue } from "./json";
import { getSchema, type ParamsVersion } from "./schemas";

export type ParameterType = "integer" | "number" | "string" | "boolean";

export type ParameterInfo = {
  path: string;
  title: string;
  description: string;
  unit: string | null;
  minimum: number | null;
  maximum: number | null;
  default: JsonValue | null;
  safety: boolean;
  type: ParameterType;
  /** The values an enum, a const or a schedule form allows; null when any value of the type will do. */
  allowed: readonly JsonValue[] | null;
  /** The schedule form (its `kind`) this parameter belongs to; null when it applies to every form. */
  variant: string | null;
};

type Node = Record<string, unknown>;

const asNode = (v: unknown): Node => (typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Node) : {});
const str = (v: unknown): string => (typeof v === "string" ? v : "");
const num = (v: unknown): number | null => (typeof v === "number" ? v : null);

function leafInfo(path: string, node: Node, inheritedDefault: unknown, variant: string | null): ParameterInfo {
  const declared = node.default !== undefined ? node.default : inheritedDefault;
  const allowed = Array.isArray(node.enum) ? (node.enum as JsonValue[]) : node.const !== undefined ? [node.const as JsonValue] : null;
  return {
    path,
    title: str(node.title),
    description: str(node.description),
    unit: typeof node.roostlineUnit === "string" ? node.roostlineUnit : null,
    minimum: num(node.minimum),
    maximum: num(node.maximum),
    default: declared === undefined ? null : (declared as JsonValue),
    safety: node.roostlineSafety === true,
    type: (str(node.type) || "string") as ParameterType,
    allowed,
    variant,
  };
}

function discriminatorOf(node: Node): string | null {
  const d = asNode(node.discriminator);
  return typeof d.propertyName === "string" ? d.propertyName : null;
}

function collect(path: string, node: Node, inheritedDefault: unknown, variant: string | null): ParameterInfo[] {
  const tag = discriminatorOf(node);
  if (tag && Array.isArray(node.oneOf)) return collectForms(path, node, tag);
  if (node.type !== "object") return [leafInfo(path, node, inheritedDefault, variant)];
  const defaults = asNode(node.default);
  return Object.entries(asNode(node.properties)).flatMap(([key, child]) =>
    collect(childPointer(path, key), asNode(child), defaults[key], variant),
  );
}

// One entry for the tag listing every form; one for a field every form shares unchanged; otherwise
// one entry per form, marked with that form's tag value.
function collectForms(path: string, node: Node, tag: string): ParameterInfo[] {
  const defaults = asNode(node.default);
  const forms = (node.oneOf as unknown[]).map(asNode);
  const tagPath = childPointer(path, tag);
  const tagNodes = forms.map((f) => asNode(asNode(f.properties)[tag]));
  const values = tagNodes.map((t) => t.const as JsonValue);
  const tagEntry: ParameterInfo = {
    ...leafInfo(tagPath, tagNodes[0] ?? {}, defaults[tag], null),
    title: str(tagNodes[0]?.title) || tag,
    description: tagNodes.map((t) => str(t.description)).join(" "),
    allowed: values,
  };
  const perForm = forms.map((f, i) => {
    const formDefaults = defaults[tag] === values[i] ? defaults : {};
    const props = Object.entries(asNode(f.properties)).filter(([k]) => k !== tag);
    return props.flatMap(([key, child]) =>
      collect(childPointer(path, key), asNode(child), asNode(formDefaults)[key], String(values[i])),
    );
  });
  const all = perForm.flat();
  const shared = (p: ParameterInfo) =>
    perForm.every((list) => list.some((q) => q.path === p.path && jsonEqual(strip(q), strip(p))));
  const out: ParameterInfo[] = [tagEntry];
  for (const p of all) {
    if (!shared(p)) out.push(p);
    else if (!out.some((q) => q.path === p.path)) out.push({ ...p, variant: null });
  }
  return out;
}

function strip(p: ParameterInfo): JsonValue {
  return { ...p, variant: null, default: null } as unknown as JsonValue;
}

const infoCache = new Map<ParamsVersion, readonly ParameterInfo[]>();

/** Every leaf parameter of a version in schema order, with title, unit, limits, default and safety flag. */
export function parameterInfo(version: ParamsVersion): readonly ParameterInfo[] {
  let list = infoCache.get(version);
  if (!list) {
    list = Object.freeze(collect("", getSchema(version).schema, undefined, null));
    infoCache.set(version, list);
  }
  return list;
}

/** The parameter at a path; for a path that differs between schedule forms, the entry for `variant`. */
export function findParameter(version: ParamsVersion, path: string, variant?: string | null): ParameterInfo | undefined {
  const matches = parameterInfo(version).filter((p) => p.path === path);
  return matches.find((p) => p.variant === null || p.variant === variant) ?? matches[0];
}
