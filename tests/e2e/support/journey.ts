// Helpers for the whole-day journey: confirming whichever kind of confirmation a button asks for,
// running the simulator as its own process, and screenshots in both themes at both widths.
import { spawn } from "node:child_process";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Dialog, Locator, Page } from "playwright-core";
import { expect } from "vitest";
import { ARTIFACTS, BASE_URL, DESKTOP, PHONE } from "./browser";

export const JOURNEY_SHOTS = path.join(ARTIFACTS, "screenshots", "journey");

const CONFIRM_DIALOG = '[role="alertdialog"], [role="dialog"]';
const NOT_CONFIRM = /^(cancel|close|back|keep|no)\b/i;

/**
 * Clicks `button`, then accepts what asks before acting: a window.confirm, or an in-page
 * (alert)dialog that opens within a moment; a dialog asking for typed text gets the text its label
 * quotes. Resolves once `outcome` is shown. Returns what the confirmation said, or null when none asked.
 */
export async function clickAndConfirm(page: Page, button: Locator, outcome: Locator, settleMs = 1500): Promise<string | null> {
  let asked: string | null = null;
  const onDialog = (dialog: Dialog) => {
    asked = dialog.message();
    void dialog.accept();
  };
  page.on("dialog", onDialog);
  try {
    // Dialogs already open (a submit panel, say) are not the confirmation this click may bring.
    const before = await page.locator(CONFIRM_DIALOG).count();
    await button.click();
    const dialog = page.locator(CONFIRM_DIALOG).nth(before);
    const appeared = await Promise.race([
      dialog.waitFor({ state: "visible", timeout: settleMs }).then(() => true, () => false),
      outcome.first().waitFor({ state: "visible", timeout: settleMs }).then(() => false, () => false),
    ]);
    if (appeared) {
      asked = (await dialog.innerText()).trim();
      const input = dialog.locator("input:not([type=hidden]), textarea");
      if ((await input.count()) > 0) {
        const label = await dialog.locator("label").first().innerText().catch(() => "");
        const quoted = /[“"'‘]([^”"'’]+)[”"'’]/.exec(label)?.[1];
        if (quoted) await input.first().fill(quoted);
      }
      const buttons = dialog.getByRole("button");
      const names = await buttons.allInnerTexts();
      const index = names.map((n) => n.trim()).findLastIndex((n) => n !== "" && !NOT_CONFIRM.test(n));
      if (index < 0) throw new Error(`a dialog asked (${asked}) but offers no confirm button: ${JSON.stringify(names)}`);
      await buttons.nth(index).click();
    }
    await outcome.first().waitFor();
    return asked;
  } finally {
    page.off("dialog", onDialog);
  }
}

export type SimulatorRound = { exitCode: number | null; summary: Record<string, number>; output: string };

/** Runs scripts/simulate.ts once (one round) as its own process against the test server; parses its "done:" line. */
export async function runSimulator(tokensFile: string, controllers: number): Promise<SimulatorRound> {
  const args = ["tsx", "scripts/simulate.ts", "--once", "--base-url", BASE_URL, "--tokens", tokensFile, "--controllers", String(controllers), "--interval-s", "1", "--progress-s", "60"];
  const child = spawn("npx", args, { cwd: process.cwd(), env: process.env, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout.on("data", (d: Buffer) => (output += d.toString()));
  child.stderr.on("data", (d: Buffer) => (output += d.toString()));
  const exitCode = await new Promise<number | null>((resolve, reject) => {
    const timer = setTimeout(() => {
      child.kill("SIGTERM");
      reject(new Error(`the simulator did not finish within 60 s:\n${output}`));
    }, 60_000);
    child.on("error", reject);
    child.on("close", (code) => {
      clearTimeout(timer);
      resolve(code);
    });
  });
  const done = output.split("\n").find((l) => l.includes("[simulate] done:"));
  if (!done) throw new Error(`the simulator printed no summary (exit ${exitCode}):\n${output}`);
  const summary: Record<string, number> = {};
  for (const [, key, value] of done.matchAll(/\b(requests|200|304|404|429|check-ins|errors|verified|refused) (\d+)/g)) summary[key!] = Number(value);
  return { exitCode, summary, output };
}

export const SHOT_VARIANTS = [
  { viewport: "desktop", size: DESKTOP, theme: "light" },
  { viewport: "desktop", size: DESKTOP, theme: "dark" },
  { viewport: "phone", size: PHONE, theme: "light" },
  { viewport: "phone", size: PHONE, theme: "dark" },
] as const;

/** A page to shoot; an optional one is skipped where the build does not serve it (404). */
export type ShotPage = { name: string; path: string; ready: (page: Page) => Promise<void>; optional?: boolean };

/**
 * Screenshots every page in each theme and width, in the one signed-in browser: the theme is the
 * stored choice the theme switch writes, so the next load applies it. The session must be opened
 * without its own theme option, whose init script would overwrite the choice on every load.
 * Returns the files written.
 */
export async function shootPages(page: Page, pages: ShotPage[]): Promise<string[]> {
  mkdirSync(JOURNEY_SHOTS, { recursive: true });
  const written: string[] = [];
  for (const variant of SHOT_VARIANTS) {
    await page.setViewportSize(variant.size);
    await page.evaluate((t) => localStorage.setItem("roostline-theme", t), variant.theme);
    for (const p of pages) {
      const res = await page.goto(`${BASE_URL}${p.path}`);
      if (p.optional && res?.status() === 404) continue;
      await p.ready(page);
      expect(await page.evaluate(() => document.documentElement.classList.contains("dark")), `${p.name} in the ${variant.theme} theme`).toBe(variant.theme === "dark");
      await page.evaluate(() => window.scrollTo(0, 0));
      const file = path.join(JOURNEY_SHOTS, `${p.name}-${variant.viewport}-${variant.theme}.png`);
      await page.screenshot({ path: file });
      written.push(file);
    }
  }
  return written;
}

/** Waits for the page's h1 to be visible (a loading skeleton may come first). */
export function headingReady(name: string | RegExp): (page: Page) => Promise<void> {
  return async (page) => {
    await page.getByRole("heading", { level: 1, name }).first().waitFor({ state: "visible" });
  };
}
