// What the Fields view is built from: parameters grouped into sections, schedule forms, and the
// reading of typed-in text into parameter values.
import { getOwn, isPlainObject, setOwn, type JsonObject, type JsonValue } from "@/lib/profiles/json";
import { FORM_TAG } from "@/lib/profiles/merge";
import { parameterInfo, type ParameterInfo } from "@/lib/profiles/parameter-info";
import { getSchema, type ParamsVersion } from "@/lib/profiles/schemas";
import { getAt, pointerTokens, removeAt, setAt } from "./document-edits";

export type FieldGroup = { id: string; title: string; params: ParameterInfo[]; hasSafety: boolean };

const GROUPS: readonly { id: string; title: string; keys: readonly string[] }[] = [
  { id: "drive", title: "Drive and end stops", keys: ["closeTravelCounts", "travelTimeoutMs", "homeOnPowerUp", "openSensorActiveLevel", "powerUpMode"] },
  { id: "stall", title: "Stall check", keys: ["stall", "stallThresholdCps", "stallWindowMs", "stallBlankingMs"] },
  { id: "schedule", title: "Schedule", keys: ["schedule", "scheduleStepMin", "timeZone"] },
  { id: "clock", title: "Clock", keys: ["clock", "timeSource", "noFixAlarmHours"] },
  { id: "inputs", title: "Buttons", keys: ["debounceMs"] },
  { id: "display", title: "Display and check-in", keys: ["backlightTimeoutS", "checkInIntervalS"] },
  { id: "document", title: "Document", keys: ["parameterSetVersion"] },
];

const parentOf = (pointer: string) => pointer.slice(0, pointer.lastIndexOf("/"));

/** True for the parameter that picks an object's form (the schedule's `kind`). */
export function isFormTag(param: ParameterInfo, params: readonly ParameterInfo[]): boolean {
  const parent = parentOf(param.path);
  return param.path === `${parent}/${FORM_TAG}` && param.variant === null && params.some((q) => q.variant !== null && q.path.startsWith(`${parent}/`));
}

/** The parameters shown for a document: those of every form plus those of its current form, in sections. */
export function groupParameters(version: ParamsVersion, doc: unknown): FieldGroup[] {
  const params = parameterInfo(version);
  const visible = params.filter((p) => {
    if (p.variant === null) return true;
    return getAt(doc, `${parentOf(p.path)}/${FORM_TAG}`) === p.variant;
  });
  const groups: FieldGroup[] = GROUPS.map((g) => ({ id: g.id, title: g.title, params: [], hasSafety: false }));
  const other: FieldGroup = { id: "other", title: "Other parameters", params: [], hasSafety: false };
  const topKey = (p: ParameterInfo) => pointerTokens(p.path)[0] ?? "";
  for (const p of visible) {
    const at = GROUPS.findIndex((g) => g.keys.includes(topKey(p)));
    const group = at >= 0 ? groups[at]! : other;
    group.params.push(p);
    group.hasSafety ||= p.safety;
  }
  // Sections list their keys in the order a technician sets them; sort is stable, so parameters under
  // one key (a group such as stall) keep the schema's order.
  groups.forEach((g, i) => g.params.sort((a, b) => GROUPS[i]!.keys.indexOf(topKey(a)) - GROUPS[i]!.keys.indexOf(topKey(b))));
  return [...groups, other].filter((g) => g.params.length > 0);
}

type Node = Record<string, unknown>;
const asNode = (v: unknown): Node => (typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Node) : {});

function formNode(version: ParamsVersion, parent: string, kind: string): Node | undefined {
  let node = asNode(getSchema(version).schema);
  for (const token of pointerTokens(parent)) node = asNode(asNode(node.properties)[token]);
  const forms = Array.isArray(node.oneOf) ? node.oneOf.map(asNode) : [];
  return forms.find((f) => asNode(asNode(f.properties)[FORM_TAG]).const === kind);
}

/** The keys of one form of the object at `parent`, in the schema's order, the tag first. */
export function formKeys(version: ParamsVersion, parent: string, kind: string): string[] {
  const form = formNode(version, parent, kind);
  return form ? Object.keys(asNode(form.properties)) : [];
}

/**
 * A complete object of another form: the tag, the values shared by every form kept from `current`,
 * and the new form's own values at their defaults.
 */
export function buildForm(version: ParamsVersion, parent: string, kind: string, current: unknown): JsonObject {
  const params = parameterInfo(version);
  const out: JsonObject = {};
  for (const key of formKeys(version, parent, kind)) {
    const path = `${parent}/${key}`;
    if (key === FORM_TAG) {
      setOwn(out, key, kind);
      continue;
    }
    const param = params.find((p) => p.path === path && (p.variant === null || p.variant === kind));
    const kept = param?.variant === null && isPlainObject(current) ? getOwn(current, key) : undefined;
    const value = kept ?? param?.default ?? null;
    setOwn(out, key, value);
  }
  return out;
}

