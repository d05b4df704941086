"use client";
import { Dialog as DialogPrimitive } from "radix-ui";
import type { ReactNode } from "react";

export const Dialog = DialogPrimitive.Root;
export const DialogTrigger = DialogPrimitive.Trigger;
export const DialogClose = DialogPrimitive.Close;

/** The dimmed layer behind every dialog, shared with the confirm dialog. */
export const overlayClass = "fixed inset-0 z-40 bg-loam-950/50 motion-safe:transition-opacity dark:bg-black/60";

/** The dialog box itself: centred, scrolls inside on short screens. */
export function panelClass(size: "md" | "lg" = "md"): string {
  return `fixed left-1/2 top-1/2 z-50 max-h-[85vh] w-[calc(100vw-2rem)] -translate-x-1/2 -translate-y-1/2 overflow-y-auto rounded-lg border border-loam-200 bg-white p-5 text-loam-900 shadow-xl focus:outline-none dark:border-loam-800 dark:bg-loam-900 dark:text-loam-100 ${size === "lg" ? "max-w-2xl" : "max-w-lg"}`;
}

/** A modal dialog with its title, an optional description and a close button; Esc closes it. */
export function DialogContent({ title, description, children, size = "md", footer }: { title: string; description?: ReactNode; children?: ReactNode; size?: "md" | "lg"; footer?: ReactNode }) {
  return (
    <DialogPrimitive.Portal>
      <DialogPrimitive.Overlay className={overlayClass} />
      {/* Without a description, aria-describedby is cleared so it never points at a missing element. */}
      <DialogPrimitive.Content className={panelClass(size)} {...(description ? {} : { "aria-describedby": undefined })}>
        <div className="mb-3 flex items-start justify-between gap-4">
          <DialogPrimitive.Title className="text-lg font-semibold">{title}</DialogPrimitive.Title>
          <DialogPrimitive.Close className="-mr-1 -mt-1 rounded px-2 py-1 text-sm text-loam-600 hover:bg-loam-100 dark:text-loam-400 dark:hover:bg-loam-800" aria-label="Close">
            <span aria-hidden="true">✕</span>
          </DialogPrimitive.Close>
        </div>
        {description ? (
          <DialogPrimitive.Description className="mb-3 text-sm text-loam-600 dark:text-loam-400">{description}</DialogPrimitive.Description>
        ) : null}
        {children}
        {footer && <div className="mt-5 flex flex-wrap justify-end gap-2">{footer}</div>}
      </DialogPrimitive.Content>
    </DialogPrimitive.Portal>
  );
}
