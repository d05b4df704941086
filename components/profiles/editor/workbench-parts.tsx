"use client";
// The workbench's chrome: view tabs, the keys hint, and following the page's dark mode.
import { useRef, useSyncExternalStore, type KeyboardEvent } from "react";

export type WorkbenchView = "text" | "fields";

const VIEWS: readonly { id: WorkbenchView; label: string }[] = [
  { id: "text", label: "Text" },
  { id: "fields", label: "Fields" },
];

function subscribeDark(onChange: () => void): () => void {
  const observer = new MutationObserver(onChange);
  observer.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
  return () => observer.disconnect();
}

/** True while the page has the html.dark class (the theme toggle sets it). */
export function useHtmlDark(): boolean {
  return useSyncExternalStore(
    subscribeDark,
    () => document.documentElement.classList.contains("dark"),
    () => false,
  );
}

export const tabId = (prefix: string, view: WorkbenchView) => `${prefix}-tab-${view}`;
export const panelId = (prefix: string, view: WorkbenchView) => `${prefix}-panel-${view}`;

/** Two tabs with arrow-key movement between them, as the ARIA tabs pattern has it. */
export function ViewTabs({ prefix, view, onChange }: { prefix: string; view: WorkbenchView; onChange: (v: WorkbenchView) => void }) {
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  function onKeyDown(e: KeyboardEvent<HTMLButtonElement>) {
    const at = VIEWS.findIndex((v) => v.id === view);
    const next =
      e.key === "ArrowRight" ? VIEWS[(at + 1) % VIEWS.length] : e.key === "ArrowLeft" ? VIEWS[(at + VIEWS.length - 1) % VIEWS.length] : e.key === "Home" ? VIEWS[0] : e.key === "End" ? VIEWS[VIEWS.length - 1] : undefined;
    if (!next) return;
    e.preventDefault();
    onChange(next.id);
    refs.current[next.id]?.focus();
  }
  return (
    <div role="tablist" aria-label="Editor view" className="inline-flex rounded-md border border-loam-200 bg-white p-0.5 dark:border-loam-800 dark:bg-loam-900">
      {VIEWS.map((v) => {
        const selected = v.id === view;
        return (
          <button
            key={v.id}
            ref={(el) => {
              refs.current[v.id] = el;
            }}
            type="button"
            role="tab"
            id={tabId(prefix, v.id)}
            aria-selected={selected}
            aria-controls={panelId(prefix, v.id)}
            tabIndex={selected ? 0 : -1}
            onClick={() => onChange(v.id)}
            onKeyDown={onKeyDown}
            className={`rounded px-3 py-1.5 text-sm font-medium ${selected ? "bg-dusk-600 text-white dark:bg-dusk-500" : "text-loam-800 hover:bg-loam-100 dark:text-loam-100 dark:hover:bg-loam-800"}`}
          >
            {v.label}
          </button>
        );
      })}
    </div>
  );
}

const KEYS: readonly [string, string][] = [
  ["Ctrl+S / ⌘S", "Save"],
  ["Ctrl+Enter / ⌘Enter", "Submit for review"],
  ["← →", "Switch between Text and Fields (on the tabs)"],
  ["Ctrl+Space", "Suggest keys and values (text)"],
  ["Ctrl+K Ctrl+I", "Show the parameter's notes (text)"],
  ["F8 / Shift+F8", "Next / previous problem (text)"],
  ["Ctrl+M (Ctrl+Shift+M on a Mac)", "Let Tab leave the text editor"],
  ["Alt+F1", "Text editor accessibility help"],
];

/** The keyboard shortcuts, folded away until asked for. */
export function KeysHint({ canSave, canSubmit }: { canSave: boolean; canSubmit: boolean }) {
  const rows = KEYS.filter(([, what]) => (what !== "Save" || canSave) && (what !== "Submit for review" || canSubmit));
  return (
    <details className="rounded-md border border-loam-200 p-3 text-sm dark:border-loam-800">
      <summary className="cursor-pointer font-medium">Keys</summary>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
        {rows.map(([keys, what]) => (
          <div key={keys} className="contents">
            <dt>
              <kbd className="rounded border border-loam-200 px-1 font-mono text-xs dark:border-loam-800">{keys}</kbd>
            </dt>
            <dd className="text-loam-600 dark:text-loam-400">{what}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