export type DraftValue = { ok: true; value: JsonValue } | { ok: false; message: string };

/** Reads what was typed into a field as the parameter's type. */
export function readDraft(param: ParameterInfo, draft: string): DraftValue {
  const text = draft.trim();
  if (param.type === "string") return { ok: true, value: draft };
  if (text === "") return { ok: false, message: "needs a value" };
  if (param.type === "boolean") return text === "true" || text === "false" ? { ok: true, value: text === "true" } : { ok: false, message: "must be true or false" };
  if (param.type === "integer") return /^[+-]?\d+$/.test(text) ? { ok: true, value: Number(text) } : { ok: false, message: "must be a whole number" };
  const n = Number(text);
  return Number.isFinite(n) ? { ok: true, value: n } : { ok: false, message: "must be a number" };
}

const withUnit = (value: number, param: ParameterInfo) => `${value}${param.unit ? ` ${param.unit}` : ""}`;

/** The schema's limits checked at once while typing, in the validator's words. */
export function rangeMessage(param: ParameterInfo, value: unknown): string | null {
  if (typeof value !== "number") return null;
  if (param.minimum !== null && value < param.minimum) return `must be at least ${withUnit(param.minimum, param)}`;
  if (param.maximum !== null && value > param.maximum) return `must be at most ${withUnit(param.maximum, param)}`;
  return null;
}

/** A value as a person reads it: "800 counts/s", "on", "sun". */
export function displayValue(param: ParameterInfo, value: unknown): string {
  if (value === undefined) return "not set";
  if (typeof value === "boolean") return value ? "on" : "off";
  if (typeof value === "number") return withUnit(value, param);
  if (typeof value === "string") return value;
  return JSON.stringify(value);
}

/** The limits line under a field: "100 to 200000 counts · default 17000". */
export function limitsHint(param: ParameterInfo): string {
  const unit = param.unit ? ` ${param.unit}` : "";
  const parts: string[] = [];
  if (param.minimum !== null && param.maximum !== null) parts.push(`${param.minimum} to ${param.maximum}${unit}`);
  else if (param.minimum !== null) parts.push(`at least ${param.minimum}${unit}`);
  else if (param.maximum !== null) parts.push(`at most ${param.maximum}${unit}`);
  else if (param.unit) parts.push(`in ${param.unit}`);
  if (param.default !== null && typeof param.default !== "object") parts.push(`default ${typeof param.default === "number" ? param.default : displayValue(param, param.default)}`);
  return parts.join(" · ");
}

/** A DOM id for a parameter's control. */
export function fieldId(prefix: string, pointer: string): string {
  return `${prefix}-f${pointer.replace(/[^A-Za-z0-9]+/g, "-")}`;
}

/** The schema's title of one form ("Sun-following schedule"), or the tag value when it has none. */
export function formTitle(version: ParamsVersion, parent: string, kind: string): string {
  const title = formNode(version, parent, kind)?.title;
  return typeof title === "string" ? title : kind;
}

/** For an overlay: true when it switches the form of the object at `parent`, and so sets all of it. */
export function replacesForm(overlay: unknown, beneath: unknown, parent: string): boolean {
  const own = getAt(overlay, `${parent}/${FORM_TAG}`);
  return own !== undefined && own !== getAt(beneath, `${parent}/${FORM_TAG}`);
}

export type FormChoice = {
  version: ParamsVersion;
  /** The document edited: a whole profile, or an overlay when `beneath` is given. */
  doc: JsonObject;
  beneath?: unknown;
  effective: unknown;
  parent: string;
  kind: string;
  order?: Map<string, string[]>;
};

/**
 * The document after choosing a form in the Fields view. An overlay that goes back to the form beneath
 * drops its whole object (the object it had replaced the one beneath); one that picks another form
 * carries the complete new object, since merging replaces an object whose form changes.
 */
export function chooseForm({ version, doc, beneath, effective, parent, kind, order }: FormChoice): JsonObject {
  if (getAt(effective, `${parent}/${FORM_TAG}`) === kind) return doc;
  const isOverlay = beneath !== undefined;
  if (isOverlay && getAt(beneath, `${parent}/${FORM_TAG}`) === kind) return removeAt(doc, parent);
  return setAt(doc, parent, buildForm(version, parent, kind, getAt(effective, parent)), order);
}
