// axe-core in the page under test: every violation written to .artifacts/axe/<label>.json, the serious
// and critical ones returned (or failed on). The pages' content security policy blocks inline
// scripts, so axe is evaluated through DevTools (page.evaluate), which the policy does not govern;
// page.addScriptTag would be blocked and reported as a CSP violation.
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import type { AxeResults, ImpactValue, Result } from "axe-core";
import type { Page } from "playwright-core";
import { expect } from "vitest";
import { ARTIFACTS } from "./browser";

const AXE_DIR = path.join(ARTIFACTS, "axe");
let axeSource: string | null = null;

function source(): string {
  axeSource ??= readFileSync(path.resolve(process.cwd(), "node_modules/axe-core/axe.min.js"), "utf8");
  return axeSource;
}

export type A11yOptions = {
  /** CSS selectors whose subtrees axe skips. Only third-party DOM we do not render ourselves belongs here. */
  exclude?: string[];
};

export type A11yViolation = Pick<Result, "id" | "impact" | "help" | "helpUrl" | "description"> & {
  nodes: { target: string[]; html: string; summary: string | undefined }[];
};

const BLOCKING: ImpactValue[] = ["serious", "critical"];

/** Runs axe on the page, writes all violations to .artifacts/axe/<label>.json and returns the serious and critical ones. */
export async function checkA11y(page: Page, label: string, options: A11yOptions = {}): Promise<A11yViolation[]> {
  const loaded = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe === "object");
  // The trailing expression keeps the evaluation's completion value serialisable.
  if (!loaded) await page.evaluate(`${source()}\n;void 0;`);
  const results = await page.evaluate(async (exclude) => {
    const axe = (window as unknown as { axe: { run: (context: unknown, options: unknown) => Promise<AxeResults> } }).axe;
    const context = exclude.length ? { include: [document], exclude: exclude.map((s) => [s]) } : document;
    const r = await axe.run(context, { resultTypes: ["violations"] });
    return { url: r.url, violations: r.violations };
  }, options.exclude ?? []);
  const violations: A11yViolation[] = results.violations.map((v) => ({
    id: v.id,
    impact: v.impact,
    help: v.help,
    helpUrl: v.helpUrl,
    description: v.description,
    nodes: v.nodes.map((n) => ({ target: n.target.map(String), html: n.html, summary: n.failureSummary })),
  }));
  mkdirSync(AXE_DIR, { recursive: true });
  const file = path.join(AXE_DIR, `${label.replace(/[^a-z0-9-]+/gi, "-")}.json`);
  writeFileSync(file, JSON.stringify({ label, url: results.url, excluded: options.exclude ?? [], violations }, null, 2) + "\n");
  return violations.filter((v) => v.impact != null && BLOCKING.includes(v.impact));
}

/** One readable line per violation: rule, impact, help and the first few target selectors. */
export function describeViolations(violations: A11yViolation[], firstTargets = 3): string {
  return violations
    .map((v) => {
      const targets = v.nodes.slice(0, firstTargets).map((n) => n.target.join(" >>> "));
      const more = v.nodes.length > firstTargets ? ` (+${v.nodes.length - firstTargets} more)` : "";
      return `${v.id} [${v.impact}] ${v.help} — ${targets.join(" | ")}${more}`;
    })
    .join("\n");
}

/** Fails when axe finds serious or critical violations, listing rule id, impact, help text and the first target selectors. */
export async function expectNoSeriousA11yViolations(page: Page, label: string, options: A11yOptions = {}): Promise<void> {
  const blocking = await checkA11y(page, label, options);
  expect(blocking.length, `serious or critical accessibility violations on ${label} (${page.url()}):\n${describeViolations(blocking)}`).toBe(0);
}
