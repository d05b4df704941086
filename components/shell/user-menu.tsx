"use client";
import Link from "next/link";
import { useEffect, useRef } from "react";
import { ThemeToggle } from "./theme-toggle";

/** The signed-in person's menu: account, theme, sign out. */
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
  return (
    <details ref={ref} className="relative">
      <summary className="flex cursor-pointer list-none items-center gap-2 rounded-md px-2 py-1.5 hover:bg-loam-100 dark:hover:bg-loam-800" aria-label={`Account menu for ${name}`}>
        <span className="grid h-8 w-8 place-items-center rounded-full bg-straw-300 text-sm font-semibold text-loam-900">{initials}</span>
        <span className="hidden text-left sm:block">
          <span className="block text-sm font-medium leading-tight">{name}</span>
          <span className="block text-xs text-loam-600 dark:text-loam-400">{roleLabel}</span>
        </span>
      </summary>
      <div className="absolute right-0 z-20 mt-2 w-64 rounded-lg border border-loam-200 bg-white p-2 shadow-lg dark:border-loam-800 dark:bg-loam-900">
        <p className="truncate px-2 py-1 text-sm text-loam-600 dark:text-loam-400">{email}</p>
        <Link href="/account" className="block rounded px-2 py-1.5 text-sm text-loam-900 no-underline hover:bg-loam-100 dark:text-loam-100 dark:hover:bg-loam-800">
          Account and password
        </Link>
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
