// Pure helpers of the UI primitives, and the markup they paint first (no browser here: server
// rendering only, so dialogs are checked closed and interaction is left to the browser tests).
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import AuditLoading from "@/app/(console)/audit/loading";
import ControllersLoading from "@/app/(console)/controllers/loading";
import ProfilesLoading from "@/app/(console)/profiles/loading";
import ReleasesLoading from "@/app/(console)/releases/loading";
import ReviewsLoading from "@/app/(console)/reviews/loading";
import SitesLoading from "@/app/(console)/sites/loading";
import { Button } from "@/components/ui/button";
import { ConfirmDialog, confirmTextMatches, doorCaution } from "@/components/ui/confirm-dialog";
import { percentOf, ProgressBar } from "@/components/ui/progress";
import { Skeleton, SkeletonPage } from "@/components/ui/skeleton";
import { ToastProvider } from "@/components/ui/toast";

describe("type-to-confirm", () => {
  it("accepts the expected text with case, spaces, a leading # or a trailing % aside", () => {
    expect(confirmTextMatches("12", "12")).toBe(true);
    expect(confirmTextMatches(" #12 ", "12")).toBe(true);
    expect(confirmTextMatches("rl-hm-0042", "RL-HM-0042")).toBe(true);
    expect(confirmTextMatches("100 %", "100")).toBe(true);
  });

  it("refuses anything else, and never matches an empty expectation", () => {
    expect(confirmTextMatches("1", "12")).toBe(false);
    expect(confirmTextMatches("121", "12")).toBe(false);
    expect(confirmTextMatches("RL-HM-0043", "RL-HM-0042")).toBe(false);
    expect(confirmTextMatches("", "")).toBe(false);
    expect(confirmTextMatches("#", "")).toBe(false);
  });
});

describe("door caution", () => {
  it("names the controller count and carries the stall and codes caution", () => {
    const text = doorCaution(3);
    expect(text).toMatch(/^Doors at 3 controllers will receive these parameters on their next poll\./);
    expect(text).toContain("Stall detection is a second line of defence, not a guarantee");
    expect(text).toContain("test the obstacle stop on site");
    expect(text).toContain("local codes and licensed practice for powered doors and animal-welfare rules");
    expect(doorCaution(1)).toMatch(/^Doors at 1 controller will/);
    expect(doorCaution("about 6 of the 12 controllers in the target")).toMatch(/^Doors at about 6 of the 12 controllers in the target will receive/);
    expect(doorCaution(undefined, "the previous release's parameters")).toMatch(/^Doors at the controllers concerned will receive the previous release's parameters/);
  });
});

describe("confirm dialog", () => {
  it("paints only its trigger while closed, marked as opening a dialog", () => {
    const html = renderToStaticMarkup(
      createElement(ConfirmDialog, { trigger: createElement(Button, null, "Roll back"), title: "Roll back release 4?", description: "Doors change.", confirmLabel: "Yes, roll back", onConfirm: () => {} }),
    );
    expect(html).toContain(">Roll back</button>");
    expect(html).toContain('aria-haspopup="dialog"');
    expect(html).not.toContain("Yes, roll back");
  });
});

describe("progress bar", () => {
  it("rounds and clamps fractions to whole percent", () => {
    expect(percentOf(0.424)).toBe(42);
    expect(percentOf(1.2)).toBe(100);
    expect(percentOf(-1)).toBe(0);
    expect(percentOf(null)).toBeNull();
    expect(percentOf(Number.NaN)).toBeNull();
  });

  it("is a labelled progressbar with its value as text", () => {
    const html = renderToStaticMarkup(createElement(ProgressBar, { label: "Uploading the run", value: 0.5 }));
    expect(html).toContain('role="progressbar"');
    expect(html).toContain('aria-valuenow="50"');
    expect(html).toContain('aria-valuetext="50 %"');
    const labelledBy = /aria-labelledby="([^"]+)"/.exec(html)?.[1];
    expect(labelledBy).toBeTruthy();
    expect(html).toContain(`<span id="${labelledBy}" class="font-medium">Uploading the run</span>`);
    expect(html).toContain(">50 %</span>");
  });

  it("says it is working while the amount is unknown", () => {
    const html = renderToStaticMarkup(createElement(ProgressBar, { label: "Analysing the run", value: null }));
    expect(html).not.toContain("aria-valuenow");
    expect(html).toContain('aria-valuetext="Working…"');
    expect(html).toContain('data-state="indeterminate"');
  });
});

describe("skeletons", () => {
  it("pulse only when motion is welcome and stay hidden from screen readers", () => {
    const html = renderToStaticMarkup(createElement(Skeleton, { className: "h-4" }));
    expect(html).toContain("motion-safe:animate-pulse");
    expect(html).not.toMatch(/(^|[\s"])animate-pulse/);
    expect(html).toContain('aria-hidden="true"');
  });

  it("announce one loading line per page", () => {
    const html = renderToStaticMarkup(createElement(SkeletonPage, { label: "Loading the sites…", children: createElement(Skeleton) }));
    expect(html).toMatch(/^<div role="status"/);
    expect(html).toContain('<span class="sr-only">Loading the sites…</span>');
  });

  it.each([
    ["profiles", ProfilesLoading],
    ["reviews", ReviewsLoading],
    ["controllers", ControllersLoading],
    ["releases", ReleasesLoading],
    ["sites", SitesLoading],
    ["audit", AuditLoading],
  ])("gives %s a loading page without a heading of its own", (_area, Loading) => {
    const html = renderToStaticMarkup(createElement(Loading));
    expect(html).toContain('role="status"');
    expect(html).toMatch(/class="sr-only">Loading the [a-z ]+…<\/span>/);
    // The page's own h1 arrives with the page; the browser tests wait for it by name.
    expect(html).not.toMatch(/<h[1-6]/);
  });
});

describe("toasts", () => {
  it("renders its children on the server without notices", () => {
    const html = renderToStaticMarkup(createElement(ToastProvider, null, createElement("p", null, "page")));
    expect(html).toContain("<p>page</p>");
    expect(html).not.toContain("<li");
  });
});
