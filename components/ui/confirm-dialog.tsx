"use client";
import { AlertDialog } from "radix-ui";
import { useId, useState, type ReactElement, type ReactNode } from "react";
import { buttonClass } from "./button";
import { overlayClass, panelClass } from "./dialog";

/** Whether the typed text matches what the person was asked to type; case, spaces, "#" and "%" aside. */
export function confirmTextMatches(typed: string, expected: string): boolean {
  const norm = (s: string) => s.normalize("NFKC").toLowerCase().replace(/\s+/g, "").replace(/^#/, "").replace(/%$/, "");
  return norm(expected) !== "" && norm(typed) === norm(expected);
}

/** The usual caution for an action that changes what doors do; `controllers` is a count or a phrase such as "about 12 controllers". */
export function doorCaution(controllers?: number | string, what = "these parameters"): string {
  const who =
    controllers === undefined ? "Doors at the controllers concerned" : typeof controllers === "string" ? `Doors at ${controllers}` : `Doors at ${controllers} controller${controllers === 1 ? "" : "s"}`;
  return `${who} will receive ${what} on their next poll. Stall detection is a second line of defence, not a guarantee: test the obstacle stop on site, and follow local codes and licensed practice for powered doors and animal-welfare rules.`;
}

export type ConfirmDialogProps = {
  /** The button that opens the dialog; it keeps its own label. Leave out to control `open` yourself. */
  trigger?: ReactElement;
  open?: boolean;
  onOpenChange?: (open: boolean) => void;
  title: string;
  /** What will happen, in a sentence or two. */
  description: ReactNode;
  /** A safety caution shown in its own block, e.g. doorCaution(n). */
  caution?: ReactNode;
  /** Further detail between the description and the buttons. */
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  destructive?: boolean;
  /** For the riskiest actions: the confirm button stays off until this text is typed. */
  typeToConfirm?: { expected: string; label: string };
  /** Runs on confirm; the dialog waits for it, then closes. */
  onConfirm: () => unknown;
};

/** Asks before an action; focus starts on Cancel, Esc cancels. */
export function ConfirmDialog(props: ConfirmDialogProps) {
  const { trigger, title, description, caution, children, confirmLabel, cancelLabel = "Cancel", destructive = false, typeToConfirm, onConfirm } = props;
  const [ownOpen, setOwnOpen] = useState(false);
  const [typed, setTyped] = useState("");
  const [busy, setBusy] = useState(false);
  const inputId = useId();
  const open = props.open ?? ownOpen;
  function setOpen(next: boolean) {
    if (busy) return;
    if (!next) setTyped("");
    setOwnOpen(next);
    props.onOpenChange?.(next);
  }
  const allowed = !busy && (!typeToConfirm || confirmTextMatches(typed, typeToConfirm.expected));
  async function confirm() {
    if (!allowed) return;
    setBusy(true);
    try {
      await onConfirm();
    } finally {
      setBusy(false);
      setTyped("");
      setOwnOpen(false);
      props.onOpenChange?.(false);
    }
  }
  return (
    <AlertDialog.Root open={open} onOpenChange={setOpen}>
      {trigger && <AlertDialog.Trigger asChild>{trigger}</AlertDialog.Trigger>}
      <AlertDialog.Portal>
        <AlertDialog.Overlay className={overlayClass} />
        <AlertDialog.Content className={panelClass()} onEscapeKeyDown={(e) => busy && e.preventDefault()}>
          <AlertDialog.Title className="text-lg font-semibold">{title}</AlertDialog.Title>
          <AlertDialog.Description asChild>
            <div className="mt-2 text-sm text-loam-800 dark:text-loam-200">{description}</div>
          </AlertDialog.Description>
          {children && <div className="mt-3 text-sm">{children}</div>}
          {caution && (
            <div className="mt-3 rounded-md border-l-4 border-straw-500 bg-straw-100/60 p-3 text-sm text-loam-900 dark:bg-straw-700/25 dark:text-loam-100">
              <p className="font-semibold">Before you confirm</p>
              <div className="mt-0.5">{caution}</div>
            </div>
          )}
          {typeToConfirm && (
            <form
              className="mt-4"
              onSubmit={(e) => {
                e.preventDefault();
                void confirm();
              }}
            >
              <label htmlFor={inputId} className="mb-1 block text-sm font-medium">
                {typeToConfirm.label}
              </label>
              <input
                id={inputId}
                value={typed}
                onChange={(e) => setTyped(e.target.value)}
                autoComplete="off"
                spellCheck={false}
                className="block w-full rounded-md border border-loam-200 bg-white px-3 py-2 font-mono text-base text-loam-900 shadow-sm dark:border-loam-800 dark:bg-loam-950 dark:text-loam-50"
              />
            </form>
          )}
          <div className="mt-5 flex flex-wrap justify-end gap-2">
            <AlertDialog.Cancel className={buttonClass("secondary")} disabled={busy}>
              {cancelLabel}
            </AlertDialog.Cancel>
            <button type="button" className={buttonClass(destructive ? "danger" : "primary")} onClick={() => void confirm()} disabled={!allowed} aria-busy={busy || undefined}>
              {busy ? "Working…" : confirmLabel}
            </button>
          </div>
        </AlertDialog.Content>
      </AlertDialog.Portal>
    </AlertDialog.Root>
  );
}
