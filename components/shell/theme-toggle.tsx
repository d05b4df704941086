"use client";
import { useEffect, useState } from "react";

type Theme = "light" | "dark" | "system";
const KEY = "roostline-theme";

function apply(theme: Theme) {
  const dark = theme === "dark" || (theme === "system" && matchMedia("(prefers-color-scheme: dark)").matches);
  document.documentElement.classList.toggle("dark", dark);
}

/** Light, dark or follow the system; remembered in this browser. */
export function ThemeToggle() {
  const [theme, setTheme] = useState<Theme>("system");
  useEffect(() => {
    const saved = localStorage.getItem(KEY);
    if (saved === "light" || saved === "dark") setTheme(saved);
  }, []);
  function choose(next: Theme) {
    setTheme(next);
    if (next === "system") localStorage.removeItem(KEY);
    else localStorage.setItem(KEY, next);
    apply(next);
  }
  return (
    <fieldset className="flex items-center gap-1 text-sm">
      <legend className="sr-only">Theme</legend>
      {(["light", "dark", "system"] as const).map((t) => (
        <label key={t} className={`cursor-pointer rounded px-2 py-1 ${theme === t ? "bg-dusk-100 text-dusk-800 dark:bg-dusk-800 dark:text-dusk-100" : "hover:bg-loam-100 dark:hover:bg-loam-800"}`}>
          <input type="radio" name="theme" value={t} checked={theme === t} onChange={() => choose(t)} className="sr-only" />
          {t === "system" ? "Auto" : t[0]!.toUpperCase() + t.slice(1)}
        </label>
      ))}
    </fieldset>
  );
}
