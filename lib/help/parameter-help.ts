// What the parameters help page shows, built from the JSON Schemas, the parameter catalog and the
// safety-rule catalog, so the page cannot disagree with what the editor and the checks use.
import type { JsonValue } from "@/lib/profiles/json";
import { parameterInfo, type ParameterInfo } from "@/lib/profiles/parameter-info";
import { SAFETY_RULES } from "@/lib/profiles/safety/rules";
import { num } from "@/lib/profiles/safety/format";
import { v2PathToV1 } from "@/lib/profiles/safety/paths";
import { getSchema, type ParamsVersion } from "@/lib/profiles/schemas";
import { CAUTION_PATHS } from "./caution-text";
import { parameterAnchor } from "./links";
import { TYPICAL_VALUES } from "./typical-values";

export type ParameterHelp = {
  path: string;
  anchor: string;
  title: string;
  description: string;
  unit: string | null;
  /** The allowed values in words, and the exact choices when the schema lists them. */
  allowed: string;
  choices: string[] | null;
  defaultText: string | null;
  typical: string | null;
  safety: boolean;
  caution: boolean;
  /** The schedule form this parameter belongs to, null when it applies to every form. */
  variant: string | null;
  rules: { id: string; title: string }[];
  v1Path: string | null;
};

/** `anchor` is "param-<id>", so a link to a whole object ("/schedule") lands on its group. */
export type ParameterGroup = { id: string; anchor: string; title: string; intro: string; parameters: ParameterHelp[] };

type Node = Record<string, unknown>;
const asNode = (v: unknown): Node => (typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Node) : {});
const props = (n: Node): Node => asNode(n.properties);

// Top-level leaves are placed in groups of our own; the schema's own objects (stall, schedule,
// clock) are groups under their schema titles. A leaf not listed here lands in "other".
const LEAF_GROUP: Readonly<Record<string, string>> = {
  parameterSetVersion: "document",
  closeTravelCounts: "travel",
  openSensorActiveLevel: "travel",
  travelTimeoutMs: "travel",
  homeOnPowerUp: "power",
  powerUpMode: "power",
  debounceMs: "inputs",
  timeZone: "clock",
  backlightTimeoutS: "display",
  checkInIntervalS: "display",
};

const OWN_GROUPS: Readonly<Record<string, { title: string; intro: string }>> = {
  document: { title: "Document", intro: "Which layout the rest of the document follows." },
  travel: { title: "Travel and end stops", intro: "How far the door moves, how the open end is found, and how long one movement may take." },
  power: { title: "After a power cut", intro: "What the door does when power returns." },
  inputs: { title: "Buttons and contacts", intro: "How the controller reads its buttons and contact inputs." },
  clock: { title: "Clock and time zone", intro: "The site's time zone sets the local clock that fixed times and the display follow." },
  display: { title: "Display and check-in", intro: "The controller's display and its reports to the server." },
  other: { title: "Other parameters", intro: "Parameters not yet placed in a group here." },
};

const GROUP_ORDER = ["document", "travel", "stall", "power", "inputs", "schedule", "clock", "display"];

const TIME_OF_DAY = "^([01][0-9]|2[0-3]):[0-5][0-9]$";

/** The schema node of a leaf; inside a schedule form, the form `variant` names (or the first that has the key). */
function nodeAt(version: ParamsVersion, path: string, variant: string | null): Node {
  let node = asNode(getSchema(version).schema);
  for (const key of path.split("/").slice(1)) {
    if (Array.isArray(node.oneOf)) {
      const forms = node.oneOf.map(asNode);
      const tag = String(asNode(node.discriminator).propertyName ?? "");
      const form = forms.find((f) => key in props(f) && variant !== null && asNode(props(f)[tag]).const === variant) ?? forms.find((f) => key in props(f));
      node = asNode(form ? props(form)[key] : undefined);
    } else {
      node = asNode(props(node)[key]);
    }
  }
  return node;
}

const show = (v: JsonValue): string => (typeof v === "string" ? v : JSON.stringify(v));
const withUnit = (value: string, unit: string | null) => (unit ? `${value} ${unit}` : value);

function formatValue(value: JsonValue, p: ParameterInfo): string {
  if (typeof value === "boolean") return value ? "true (on)" : "false (off)";
  if (typeof value === "number") return withUnit(num(value, 3), p.unit);
  return show(value);
}

function allowedOf(p: ParameterInfo, node: Node): { allowed: string; choices: string[] | null } {
  if (p.allowed) {
    const choices = p.allowed.map(show);
    return { allowed: choices.length === 1 ? "Always this value" : "One of these", choices };
  }
  if (p.type === "boolean") return { allowed: "true (on) or false (off)", choices: null };
  if (p.type === "integer" || p.type === "number") {
    const kind = p.type === "integer" ? "Whole numbers" : "Numbers";
    if (p.minimum !== null && p.maximum !== null) return { allowed: `${kind} from ${num(p.minimum, 3)} to ${withUnit(num(p.maximum, 3), p.unit)}`, choices: null };
    if (p.minimum !== null) return { allowed: `${kind} from ${withUnit(num(p.minimum, 3), p.unit)}`, choices: null };
    if (p.maximum !== null) return { allowed: `${kind} up to ${withUnit(num(p.maximum, 3), p.unit)}`, choices: null };
    return { allowed: `Any ${kind.toLowerCase().replace(/s$/, "")}`, choices: null };
  }
  if (node.pattern === TIME_OF_DAY) return { allowed: "A local time of day as HH:MM, from 00:00 to 23:59", choices: null };
  if (node.format === "iana-time-zone") return { allowed: "An IANA time-zone name, such as Europe/Berlin", choices: null };
  if (typeof node.pattern === "string") return { allowed: `Text matching ${node.pattern}`, choices: null };
  return { allowed: "Any text", choices: null };
}

