"use client";
// The Text view: Monaco on the JSON document, with the pinned schema for completion, hover and inline
// errors, and our own markers for the merged-document checks and the safety rules.
import { Editor, type OnMount } from "@monaco-editor/react";
import { useEffect, useRef, useState, type RefObject } from "react";
import { attachSchema, monaco } from "./monaco-setup";

export type EditorMarker = { start: number; end: number; severity: "error" | "warning"; message: string; source: string };

/** What the workbench may ask of the mounted editor. */
export type TextEditorHandle = {
  reveal(start: number, end: number): void;
  focus(): void;
  cursorOffset(): number | null;
};

export type MonacoTextEditorProps = {
  value: string;
  onChange: (text: string) => void;
  modelPath: string;
  schemaUri: string;
  schema: Record<string, unknown>;
  markers: readonly EditorMarker[];
  /** The text the markers were computed from: markers for an older text are not applied. */
  markersFor: string;
  readOnly: boolean;
  dark: boolean;
  label: string;
  describedBy?: string;
  onSave: () => void;
  onSubmit: () => void;
  handle: RefObject<TextEditorHandle | null>;
  /** Called once the editor is mounted and `handle` is set. */
  onReady?: () => void;
};

const OWNER = "roostline";

/** Monaco on one document; loaded only in the browser, through next/dynamic. */
export function MonacoTextEditor(props: MonacoTextEditorProps) {
  const { modelPath, schemaUri, schema, markers, markersFor, handle } = props;
  const editorRef = useRef<monaco.editor.IStandaloneCodeEditor | null>(null);
  const [mounted, setMounted] = useState(false);
  // Monaco commands are registered once; they call whatever the latest props are.
  const latest = useRef(props);
  latest.current = props;

  useEffect(() => attachSchema(modelPath, schemaUri, schema), [modelPath, schemaUri, schema]);

  useEffect(() => {
    const model = editorRef.current?.getModel();
    if (!model || model.getValue() !== markersFor) return;
    monaco.editor.setModelMarkers(
      model,
      OWNER,
      markers.map((m) => {
        const from = model.getPositionAt(m.start);
        const to = model.getPositionAt(Math.max(m.end, m.start + 1));
        return {
          startLineNumber: from.lineNumber,
          startColumn: from.column,
          endLineNumber: to.lineNumber,
          endColumn: to.column,
          severity: m.severity === "error" ? monaco.MarkerSeverity.Error : monaco.MarkerSeverity.Warning,
          message: m.message,
          source: m.source,
        };
      }),
    );
  }, [markers, markersFor, mounted]);

  const onMount: OnMount = (editor) => {
    editorRef.current = editor;
    editor.addCommand(monaco.KeyMod.CtrlCmd | monaco.KeyCode.KeyS, () => latest.current.onSave());
    editor.addCommand(monaco.KeyMod.CtrlCmd | monaco.KeyCode.Enter, () => latest.current.onSubmit());
    handle.current = {
      reveal(start, end) {
        const model = editor.getModel();
        if (!model) return;
        const from = model.getPositionAt(start);
        const to = model.getPositionAt(end);
        const range = new monaco.Range(from.lineNumber, from.column, to.lineNumber, to.column);
        editor.setSelection(range);
        editor.revealRangeInCenterIfOutsideViewport(range);
        editor.focus();
      },
      focus: () => editor.focus(),
      cursorOffset() {
        const model = editor.getModel();
        const position = editor.getPosition();
        return model && position ? model.getOffsetAt(position) : null;
      },
    };
    const textarea = editor.getDomNode()?.querySelector("textarea");
    if (textarea && latest.current.describedBy) textarea.setAttribute("aria-describedby", latest.current.describedBy);
    setMounted(true);
    latest.current.onReady?.();
  };

  return (
    <Editor
      value={props.value}
      onChange={(v) => props.onChange(v ?? "")}
      language="json"
      path={modelPath}
      theme={props.dark ? "vs-dark" : "vs"}
      height="clamp(20rem, 65vh, 44rem)"
      loading={<p className="p-4 text-sm text-loam-600 dark:text-loam-400">Loading the text editor…</p>}
      onMount={onMount}
      options={{
        readOnly: props.readOnly,
        ariaLabel: props.label,
        automaticLayout: true,
        minimap: { enabled: false },
        scrollBeyondLastLine: false,
        fixedOverflowWidgets: true,
        tabSize: 2,
        insertSpaces: true,
        detectIndentation: false,
        fontSize: 14,
        wordWrap: "on",
        quickSuggestions: { strings: true, other: true, comments: false },
        // Only the schema's keys and values: words from the document would offer typos back.
        wordBasedSuggestions: "off",
        renderValidationDecorations: "on",
        accessibilitySupport: "auto",
      }}
    />
  );
}
