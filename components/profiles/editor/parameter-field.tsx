"use client";
// One parameter in the Fields view: its control, limits, description and problems, and for overlays
// whether this layer sets it or inherits it.
import type { JsonValue } from "@/lib/profiles/json";
import type { ParameterInfo } from "@/lib/profiles/parameter-info";
import type { Problem } from "./check-document";
import { SafetyBadge, SeverityBadge } from "./editor-parts";
import { displayValue, limitsHint } from "./fields-model";

export const controlClass =
  "block w-full rounded-md border border-loam-200 bg-white px-3 py-2 text-base text-loam-900 shadow-sm placeholder:text-loam-400 disabled:opacity-60 aria-[invalid=true]:border-ember-500 dark:border-loam-800 dark:bg-loam-900 dark:text-loam-50";

export type OverlayState = {
  setHere: boolean;
  inherited: unknown;
  from: string;
  /** Why the "set here" choice cannot be changed, when it cannot. */
  locked: string | null;
};

export type ParameterFieldProps = {
  param: ParameterInfo;
  id: string;
  value: unknown;
  draft: string | undefined;
  /** An error in what was typed, before it reaches the document. */
  localError: string | null;
  problems: readonly Problem[];
  overlay: OverlayState | null;
  readOnly: boolean;
  timeZones: readonly string[];
  onDraft: (text: string) => void;
  onValue: (value: JsonValue) => void;
  onSetHere: (setHere: boolean) => void;
};

function Control({ param, id, value, draft, readOnly, describedBy, invalid, timeZones, onDraft, onValue }: ParameterFieldProps & { describedBy: string; invalid: boolean }) {
  const common = { id, disabled: readOnly, "data-focus": "", "aria-describedby": describedBy, "aria-invalid": invalid || undefined };
  if (param.type === "boolean") {
    return (
      <span className="inline-flex items-center gap-2 text-sm">
        <input type="checkbox" {...common} checked={value === true} onChange={(e) => onValue(e.target.checked)} className="size-4 accent-dusk-600" />
        <span aria-hidden="true">{value === true ? "On" : value === false ? "Off" : "Not set (tick to switch on)"}</span>
      </span>
    );
  }
  if (param.allowed && param.allowed.length > 1) {
    const current = value === undefined ? "" : JSON.stringify(value);
    return (
      <select {...common} className={controlClass} value={current} onChange={(e) => onValue(JSON.parse(e.target.value) as JsonValue)}>
        {value === undefined && <option value="">Choose…</option>}
        {param.allowed.map((a) => (
          <option key={JSON.stringify(a)} value={JSON.stringify(a)}>
            {String(a)}
          </option>
        ))}
      </select>
    );
  }
  const text = draft ?? (value === undefined || value === null ? "" : typeof value === "string" ? value : JSON.stringify(value));
  const isTime = param.type === "string" && /At$/.test(param.path);
  const isZone = param.path.endsWith("/timeZone");
  return (
    <>
      <input
        {...common}
        disabled={undefined}
        readOnly={readOnly}
        type="text"
        className={`${controlClass} ${param.type === "string" ? "" : "font-mono tabular-nums"}`}
        value={text}
        inputMode={param.type === "integer" ? "numeric" : param.type === "number" ? "decimal" : undefined}
        placeholder={isTime ? "HH:MM" : undefined}
        autoComplete="off"
        spellCheck={false}
        list={isZone ? `${id}-zones` : undefined}
        onChange={(e) => onDraft(e.target.value)}
      />
      {isZone && (
        <datalist id={`${id}-zones`}>
          {timeZones.map((z) => (
            <option key={z} value={z} />
          ))}
        </datalist>
      )}
    </>
  );
}

/** A labelled parameter control with its limits, description, inline errors and findings. */
export function ParameterField(props: ParameterFieldProps) {
  const { param, id, overlay, problems, localError, readOnly } = props;
  const hint = limitsHint(param);
  const schemaErrors = problems.filter((p) => p.source === "schema");
  const findings = problems.filter((p) => p.source === "safety");
  const error = localError ?? (schemaErrors.length ? schemaErrors.map((p) => p.message).join("; ") : null);
  const ids = { hint: `${id}-hint`, desc: `${id}-desc`, error: `${id}-error`, findings: `${id}-findings`, inherit: `${id}-inherit` };
  const describedBy = [error && ids.error, findings.length > 0 && ids.findings, hint && ids.hint, param.description && ids.desc, overlay && ids.inherit]
    .filter(Boolean)
    .join(" ");
  const fixed = param.allowed?.length === 1;
  const editable = !fixed && (!overlay || overlay.setHere);
  return (
    <div data-pointer={param.path} className="space-y-1.5 py-3">
      <div className="flex flex-wrap items-center gap-2">
        {editable ? (
          <label htmlFor={id} className="text-sm font-medium">
            {param.title}
          </label>
        ) : (
          <span id={`${id}-label`} className="text-sm font-medium">
            {param.title}
          </span>
        )}
        {param.unit && <span className="text-xs text-loam-600 dark:text-loam-400">({param.unit})</span>}
        {param.safety && <SafetyBadge />}
      </div>
      {overlay && !fixed && (
        <div id={ids.inherit} className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
          <label className="inline-flex items-center gap-2">
            <input
              type="checkbox"
              id={editable ? undefined : id}
              data-focus={editable ? undefined : ""}
              aria-label={`Set ${param.title} in this layer`}
              aria-describedby={overlay.locked ? `${id}-locked` : undefined}
              className="size-4 accent-dusk-600"
              checked={overlay.setHere}
              disabled={readOnly || overlay.locked !== null}
              onChange={(e) => props.onSetHere(e.target.checked)}
            />
            Set in this layer
          </label>
          <span className="text-loam-600 dark:text-loam-400">
            {overlay.setHere ? "Beneath: " : "Inherited: "}
            <span className="font-mono">{displayValue(param, overlay.inherited)}</span> (from {overlay.from})
          </span>
          {overlay.locked && (
            <span id={`${id}-locked`} className="basis-full text-xs text-loam-600 dark:text-loam-400">
              {overlay.locked}
            </span>
          )}
        </div>
      )}
      {fixed && (
        <p id={overlay ? undefined : id} tabIndex={-1} className="font-mono text-sm">
          {displayValue(param, props.value ?? param.allowed?.[0])} <span className="font-sans text-loam-600 dark:text-loam-400">(fixed by the schema version)</span>
        </p>
      )}
      {editable && <Control {...props} describedBy={describedBy} invalid={error !== null} />}
      {error && (
        <p id={ids.error} className="text-sm font-medium text-ember-700 dark:text-ember-100">
          <span className="sr-only">Error: </span>
          {error}
        </p>
      )}
      {findings.length > 0 && (
        <ul id={ids.findings} className="space-y-1 text-sm">
          {findings.map((f) => (
            <li key={f.id} className="flex flex-wrap items-baseline gap-1.5">
              <SeverityBadge severity={f.severity}>{f.severity === "error" ? "Safety error" : "Safety warning"}</SeverityBadge>
              <span>
                <span className="font-medium">{f.title}:</span> {f.message}
              </span>
            </li>
          ))}
        </ul>
      )}
      {hint && (
        <p id={ids.hint} className="text-xs text-loam-600 dark:text-loam-400">
          {hint}
        </p>
      )}
      {param.description && (
        <p id={ids.desc} className="max-w-prose text-xs text-loam-600 dark:text-loam-400">
          {param.description}
        </p>
      )}
    </div>
  );
}