/** The rules that look at a path: a rule naming "/schedule" looks at every schedule parameter. */
function rulesFor(path: string): { id: string; title: string }[] {
  return SAFETY_RULES.filter((r) => r.paths.some((rp) => path === rp || path.startsWith(`${rp}/`))).map((r) => ({ id: r.id, title: r.title }));
}

function entry(version: ParamsVersion, p: ParameterInfo): ParameterHelp {
  const node = nodeAt(version, p.path, p.variant);
  return {
    path: p.path,
    anchor: parameterAnchor(p.path, version),
    title: p.title,
    description: p.description,
    unit: p.unit,
    ...allowedOf(p, node),
    defaultText: p.default === null ? null : formatValue(p.default, p),
    typical: version === 2 ? (TYPICAL_VALUES[p.path] ?? null) : null,
    safety: p.safety,
    caution: version === 2 && CAUTION_PATHS.includes(p.path),
    variant: p.variant,
    rules: version === 2 ? rulesFor(p.path) : [],
    v1Path: version === 2 ? v2PathToV1(p.path) : null,
  };
}

/** The version 2 parameters in groups: the schema's own objects under their titles, the rest in groups of ours, schema order within each. */
export function parameterGroups(): ParameterGroup[] {
  const schemaProps = props(asNode(getSchema(2).schema));
  const groups = new Map<string, ParameterGroup>();
  for (const p of parameterInfo(2)) {
    const top = p.path.split("/")[1] ?? "";
    const topNode = asNode(schemaProps[top]);
    const isObject = topNode.type === "object";
    const id = isObject ? top : (LEAF_GROUP[top] ?? "other");
    let group = groups.get(id);
    if (!group) {
      // A group named after a schema object takes that object's title and description.
      const schemaGroup = asNode(schemaProps[id]);
      const fromSchema = schemaGroup.type === "object";
      const own = OWN_GROUPS[id];
      const title = own?.title ?? (fromSchema ? String(schemaGroup.title ?? id) : id);
      const intro = [fromSchema ? String(schemaGroup.description ?? "") : "", own?.intro ?? ""].filter(Boolean).join(" ");
      group = { id, anchor: parameterAnchor(`/${id}`), title, intro, parameters: [] };
      groups.set(id, group);
    }
    // Two forms of one schedule parameter share an entry (the first); the anchor must stay unique.
    if (!group.parameters.some((q) => q.path === p.path)) group.parameters.push(entry(2, p));
  }
  const rank = (id: string) => (GROUP_ORDER.includes(id) ? GROUP_ORDER.indexOf(id) : GROUP_ORDER.length);
  return [...groups.values()].sort((a, b) => rank(a.id) - rank(b.id));
}

export type V1Row = { v1Path: string; anchor: string; title: string; v2Path: string | null; v2Anchor: string | null; differences: string[] };

function differences(v1: ParameterInfo, v2: ParameterInfo): string[] {
  const out: string[] = [];
  const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
  if (!same(v1.allowed, v2.allowed)) out.push(`allowed: ${(v1.allowed ?? []).map(show).join(", ")}`);
  if (v1.minimum !== v2.minimum || v1.maximum !== v2.maximum) out.push(`range ${v1.minimum === null ? "—" : num(v1.minimum, 3)} to ${v1.maximum === null ? "—" : num(v1.maximum, 3)}`);
  if (!same(v1.default, v2.default)) out.push(`default ${v1.default === null ? "none" : formatValue(v1.default, v1)}`);
  if (v1.unit !== v2.unit) out.push(`unit ${v1.unit ?? "none"}`);
  if (v1.safety !== v2.safety) out.push(v1.safety ? "safety-relevant" : "not safety-relevant");
  return out;
}

/** Every version 1 parameter with where it lives in version 2 and what differs there. */
export function versionOneRows(): V1Row[] {
  const v2 = parameterInfo(2);
  const byV1 = new Map<string, ParameterInfo>();
  for (const p of v2) {
    const old = v2PathToV1(p.path);
    if (old && !byV1.has(old)) byV1.set(old, p);
  }
  const rows: V1Row[] = [];
  for (const p of parameterInfo(1)) {
    if (rows.some((r) => r.v1Path === p.path)) continue;
    const target = byV1.get(p.path) ?? null;
    rows.push({
      v1Path: p.path,
      anchor: parameterAnchor(p.path, 1),
      title: p.title,
      v2Path: target?.path ?? null,
      v2Anchor: target ? parameterAnchor(target.path, 2) : null,
      differences: target ? differences(p, target) : [],
    });
  }
  return rows;
}

/** Version 2 parameters that version 1 does not have. */
export function versionTwoOnly(): { path: string; anchor: string; title: string }[] {
  const seen = new Set<string>();
  return parameterInfo(2)
    .filter((p) => v2PathToV1(p.path) === null && !seen.has(p.path) && seen.add(p.path))
    .map((p) => ({ path: p.path, anchor: parameterAnchor(p.path, 2), title: p.title }));
}
