"use client";
// The schema-aware profile editor: one JSON document edited as text (Monaco) or as fields, checked live
// against the pinned schema (on the merged result for overlays) and the safety rules.
import dynamic from "next/dynamic";
import { useCallback, useEffect, useId, useMemo, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/surface";
import { isPlainObject, type JsonObject } from "@/lib/profiles/json";
import type { LayerName } from "@/lib/profiles/merge";
import type { SafetyFinding } from "@/lib/profiles/safety";
import { getSchema, type ValidationIssue } from "@/lib/profiles/schemas";
import { checkDocument, effectiveValues, type DocumentCheck, type EditorSafetyContext, type Problem } from "./check-document";
import { formatDocument, parseText } from "./document-edits";
import { SafetyCaution } from "./editor-parts";
import { FieldsView, focusPointer } from "./fields-view";
import { indexRanges, markRange } from "./json-pointer-ranges";
import { editorSchema } from "./monaco-schema";
import type { EditorMarker, TextEditorHandle } from "./monaco-text-editor";
import { ProblemsPanel, problemSummary } from "./problems-panel";
import { KeysHint, panelId, tabId, useHtmlDark, ViewTabs, type WorkbenchView } from "./workbench-parts";

const MonacoTextEditor = dynamic(() => import("./monaco-text-editor").then((m) => m.MonacoTextEditor), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-loam-600 dark:text-loam-400">Loading the text editor…</p>,
});

export type WorkbenchState = { text: string; parsed: unknown | null; schemaIssues: ValidationIssue[]; findings: SafetyFinding[]; dirty: boolean };

export type ProfileWorkbenchProps = {
  /** The pinned schema version. */
  version: 1 | 2;
  layer: LayerName;
  /** The revision's JSON text. Remount (change `key`) to load another revision. */
  initialText: string;
  /** For overlays: the values beneath (base, or base ← site); checks run on the overlay merged over them. */
  baseValues?: object;
  safetyContext?: EditorSafetyContext;
  readOnly?: boolean;
  onSave?: (text: string) => void;
  onSubmit?: (text: string) => void;
  onChange?: (state: WorkbenchState) => void;
  busy?: boolean;
  /** The view shown first; "text" unless given. */
  initialView?: WorkbenchView;
};

const CHECK_DELAY_MS = 250;

function markersOf(check: DocumentCheck): EditorMarker[] {
  // Monaco's JSON service reports syntax errors itself.
  return check.problems.flatMap((p) =>
    p.pointers.flatMap((pointer) => {
      const range = markRange(check.index, pointer, { key: p.markKey });
      if (!range) return [];
      const where = p.inherited ? " (set beneath this layer)" : range.exact ? "" : ` (at ${pointer})`;
      return [{ ...range, severity: p.severity, message: `${p.title}: ${p.message}${where}`, source: p.source === "safety" ? `safety rule ${p.ruleId ?? ""}`.trim() : "Roostline schema" }];
    }),
  );
}

