"use client";
// The Fields view: a form generated from the schema's parameters, editing the same document as the
// Text view. Every edit goes back as a whole new document; the workbench rewrites the text from it.
import { useEffect, useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/surface";
import type { JsonObject, JsonValue } from "@/lib/profiles/json";
import { FORM_TAG, type LayerName } from "@/lib/profiles/merge";
import { parameterInfo, type ParameterInfo } from "@/lib/profiles/parameter-info";
import type { ParamsVersion } from "@/lib/profiles/schemas";
import type { Problem } from "./check-document";
import { getAt, removeAt, schemaKeyOrder, setAt } from "./document-edits";
import { SafetyCaution, SeverityBadge } from "./editor-parts";
import { chooseForm, fieldId, formTitle, groupParameters, isFormTag, rangeMessage, readDraft, replacesForm } from "./fields-model";
import { ParameterField, type OverlayState } from "./parameter-field";

export type FieldsViewProps = {
  version: ParamsVersion;
  layer: LayerName;
  /** The document as an object, or null when the text is not a JSON object. */
  doc: JsonObject | null;
  /** Why `doc` is null. */
  unusable: string | null;
  effective: unknown;
  baseValues?: object;
  problems: readonly Problem[];
  readOnly: boolean;
  idPrefix: string;
  onDocument: (next: JsonObject) => void;
  onShowText: () => void;
};

type Draft = { text: string; error: string | null };

const parentOf = (pointer: string) => pointer.slice(0, pointer.lastIndexOf("/"));


/** Moves focus to the control for a pointer, or to the first control beneath it, or above it. */
export function focusPointer(container: HTMLElement, pointer: string): boolean {
  const wrappers = [...container.querySelectorAll<HTMLElement>("[data-pointer]")];
  const exact = wrappers.find((w) => w.dataset.pointer === pointer);
  const below = wrappers.find((w) => w.dataset.pointer?.startsWith(`${pointer}/`));
  const above = wrappers.filter((w) => pointer.startsWith(`${w.dataset.pointer ?? ""}/`)).pop();
  const wrapper = exact ?? below ?? above;
  const target =
    wrapper?.querySelector<HTMLElement>("[data-focus]:not([disabled])") ??
    wrapper?.querySelector<HTMLElement>("input:checked:not([disabled])") ??
    wrapper?.querySelector<HTMLElement>("input:not([disabled]), select:not([disabled]), textarea, [tabindex]");
  if (!target) return false;
  target.focus();
  target.scrollIntoView({ block: "center", behavior: "smooth" });
  return true;
}

/** The schema-generated form; overlays show for each value whether this layer sets it. */
export function FieldsView(props: FieldsViewProps) {
  const { version, layer, effective, baseValues, problems, readOnly, idPrefix } = props;
  const [drafts, setDrafts] = useState<Record<string, Draft>>({});
  const params = parameterInfo(version);
  const order = useMemo(() => schemaKeyOrder(parameterInfo(version)), [version]);
  // Filled after mounting: the server's list of zones can differ from the browser's.
  const [timeZones, setTimeZones] = useState<readonly string[]>([]);
  useEffect(() => setTimeZones(typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : []), []);
  const isOverlay = layer !== "base";
  const from = layer === "site" ? "base" : "base and site";

  if (!props.doc) {
    return (
      <div className="space-y-3">
        <Notice tone="bad" title="The fields cannot show this document">
          {props.unusable}
        </Notice>
        <Button variant="secondary" onClick={props.onShowText}>
          Fix it in the Text view
        </Button>
      </div>
    );
  }

  const doc = props.doc;
  const groups = groupParameters(version, effective);
  const shown = new Set(groups.flatMap((g) => g.params.map((p) => p.path)));
  const unplaced = problems.filter((p) => p.source !== "syntax" && !p.pointers.some((ptr) => shown.has(ptr)));

  const clearDraft = (path: string) =>
    setDrafts((d) => {
      const { [path]: _, ...rest } = d;
      return rest;
    });
  const write = (path: string, value: JsonValue) => props.onDocument(setAt(doc, path, value, order));

  function overlayState(p: ParameterInfo): OverlayState | null {
    if (!isOverlay) return null;
    const parent = parentOf(p.path);
    const wholeObject = parent !== "" && replacesForm(doc, baseValues, parent);
    return {
      setHere: wholeObject || getAt(doc, p.path) !== undefined,
      inherited: getAt(baseValues, p.path),
      from,
      locked: wholeObject ? "This layer changes the schedule form, so it sets the whole schedule." : null,
    };
  }

  function field(p: ParameterInfo) {
    const id = fieldId(idPrefix, p.path);
    if (isFormTag(p, params)) return formField(p, id);
    const value = getAt(doc, p.path);
    const draft = drafts[p.path];
    return (
      <ParameterField
        key={p.path}
        param={p}
        id={id}
        value={value}
        draft={draft?.text}
        localError={draft?.error ?? rangeMessage(p, value)}
        problems={problems.filter((q) => q.pointers.includes(p.path))}
        overlay={overlayState(p)}
        readOnly={readOnly}
        timeZones={timeZones}
        onDraft={(text) => {
          const read = readDraft(p, text);
          setDrafts((d) => ({ ...d, [p.path]: { text, error: read.ok ? null : read.message } }));
          if (read.ok) write(p.path, read.value);
        }}
        onValue={(v) => {
          clearDraft(p.path);
          write(p.path, v);
        }}
        onSetHere={(on) => {
          clearDraft(p.path);
          if (!on) props.onDocument(removeAt(doc, p.path));
          else write(p.path, (getAt(effective, p.path) ?? p.default ?? null) as JsonValue);
        }}
      />
    );
  }

  // Called as a function, not mounted as a component: a component defined in render would remount on
  // every edit and drop the focus from the radio just chosen.
  function formField(p: ParameterInfo, id: string) {
    const parent = parentOf(p.path);
    const current = getAt(effective, p.path);
    const beneath = getAt(baseValues, p.path);
    const own = problems.filter((q) => q.pointers.includes(p.path));
    return (
      <fieldset key={p.path} data-pointer={p.path} className="space-y-2 py-3 sm:col-span-2" aria-describedby={`${id}-note`}>
        <legend className="text-sm font-medium">{p.title}</legend>
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {(p.allowed ?? []).map((kind) => (
            <label key={String(kind)} className="inline-flex items-center gap-2 text-sm">
              <input
                type="radio"
                name={`${idPrefix}-form${parent.replace(/[^A-Za-z0-9]+/g, "-")}`}
                id={`${id}-${String(kind)}`}
                value={String(kind)}
                checked={current === kind}
                disabled={readOnly}
                className="size-4 accent-dusk-600"
                onChange={() => {
                  clearDraft(p.path);
                  props.onDocument(chooseForm({ version, doc, beneath: isOverlay ? (baseValues ?? {}) : undefined, effective, parent, kind: String(kind), order }));
                }}
              />
              {formTitle(version, parent, String(kind))}
            </label>
          ))}
        </div>
        <p id={`${id}-note`} className="text-xs text-loam-600 dark:text-loam-400">
          {isOverlay
            ? replacesForm(doc, baseValues, parent)
              ? `This layer changes the form (beneath: ${String(beneath ?? "none")}), so it sets the whole schedule.`
              : `Form inherited from ${from}: ${String(beneath ?? "not set")}. Choosing the other form sets the whole schedule in this layer.`
            : "Switching the form replaces the schedule's values with the other form's defaults; the step is kept."}
        </p>
        {own.map((q) => (
          <p key={q.id} className="text-sm font-medium text-ember-700 dark:text-ember-100">
            <span className="sr-only">Error: </span>
            {q.message}
          </p>
        ))}
      </fieldset>
    );
  }

  return (
    <div className="space-y-5">
      {unplaced.length > 0 && (
        <div className="rounded-md border border-ember-500/50 p-3 text-sm" data-pointer="">
          <p className="mb-1 font-semibold">Problems outside the fields below</p>
          <ul className="space-y-1">
            {unplaced.map((q) => (
              <li key={q.id} className="flex flex-wrap items-baseline gap-1.5">
                <SeverityBadge severity={q.severity} />
                <span>
                  <span className="font-medium">{q.title}:</span> {q.message} <code className="text-xs">{q.pointer || "/"}</code>
                </span>
              </li>
            ))}
          </ul>
          <Button variant="ghost" size="sm" className="mt-2" onClick={props.onShowText}>
            Edit in the Text view
          </Button>
        </div>
      )}
      {groups.map((g) => (
        <section key={g.id} aria-labelledby={`${idPrefix}-g-${g.id}`} className="rounded-lg border border-loam-200 p-4 dark:border-loam-800">
          <h3 id={`${idPrefix}-g-${g.id}`} className="mb-2 text-base font-semibold">
            {g.title}
          </h3>
          {g.hasSafety && <SafetyCaution compact />}
          <div className="grid gap-x-6 divide-y divide-loam-100 sm:grid-cols-2 sm:divide-y-0 dark:divide-loam-800">
            {g.params.map(field)}
          </div>
        </section>
      ))}
    </div>
  );
}
