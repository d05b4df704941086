"use client";
import Link from "next/link";
import { useEffect, useRef } from "react";
import { SHORTCUTS_OPEN_EVENT } from "@/lib/shortcuts";
import { TOUR_START_EVENT } from "@/lib/tour/steps";
import { ThemeToggle } from "./theme-toggle";

const itemClass = "block w-full rounded px-2 py-1.5 text-left text-sm text-loam-900 no-underline hover:bg-loam-100 dark:text-loam-100 dark:hover:bg-loam-800";

/** The signed-in person's menu: account, shortcuts, the tour, theme, sign out. */
export function UserMenu({ name, email, roleLabel, signOut }: { name: string; email: string; roleLabel: string; signOut: () => Promise<void> }) {
  const ref = useRef<HTMLDetailsElement>(null);
  useEffect(() => {
    function close(e: MouseEvent | KeyboardEvent) {
      const el = ref.current;
      if (!el?.open) return;
      if (e instanceof KeyboardEvent ? e.key === "Escape" : !el.contains(e.target as Node)) el.open = false;
    }
    document.addEventListener("click", close);
    document.addEventListener("keydown", close);
    return () => {
      document.removeEventListener("click", close);
      document.removeEventListener("keydown", close);
    };
  }, []);
  const initials = name
    .split(/\s+/)
    .map((p) => p[0])
    .join("")
    .slice(0, 2)
    .toUpperCase();
  // The overlay and the tour listen on window; the menu closes first so focus can move to them.
  function open(eventName: string) {
    if (ref.current) ref.current.open = false;
    window.dispatchEvent(new Event(eventName));
  }
  return (
    <details ref={ref} className="relative">
      <summary className="flex cursor-pointer list-none items-center gap-2 rounded-md px-2 py-1.5 hover:bg-loam-100 dark:hover:bg-loam-800">
        <span aria-hidden="true" className="grid h-8 w-8 place-items-center rounded-full bg-straw-300 text-sm font-semibold text-loam-900">{initials}</span>
        {/* The name is spoken on every width and shown from sm up, so what is seen is part of what is heard. */}
        <span className="sr-only">Account menu for </span>
        <span className="sr-only text-left sm:not-sr-only sm:block">
          <span className="block text-sm font-medium leading-tight">{name}</span>
          <span className="block text-xs text-loam-600 dark:text-loam-400">{roleLabel}</span>
        </span>
      </summary>
      <div className="absolute right-0 z-20 mt-2 w-64 rounded-lg border border-loam-200 bg-white p-2 shadow-lg dark:border-loam-800 dark:bg-loam-900">
        <p className="truncate px-2 py-1 text-sm text-loam-600 dark:text-loam-400">{email}</p>
        <Link href="/account" className={itemClass}>
          Account and password
        </Link>
        <button type="button" className={itemClass} onClick={() => open(SHORTCUTS_OPEN_EVENT)} aria-keyshortcuts="?">
          Keyboard shortcuts <kbd className="ml-1 rounded border border-loam-200 px-1 font-mono text-xs dark:border-loam-800">?</kbd>
        </button>
        <button type="button" className={itemClass} onClick={() => open(TOUR_START_EVENT)}>
          Show the tour again
        </button>
        <div className="my-1 border-t border-loam-100 px-1 pt-2 dark:border-loam-800">
          <ThemeToggle />
        </div>
        <form action={signOut} className="border-t border-loam-100 pt-1 dark:border-loam-800">
          <button type="submit" className="w-full rounded px-2 py-1.5 text-left text-sm hover:bg-loam-100 dark:hover:bg-loam-800">
            Sign out
          </button>
        </form>
      </div>
    </details>
  );
}
