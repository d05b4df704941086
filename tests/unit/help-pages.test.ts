import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { COMMANDS } from "@/lib/cli/registry";
import { CAUTION_POINTS, CAUTION_SHORT } from "@/lib/help/caution-text";
import { checkInFields, verificationSteps } from "@/lib/help/device-help";
import { HELP_SECTIONS } from "@/lib/help/sections";
import { TOOL_HELP } from "@/lib/help/tool-help";

const root = fileURLToPath(new URL("../../", import.meta.url));
const console_ = join(root, "app/(console)");

function pageFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? pageFiles(p) : name === "page.tsx" ? [p] : [];
  });
}

describe("the help pages", () => {
  it("has a page for every section in the index", () => {
    for (const s of HELP_SECTIONS) expect(existsSync(join(console_, s.href, "page.tsx")), s.href).toBe(true);
  });

  it("asks every signed-in reader for dashboard:read on every page", () => {
    const files = pageFiles(join(console_, "help"));
    expect(files.length).toBe(HELP_SECTIONS.length + 1);
    for (const f of files) expect(readFileSync(f, "utf8"), f).toMatch(/requirePageUser\("dashboard:read"\)/);
  });

  it("shows the full caution at the top of the safety-rules and fleet pages", () => {
    for (const page of ["safety-rules", "fleet"]) {
      const text = readFileSync(join(console_, "help", page, "page.tsx"), "utf8");
      expect(text, page).toMatch(/<Caution \/>/);
    }
  });

  it("words the caution with the three points it must make", () => {
    const all = [...CAUTION_POINTS, CAUTION_SHORT].join(" ");
    expect(all).toContain("second line of defence, not a guarantee");
    expect(CAUTION_POINTS.join(" ")).toMatch(/test the obstacle stop on the installed door/i);
    expect(CAUTION_POINTS.join(" ")).toMatch(/local codes and licensed practice/);
    expect(CAUTION_POINTS.join(" ")).toMatch(/mains wiring/);
    expect(CAUTION_POINTS.join(" ")).toMatch(/animal welfare/);
    expect(CAUTION_SHORT).toMatch(/obstacle stop/);
  });

  it("describes only tools that exist as a page, a route and a command, and marks where every statement comes from", () => {
    expect(TOOL_HELP.map((t) => t.slug).sort()).toEqual(Object.keys(COMMANDS).sort());
    for (const t of TOOL_HELP) {
      expect(existsSync(join(console_, "tools", t.slug, "page.tsx")), t.slug).toBe(true);
      expect(existsSync(join(root, "app/api/v1/tools", t.slug, "route.ts")), t.slug).toBe(true);
      expect(t.sources.length, t.slug).toBeGreaterThan(0);
    }
  });

  it("reads the verification steps and check-in fields from the API description", () => {
    const v = verificationSteps();
    expect(v.steps.length).toBeGreaterThanOrEqual(3);
    expect(v.steps.join(" ")).toContain("Ed25519");
    expect(v.after.join(" ")).toContain("refusedReason");
    const names = checkInFields().map((f) => f.name);
    expect(names).toEqual(expect.arrayContaining(["appliedHash", "refusedReason", "counters.doorCycles", "counters.stallEvents", "counters.timeFixAgeS"]));
    for (const f of checkInFields()) expect(f.description.length, f.name).toBeGreaterThan(0);
  });
});