/** Text and Fields views of one parameter document, with live schema and safety checks. */
export function ProfileWorkbench(props: ProfileWorkbenchProps) {
  const { version, layer, initialText, readOnly = false, busy = false, onSave, onSubmit } = props;
  const prefix = `pw${useId().replace(/[^A-Za-z0-9]/g, "")}`;
  const [text, setText] = useState(initialText);
  const [view, setView] = useState<WorkbenchView>(props.initialView ?? "text");
  const [textShown, setTextShown] = useState(view === "text");
  const [check, setCheck] = useState<DocumentCheck | null>(null);
  const [notice, setNotice] = useState<{ tone: "bad" | "good"; text: string } | null>(null);
  const dark = useHtmlDark();
  const editor = useRef<TextEditorHandle | null>(null);
  const pendingReveal = useRef<(() => void) | null>(null);
  const fieldsRef = useRef<HTMLDivElement | null>(null);
  const rootRef = useRef<HTMLDivElement | null>(null);
  const textRef = useRef(text);
  textRef.current = text;

  // Parents often pass fresh objects on every render; compare by content so checks do not loop.
  const baseKey = JSON.stringify(props.baseValues ?? null);
  const contextKey = JSON.stringify(props.safetyContext ?? null);
  const baseValues = useMemo(() => props.baseValues, [baseKey]);
  const safetyContext = useMemo(() => props.safetyContext, [contextKey]);

  const entry = getSchema(version);
  const schemaUri = layer === "base" ? entry.id : `${entry.id}/overlay`;
  const monacoSchema = useMemo(() => editorSchema(entry.schema, { uri: schemaUri, relaxed: layer !== "base" }), [entry.schema, schemaUri, layer]);
  const modelPath = `inmemory://roostline/${prefix}-${layer}-v${version}.json`;

  const runCheck = useCallback(
    (source: string) => checkDocument({ version, layer, text: source, baseValues, safetyContext, now: new Date() }),
    [version, layer, baseValues, safetyContext],
  );

  useEffect(() => {
    const timer = setTimeout(() => setCheck(runCheck(text)), check === null ? 0 : CHECK_DELAY_MS);
    return () => clearTimeout(timer);
    // The first check runs at once; later ones wait for a pause in typing (`check` is read, not watched).
  }, [text, runCheck]);

  const onChangeRef = useRef(props.onChange);
  onChangeRef.current = props.onChange;
  useEffect(() => {
    if (!check) return;
    onChangeRef.current?.({ text: check.text, parsed: check.parsed, schemaIssues: check.schemaIssues, findings: check.findings, dirty: check.text !== initialText });
  }, [check, initialText]);

  const parsedNow = useMemo(() => parseText(text), [text]);
  const docNow = parsedNow.ok && isPlainObject(parsedNow.value) ? (parsedNow.value as JsonObject) : null;
  const unusable = !parsedNow.ok ? `The text is not valid JSON: ${parsedNow.message}` : docNow ? null : "The document must be a JSON object ({ … }).";
  const effectiveNow = useMemo(() => (docNow ? effectiveValues({ layer, baseValues }, docNow) : null), [docNow, layer, baseValues]);

  const markers = useMemo(() => (check ? markersOf(check) : []), [check]);
  const problems = check?.problems ?? [];
  const pending = check === null || check.text !== text;
  const dirty = text !== initialText;

  function save() {
    if (readOnly || !onSave || busy) return;
    const parsed = parseText(textRef.current);
    if (!parsed.ok) {
      setNotice({ tone: "bad", text: `Not saved: the text is not valid JSON (${parsed.message}).` });
      return;
    }
    setNotice(null);
    onSave(textRef.current);
  }

  function submit() {
    if (readOnly || !onSubmit || busy) return;
    const now = runCheck(textRef.current);
    setCheck(now);
    const errors = now.problems.filter((p) => p.severity === "error");
    if (errors.length > 0) {
      // A reviewer cannot approve a document with schema issues or safety errors, so it is not sent.
      const what = now.problems.some((p) => p.source === "syntax") ? "the text is not valid JSON" : problemSummary(errors).replace(/\.$/, "");
      setNotice({ tone: "bad", text: `Not submitted: ${what}. A profile with errors cannot be approved; fix them first (see Problems).` });
      document.getElementById(`${prefix}-problems`)?.focus();
      return;
    }
    setNotice(null);
    onSubmit(textRef.current);
  }

  const canSave = !readOnly && !!onSave;
  const canSubmit = !readOnly && !!onSubmit;
  const actions = useRef({ save, submit, canSave, canSubmit });
  actions.current = { save, submit, canSave, canSubmit };
  useEffect(() => {
    // Window-wide so the keys work wherever focus rests on the page, but not from another form's
    // field, where Ctrl+Enter belongs to that form.
    function onKey(e: KeyboardEvent) {
      if (e.defaultPrevented || !(e.ctrlKey || e.metaKey) || e.altKey) return;
      const focus = document.activeElement;
      if (focus && focus !== document.body && !rootRef.current?.contains(focus)) return;
      const a = actions.current;
      if ((e.key === "s" || e.key === "S") && a.canSave) {
        e.preventDefault();
        a.save();
      } else if (e.key === "Enter" && a.canSubmit) {
        e.preventDefault();
        a.submit();
      }
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);

  function showView(next: WorkbenchView) {
    setView(next);
    if (next === "text") setTextShown(true);
  }

  function revealInText(problem?: Problem) {
    const index = indexRanges(textRef.current);
    const range = !index.ok ? { start: index.offset, end: index.offset + 1 } : problem ? markRange(index, problem.pointer ?? "", { key: problem.markKey }) : null;
    const go = () => (range ? editor.current?.reveal(range.start, range.end) : editor.current?.focus());
    showView("text");
    if (editor.current) requestAnimationFrame(go);
    else pendingReveal.current = go;
  }

  function select(problem: Problem) {
    if (view === "fields" && problem.source !== "syntax" && docNow && fieldsRef.current) {
      if (focusPointer(fieldsRef.current, problem.pointer ?? "")) return;
    }
    revealInText(problem);
  }

  return (
    <div ref={rootRef} className="space-y-4" aria-busy={busy || undefined}>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <ViewTabs prefix={prefix} view={view} onChange={showView} />
        <div className="flex flex-wrap items-center gap-2">
          <a href={`#${prefix}-problems`} className="text-sm lg:hidden">
            Problems
          </a>
          <span className="text-sm text-loam-600 dark:text-loam-400" aria-live="polite">
            {busy ? "Working…" : readOnly ? "Read only" : dirty ? "Unsaved changes" : "No unsaved changes"}
          </span>
          {canSave && (
            <Button variant="secondary" onClick={save} disabled={busy} aria-keyshortcuts="Control+S Meta+S">
              Save
            </Button>
          )}
          {canSubmit && (
            <Button onClick={submit} disabled={busy} aria-keyshortcuts="Control+Enter Meta+Enter">
              Submit for review
            </Button>
          )}
        </div>
      </div>
      {notice && <Notice tone={notice.tone}>{notice.text}</Notice>}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="min-w-0">
          <div role="tabpanel" id={panelId(prefix, "text")} aria-labelledby={tabId(prefix, "text")} hidden={view !== "text"} className="space-y-3">
            <SafetyCaution compact id={`${prefix}-caution`} />
            {layer !== "base" && (
              <p className="text-sm text-loam-600 dark:text-loam-400">
                This {layer} overlay lists only the values it changes; everything else comes from the layers beneath.
              </p>
            )}
            <div className="overflow-hidden rounded-md border border-loam-200 focus-within:ring-2 focus-within:ring-dusk-500 dark:border-loam-800 dark:focus-within:ring-dusk-300">
              {textShown && (
                <MonacoTextEditor
                  value={text}
                  onChange={(v) => {
                    if (v !== textRef.current) setText(v);
                  }}
                  modelPath={modelPath}
                  schemaUri={schemaUri}
                  schema={monacoSchema}
                  markers={markers}
                  markersFor={check?.text ?? ""}
                  readOnly={readOnly}
                  dark={dark}
                  label={`Parameter document (${layer}, version ${version}) as JSON`}
                  describedBy={`${prefix}-caution`}
                  onSave={save}
                  onSubmit={submit}
                  handle={editor}
                  onReady={() => {
                    const go = pendingReveal.current;
                    pendingReveal.current = null;
                    if (go) requestAnimationFrame(go);
                  }}
                />
              )}
            </div>
          </div>
          <div role="tabpanel" id={panelId(prefix, "fields")} aria-labelledby={tabId(prefix, "fields")} hidden={view !== "fields"} ref={fieldsRef}>
            {view === "fields" && (
              <FieldsView
                version={version}
                layer={layer}
                doc={docNow}
                unusable={unusable}
                effective={effectiveNow}
                baseValues={baseValues}
                problems={problems}
                readOnly={readOnly}
                idPrefix={prefix}
                onDocument={(next) => setText(formatDocument(next))}
                onShowText={() => revealInText(problems[0])}
              />
            )}
          </div>
        </div>
        <aside aria-labelledby={`${prefix}-problems`} className="space-y-4 lg:sticky lg:top-4 lg:self-start">
          <ProblemsPanel problems={problems} safetySkipped={check?.safetySkipped ?? null} pending={pending} overlay={layer !== "base"} headingId={`${prefix}-problems`} onSelect={select} />
          <KeysHint canSave={canSave} canSubmit={canSubmit} />
        </aside>
      </div>
    </div>
  );
}
