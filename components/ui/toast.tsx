"use client";
import { Toast } from "radix-ui";
import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from "react";

export type ToastTone = "success" | "error" | "info";
export type ToastMessage = { title: string; description?: string; tone: ToastTone };
type Shown = ToastMessage & { id: number };

const ToastContext = createContext<{ notify: (message: ToastMessage) => void }>({
  // Outside the console shell there is no provider; a notice there is simply not shown.
  notify: () => {},
});

/** Shows a short notice after something worked: `notify({ title, description?, tone })`. */
export function useToast() {
  return useContext(ToastContext);
}

const TONE: Record<ToastTone, { border: string; label: string }> = {
  success: { border: "border-l-meadow-500", label: "Done" },
  error: { border: "border-l-ember-500", label: "Problem" },
  info: { border: "border-l-dusk-400", label: "Note" },
};

// A few at most: older ones make way so the corner never fills the screen of a phone.
const MAX_SHOWN = 3;

/** Holds the notices for the console; they are read out politely and close after about 5 s, paused on hover or focus. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [shown, setShown] = useState<Shown[]>([]);
  const nextId = useRef(1);
  const notify = useCallback((message: ToastMessage) => {
    const id = nextId.current++;
    setShown((list) => [...list.slice(-(MAX_SHOWN - 1)), { ...message, id }]);
  }, []);
  const value = useMemo(() => ({ notify }), [notify]);
  const remove = (id: number) => setShown((list) => list.filter((t) => t.id !== id));
  return (
    <Toast.Provider duration={5000} swipeDirection="right" label="Notice">
      <ToastContext.Provider value={value}>{children}</ToastContext.Provider>
      {shown.map((t) => (
        <Toast.Root
          key={t.id}
          type="background"
          defaultOpen
          onOpenChange={(open) => !open && remove(t.id)}
          className={`pointer-events-auto flex items-start gap-3 rounded-md border border-l-4 border-loam-200 bg-white p-3 text-sm text-loam-900 shadow-lg dark:border-loam-800 dark:bg-loam-900 dark:text-loam-100 ${TONE[t.tone].border}`}
        >
          <div className="min-w-0 flex-1">
            <Toast.Title className="font-semibold">
              <span className="sr-only">{TONE[t.tone].label}: </span>
              {t.title}
            </Toast.Title>
            {t.description && <Toast.Description className="mt-0.5 text-loam-600 dark:text-loam-400">{t.description}</Toast.Description>}
          </div>
          <Toast.Close className="-mr-1 -mt-1 rounded px-2 py-1 text-loam-600 hover:bg-loam-100 dark:text-loam-400 dark:hover:bg-loam-800" aria-label="Dismiss">
            <span aria-hidden="true">✕</span>
          </Toast.Close>
        </Toast.Root>
      ))}
      <Toast.Viewport label="Notices ({hotkey})" className="fixed bottom-0 right-0 z-[60] m-0 flex w-full max-w-sm list-none flex-col gap-2 p-4 outline-none" />
    </Toast.Provider>
  );
}
