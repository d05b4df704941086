// The tour's steps point only at things the console shell really renders for that role: the
// menu links (components/shell/nav-links.tsx) and the shell's own anchors (app/(console)/layout.tsx),
// both read here as source text.
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { ROLES } from "@/lib/auth/permissions";
import { navFor } from "@/lib/nav";
import { navTourId, SHELL_TARGETS, tourSelector } from "@/lib/tour/targets";
import { shouldStartTour, tourStorageKey, tourSteps } from "@/lib/tour/steps";

const source = (file: string) => readFileSync(path.resolve(process.cwd(), file), "utf8");
const navLinks = source("components/shell/nav-links.tsx");
const layout = source("app/(console)/layout.tsx");

/** The literal data-tour="…" names in a source file. */
function literalTourIds(text: string): string[] {
  return [...text.matchAll(/data-tour="([^"]+)"/g)].map((m) => m[1]!);
}

/** What `[data-tour="x"]` names, or null for any other selector. */
function tourIdOf(selector: string): string | null {
  return /^\[data-tour="([a-z0-9-]+)"\]$/.exec(selector)?.[1] ?? null;
}

describe("tour steps", () => {
  it("gives every role four to six steps, each with a title and a body", () => {
    for (const role of ROLES) {
      const steps = tourSteps(role);
      expect(steps.length, role).toBeGreaterThanOrEqual(4);
      expect(steps.length, role).toBeLessThanOrEqual(6);
      for (const step of steps) {
        expect(step.title.trim().length, `${role}: ${step.target}`).toBeGreaterThan(0);
        expect(step.body.trim().length, `${role}: ${step.title}`).toBeGreaterThan(20);
      }
    }
  });

  it("gives an unknown role no steps", () => {
    expect(tourSteps("owner")).toEqual([]);
    expect(tourSteps("toString")).toEqual([]);
  });

  it("marks every menu link with its data-tour name", () => {
    expect(navLinks).toContain("data-tour={navTourId(item.href)}");
  });

  it("renders the shell's own anchors in the console layout", () => {
    const ids = literalTourIds(layout);
    for (const id of Object.values(SHELL_TARGETS)) expect(ids).toContain(id);
  });

  it.each(ROLES)("points the %s's steps only at menu links that role sees or at the layout's anchors", (role) => {
    const navIds = new Set(navFor(role).map((item) => navTourId(item.href)));
    const layoutIds = new Set(literalTourIds(layout));
    for (const step of tourSteps(role)) {
      const id = tourIdOf(step.target);
      expect(id, `${step.title}: ${step.target} is a [data-tour] selector`).not.toBeNull();
      expect(navIds.has(id!) || layoutIds.has(id!), `${role} step "${step.title}" → ${id}`).toBe(true);
    }
  });

  it("covers each role's main areas", () => {
    const targets = (role: string) => new Set(tourSteps(role).map((s) => s.target));
    const nav = (href: string) => tourSelector(navTourId(href));
    expect([...targets("engineer")]).toEqual(expect.arrayContaining([nav("/profiles"), nav("/help")]));
    expect([...targets("reviewer")]).toEqual(expect.arrayContaining([nav("/reviews")]));
    expect([...targets("technician")]).toEqual(expect.arrayContaining([nav("/sites"), nav("/controllers")]));
    expect([...targets("admin")]).toEqual(expect.arrayContaining([nav("/admin/users"), nav("/releases"), nav("/controllers"), nav("/admin/mail")]));
    expect([...targets("viewer")]).toEqual(expect.arrayContaining([nav("/"), nav("/profiles"), nav("/tools")]));
  });

  it("repeats the stall caution where a step is about approving or calibrating", () => {
    const caution = /second line of defence, not a guarantee/;
    expect(tourSteps("reviewer").some((s) => /approve/i.test(s.title) && caution.test(s.body))).toBe(true);
    expect(tourSteps("technician").some((s) => /calibrat/i.test(s.title) && caution.test(s.body))).toBe(true);
  });

  it("names menu links by their path", () => {
    expect(navTourId("/")).toBe("nav-overview");
    expect(navTourId("/reviews")).toBe("nav-reviews");
    expect(navTourId("/admin/users")).toBe("nav-admin-users");
    expect(navTourId("/profiles?layer=base#top")).toBe("nav-profiles");
  });
});

describe("tour memory", () => {
  it("keys the memory by person and role", () => {
    expect(tourStorageKey("u_123", "reviewer")).toBe("roostline-tour:v1:u_123:reviewer");
    expect(tourStorageKey("u_123", "admin")).not.toBe(tourStorageKey("u_123", "reviewer"));
  });

  it("starts by itself only until the tour is finished or dismissed", () => {
    expect(shouldStartTour(null)).toBe(true);
    expect(shouldStartTour("completed")).toBe(false);
    expect(shouldStartTour("dismissed")).toBe(false);
    expect(shouldStartTour("something else")).toBe(true);
  });
});
