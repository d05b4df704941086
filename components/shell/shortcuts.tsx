"use client";
import { useRouter } from "next/navigation";
import { Fragment, useEffect, useMemo, useRef, useState } from "react";
import { Dialog, DialogContent } from "@/components/ui/dialog";
import { useToast } from "@/components/ui/toast";
import { goTargets, IDLE, isTypingTarget, matchKey, SHORTCUTS_OPEN_EVENT, shortcutGroups, type SequenceState } from "@/lib/shortcuts";

type MenuItem = { href: string; label: string };

// Pages mark their search with data-shortcut="search"; until they do, the usual filter forms are found by shape.
const SEARCH_FIELDS = [
  '[data-shortcut="search"]',
  'main input[type="search"]',
  'main [role="search"] input:not([type="hidden"])',
  'main form[aria-label^="Find"] input:not([type="hidden"])',
  'main form[aria-label^="Filter"] input:not([type="hidden"])',
  'main input[name="q"]',
];

function visible(el: Element): el is HTMLElement {
  if (!(el instanceof HTMLElement) || el.closest("details:not([open])")) return false;
  return typeof el.checkVisibility === "function" ? el.checkVisibility() : el.getClientRects().length > 0;
}

function firstSearchField(): HTMLElement | null {
  for (const selector of SEARCH_FIELDS) {
    const found = [...document.querySelectorAll(selector)].find(visible);
    if (found) return found;
  }
  return null;
}

function typingAt(el: Element | null): boolean {
  if (!(el instanceof HTMLElement)) return false;
  return isTypingTarget({ tag: el.tagName, type: el.getAttribute("type"), editable: el.isContentEditable, inCodeEditor: !!el.closest(".monaco-editor") });
}

// An open dialog, confirm box or the tour has the keyboard; Esc there comes first.
const OPEN_LAYER = '[role="dialog"][data-state="open"], [role="alertdialog"][data-state="open"]';

function Keys({ sequence }: { sequence: string[] }) {
  return (
    <span className="inline-flex items-center gap-1">
      {sequence.map((press, i) => (
        <Fragment key={i}>
          {i > 0 && <span className="text-xs text-loam-600 dark:text-loam-400">then</span>}
          <kbd className="rounded border border-loam-200 bg-loam-50 px-1.5 py-0.5 font-mono text-xs text-loam-900 shadow-[0_1px_0] shadow-loam-200 dark:border-loam-800 dark:bg-loam-950 dark:text-loam-100 dark:shadow-loam-800">
            {press}
          </kbd>
        </Fragment>
      ))}
    </span>
  );
}

/** Console-wide keys: ? lists them, g then a letter opens an area of the menu, / finds the page's search. */
export function KeyboardShortcuts({ items }: { items: MenuItem[] }) {
  const router = useRouter();
  const { notify } = useToast();
  const [open, setOpen] = useState(false);
  const targets = useMemo(() => goTargets(items), [items]);
  const groups = useMemo(() => shortcutGroups(targets), [targets]);
  const sequence = useRef<SequenceState>(IDLE);

  useEffect(() => {
    function onKey(e: KeyboardEvent) {
      if (e.defaultPrevented || e.isComposing || e.repeat) return;
      if (typingAt(document.activeElement) || document.querySelector(OPEN_LAYER)) {
        sequence.current = IDLE;
        return;
      }
      const { state, action } = matchKey(sequence.current, e, targets, Date.now());
      sequence.current = state;
      if (action.kind === "none") return;
      e.preventDefault();
      if (action.kind === "help") setOpen(true);
      else if (action.kind === "go") router.push(action.href);
      else if (action.kind === "search") {
        const field = firstSearchField();
        if (!field) notify({ tone: "info", title: "No search on this page" });
        else {
          field.focus();
          if (field instanceof HTMLInputElement) field.select();
        }
      }
    }
    const openFromMenu = () => setOpen(true);
    document.addEventListener("keydown", onKey);
    window.addEventListener(SHORTCUTS_OPEN_EVENT, openFromMenu);
    return () => {
      document.removeEventListener("keydown", onKey);
      window.removeEventListener(SHORTCUTS_OPEN_EVENT, openFromMenu);
    };
  }, [targets, router, notify]);

  return (
    <Dialog open={open} onOpenChange={setOpen}>
      <DialogContent title="Keyboard shortcuts" size="lg" description="Letters are pressed one after the other; keys joined with + are held together.">
        <div className="grid gap-5 sm:grid-cols-2">
          {groups.map((g, gi) => (
            <section key={g.title} aria-labelledby={`shortcuts-group-${gi}`}>
              <h3 id={`shortcuts-group-${gi}`} className="text-sm font-semibold">
                {g.title}
              </h3>
              {g.note && <p className="mt-0.5 text-xs text-loam-600 dark:text-loam-400">{g.note}</p>}
              <dl className="mt-2 space-y-1.5 text-sm">
                {g.rows.map((row) => (
                  <div key={row.what} className="flex items-start justify-between gap-3">
                    <dt className="text-loam-800 dark:text-loam-200">{row.what}</dt>
                    <dd className="flex shrink-0 flex-wrap justify-end gap-x-2 gap-y-1">
                      {row.keys.map((seq, i) => (
                        <Fragment key={i}>
                          {i > 0 && <span className="text-xs text-loam-600 dark:text-loam-400">or</span>}
                          <Keys sequence={seq} />
                        </Fragment>
                      ))}
                    </dd>
                  </div>
                ))}
              </dl>
            </section>
          ))}
        </div>
      </DialogContent>
    </Dialog>
  );
}
