// Keyboard-only operation of the editor, a review and a data table, with a visible focus indicator on
// what Tab reaches. Pointer actions are used only to sign in; after that every step is a key press.
// Where something works but not as a keyboard user would expect (focus left behind, say), the step
// goes on the way a user would recover and the miss is collected, so one run lists every problem.
import type { Dialog, Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { SignInPage } from "./pages/sign-in-page";
import { appUrl, DESKTOP, waitForHydration, withSession } from "./support/browser";
import { demoUser } from "./support/demo-users";
import { api, apiSignIn } from "./support/fleet";
import { createDoorModel, reviewableDocument, uniqueTag } from "./support/profiles";

type Focused = {
  tag: string;
  role: string | null;
  id: string;
  /** Label text, aria-label or own text, trimmed. */
  name: string;
  selected: string | null;
  shortcuts: string | null;
  insideMonaco: boolean;
  /** Where focus is, for messages and the focus-style report. */
  selector: string;
  indicator: { outline: string; boxShadow: string; visible: boolean };
};

/** Describes document.activeElement, including whether its computed style shows a focus indicator. */
async function focused(page: Page): Promise<Focused | null> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return null;
    const labelled = el.getAttribute("aria-labelledby");
    const labels = (el as HTMLInputElement).labels;
    const name = (
      el.getAttribute("aria-label") ??
      (labelled ? labelled.split(/\s+/).map((id) => document.getElementById(id)?.textContent ?? "").join(" ") : null) ??
      (labels && labels.length ? (labels[0]!.textContent ?? "") : null) ??
      el.textContent ??
      ""
    )
      .replace(/\s+/g, " ")
      .trim()
      .slice(0, 120);
    const style = getComputedStyle(el);
    const outlineWidth = parseFloat(style.outlineWidth) || 0;
    const visible = (style.outlineStyle !== "none" && outlineWidth > 0) || (style.boxShadow !== "none" && style.boxShadow !== "");
    const classes = typeof el.className === "string" ? el.className.split(/\s+/).filter(Boolean).slice(0, 3).join(".") : "";
    return {
      tag: el.tagName.toLowerCase(),
      role: el.getAttribute("role"),
      id: el.id,
      name,
      selected: el.getAttribute("aria-selected"),
      shortcuts: el.getAttribute("aria-keyshortcuts"),
      insideMonaco: !!el.closest(".monaco-editor"),
      selector: `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""}${classes ? `.${classes}` : ""} “${name.slice(0, 40)}”`,
      indicator: { outline: `${style.outlineStyle} ${style.outlineWidth} ${style.outlineColor}`, boxShadow: style.boxShadow, visible },
    };
  });
}

/** Everything Tab has reached on a page, for the focus-indicator check. */
class FocusLog {
  readonly seen = new Map<string, Focused>();
  add(f: Focused | null): void {
    if (f && !f.insideMonaco && !this.seen.has(f.selector)) this.seen.set(f.selector, f);
  }
  /** Reached elements that show no outline and no box-shadow while focused. */
  missing(): string[] {
    return [...this.seen.values()].filter((f) => !f.indicator.visible).map((f) => `${f.selector} (outline ${f.indicator.outline}; box-shadow ${f.indicator.boxShadow})`);
  }
}

/** Presses Tab (or Shift+Tab) until the focused element matches; fails after `max` presses. */
async function tabTo(page: Page, what: string, match: (f: Focused) => boolean, log: FocusLog, { back = false, max = 150 } = {}): Promise<Focused> {
  const path: string[] = [];
  for (let i = 0; i < max; i++) {
    await page.keyboard.press(back ? "Shift+Tab" : "Tab");
    const f = await focused(page);
    log.add(f);
    if (f && match(f)) return f;
    path.push(f?.selector ?? "(body)");
  }
  throw new Error(`${back ? "Shift+Tab" : "Tab"} did not reach ${what} in ${max} presses; went through:\n  ${path.slice(-25).join("\n  ")}`);
}

const named = (text: string | RegExp) => (f: Focused) => (typeof text === "string" ? f.name === text : text.test(f.name));

async function signIn(page: Page, role: "engineer" | "reviewer" | "admin"): Promise<void> {
  const user = demoUser(role);
  const form = new SignInPage(page);
  await form.open();
  await form.signIn(user.email, user.password);
}

/** A draft base profile of the engineer's own (r1), through the API; with `submit`, r1 is put in review. */
async function makeProfile(submit: boolean): Promise<{ profileId: number; revisionId: number; name: string }> {
  const tag = uniqueTag();
  const engineer = demoUser("engineer");
  const cookie = await apiSignIn(engineer.email, engineer.password);
  const doorModelId = await createDoorModel(tag);
  const name = `E2E keys ${tag}`;
  const created = await api<{ profileId: number; revisionId: number }>(cookie, "POST", "/api/v1/profiles", { layer: "base", schemaVersion: 2, name, doorModelId, content: reviewableDocument() });
  if (created.status !== 201) throw new Error(`create profile: ${created.status} ${created.text}`);
  if (submit) {
    const r = await api(cookie, "POST", `/api/v1/revisions/${created.body.revisionId}/submit`, {
      acknowledgements: [{ ruleId: "RL-NO-SITE", reason: "Base profile: each site overlay is checked against its site." }],
    });
    if (r.status !== 200) throw new Error(`submit: ${r.status} ${r.text}`);
  }
  return { ...created.body, name };
}

const status = (page: Page, text: string | RegExp) => page.getByRole("main").getByRole("status").filter({ hasText: text });

function expectNoMisses(misses: string[], log: FocusLog, page: string): void {
  const noIndicator = log.missing();
  expect([...misses, ...noIndicator.map((m) => `no visible focus indicator: ${m}`)], `keyboard problems on ${page} (${log.seen.size} focusable elements reached)`).toEqual([]);
}

describe("keyboard operation", () => {
  it("edits a profile in Fields, switches views, saves and submits with keys only", async () => {
    const { profileId } = await makeProfile(false);
    const misses: string[] = [];
    const log = new FocusLog();
    await withSession({ label: "keyboard-editor", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      await signIn(page, "engineer");
      await page.goto(appUrl(`/profiles/${profileId}`));
      await waitForHydration(page, "#revision-message");
      await page.locator(".monaco-editor .view-lines .view-line").first().waitFor();

      // The tablist holds one tab stop (the selected tab); arrows move between Text and Fields.
      await tabTo(page, "the Text tab", (f) => f.role === "tab" && f.name === "Text", log);
      await page.keyboard.press("ArrowRight");
      let at = await focused(page);
      expect(at?.name, "ArrowRight on the Text tab").toBe("Fields");
      expect(at?.selected).toBe("true");
      await page.getByRole("tabpanel", { name: "Fields" }).waitFor();

      // Into the Fields view: the debounce field, a new value typed over the old.
      await tabTo(page, "the Button debounce time field", (f) => f.tag === "input" && /^Button debounce time/.test(f.name), log);
      await page.keyboard.press("ControlOrMeta+A");
      await page.keyboard.type("45");
      const field = page.getByRole("tabpanel", { name: "Fields" }).getByLabel("Button debounce time", { exact: true });
      expect(await field.inputValue()).toBe("45");
      await page.getByText("Unsaved changes", { exact: true }).waitFor();

      // Back to the tabs with Shift+Tab; ArrowLeft shows the Text view with the new value in it.
      await tabTo(page, "the Fields tab", (f) => f.role === "tab", log, { back: true });
      await page.keyboard.press("ArrowLeft");
      at = await focused(page);
      expect(at?.name, "ArrowLeft on the Fields tab").toBe("Text");
      await page.getByRole("tabpanel", { name: "Text" }).waitFor();
      await page.keyboard.press("ArrowRight");
      await page.getByRole("tabpanel", { name: "Fields" }).waitFor();
      expect(await field.inputValue(), "the value survives the round trip through Text").toBe("45");

      // The message lives above the workbench: Shift+Tab up to it and type.
      await tabTo(page, "the What changed field", (f) => f.id === "revision-message", log, { back: true });
      await page.keyboard.type("Debounce 45 ms, typed with the keyboard");

      // Ctrl+S is documented for the whole workbench, but it ignores focus outside it (this field is
      // outside); Tab down to a field in the Fields view and press it there.
      await tabTo(page, "the Button debounce time field", (f) => f.tag === "input" && /^Button debounce time/.test(f.name), log);
      await page.keyboard.press("Control+S");
      await status(page, "Saved as a new revision.").waitFor();
      await page.getByRole("main").locator("header p").filter({ hasText: /newest revision r2\b/ }).waitFor();
      await page.getByText("No unsaved changes", { exact: true }).waitFor();

      // Submit: Tab to the toolbar button, Enter opens the submit panel.
      const before = await focused(page);
      // Saving moves focus to the notice above the workbench, so the toolbar lies ahead of it.
      if (!before) misses.push("after saving, focus fell back to the page body (the workbench remounts on the new revision)");
      await tabTo(page, "the Submit for review button", (f) => f.tag === "button" && f.name === "Submit for review", log);
      await page.keyboard.press("Enter");
      const panel = page.getByRole("dialog", { name: "Submit revision 2 for review" });
      await panel.waitFor();
      // The panel takes focus once it has rendered; give it a moment.
      let inPanel = false;
      for (let i = 0; i < 20 && !inPanel; i++) {
        inPanel = await panel.evaluate((d) => d.contains(document.activeElement));
        if (!inPanel) await page.waitForTimeout(50);
      }
      at = await focused(page);
      if (!inPanel) {
        misses.push(
          `opening the submit panel leaves focus on ${at?.selector ?? "(body)"}; the panel (components/profiles/revision-workspace.tsx, role=dialog) sits above the workbench in DOM order, so a keyboard user must Shift+Tab back up to it — focus its first reason field (or heading) when it opens`,
        );
      }
      const reason = await tabTo(page, "the RL-NO-SITE reason", (f) => f.id === "ack-RL-NO-SITE", log, { back: !inPanel });
      expect(reason.tag).toBe("textarea");
      await page.keyboard.type("Base profile: each site overlay is checked against its site.");
      await tabTo(page, "Submit revision 2", named("Submit revision 2"), log);
      await page.keyboard.press("Enter");
      await status(page, /^Submitted\. It needs \d approvals?/).waitFor();
      await page.getByRole("main").locator("header p").filter({ hasText: "Awaiting review" }).waitFor();
    });
    expectNoMisses(misses, log, `/profiles/${profileId}`);
  });

  it("reaches the comparison and the decision controls on a review and sends it back with keys only", async () => {
    const { revisionId } = await makeProfile(true);
    const misses: string[] = [];
    const log = new FocusLog();
    await withSession({ label: "keyboard-review", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      await signIn(page, "reviewer");
      await page.goto(appUrl(`/reviews/${revisionId}`));
      await waitForHydration(page, "#comment-body");

      // The text comparison is folded in a <details>: Enter on its summary opens it.
      await tabTo(page, "the Text comparison toggle", (f) => f.tag === "summary" && f.name === "Text comparison", log);
      await page.keyboard.press("Enter");
      const diff = page.getByLabel("Unified diff");
      await diff.waitFor({ state: "visible" });
      // A wide table or diff that scrolls sideways must be reachable to scroll with arrow keys.
      const scrollers = await page.evaluate(() =>
        [...document.querySelectorAll("main *")]
          .filter((el) => el.scrollWidth > el.clientWidth + 1 && ["auto", "scroll"].includes(getComputedStyle(el).overflowX))
          .filter((el) => !(el as HTMLElement).matches("a, button, input, select, textarea, summary, [tabindex]") && !el.querySelector("a, button, input, select, textarea, summary, [tabindex]"))
          .map((el) => `${el.tagName.toLowerCase()}.${[...el.classList].slice(0, 3).join(".")}${el.getAttribute("aria-label") ? ` [${el.getAttribute("aria-label")}]` : ""}`),
      );
      for (const s of scrollers) misses.push(`scrolls sideways but holds nothing focusable, so the keyboard cannot scroll it: ${s} (add tabIndex={0} with a label, or wrap instead)`);
      await page.keyboard.press("Enter");
      await diff.waitFor({ state: "hidden" });

      // A comment on a parameter: the select by arrow keys, the text typed, the button by Space.
      await tabTo(page, "the Parameter select", (f) => f.id === "comment-path", log);
      const firstPath = await page.locator("#comment-path").inputValue();
      await page.keyboard.press("ArrowDown");
      const chosen = await page.locator("#comment-path").inputValue();
      if (chosen === firstPath) misses.push("ArrowDown on the Parameter select (#comment-path) did not change the choice");
      await tabTo(page, "the Comment field", (f) => f.id === "comment-body", log);
      const comment = `Keyboard comment ${uniqueTag()}`;
      await page.keyboard.type(comment);
      await tabTo(page, "Add comment", named("Add comment"), log);
      await page.keyboard.press("Space");
      await page.getByRole("main").getByText(comment).first().waitFor();

      // Sending back without a note is refused next to the note, which then takes focus or is tabbed to.
      const afterComment = await focused(page);
      if (!afterComment) misses.push("after Add comment (router.refresh), focus fell back to the page body");
      await tabTo(page, "Send back", named("Send back"), log);
      await page.keyboard.press("Enter");
      await page.locator("#decision-comment-error").waitFor();
      const afterRefusal = await focused(page);
      if (afterRefusal?.id !== "decision-comment") {
        misses.push(`"Say what should change." is shown but focus stays on ${afterRefusal?.selector ?? "(body)"}; move focus to #decision-comment (components/profiles/review-actions.tsx) as the editor does for its message`);
        await tabTo(page, "the decision note", (f) => f.id === "decision-comment", log, { back: true });
      }
      await page.keyboard.type("Please check the debounce against the reed switch.");
      await tabTo(page, "Send back", named("Send back"), log);
      let asked: string | null = null;
      const onDialog = (d: Dialog) => {
        asked = d.message();
        void d.dismiss();
      };
      page.on("dialog", onDialog);
      await page.keyboard.press("Enter");
      await status(page, "Sent back to the author.").waitFor();
      page.off("dialog", onDialog);
      expect(asked, "sending back asks nothing").toBeNull();
    });
    expectNoMisses(misses, log, `/reviews/${revisionId}`);
  });

  it("approves by keyboard, answering the safety confirmation with Enter", async () => {
    const { revisionId } = await makeProfile(true);
    const log = new FocusLog();
    await withSession({ label: "keyboard-approve", viewport: DESKTOP, theme: "dark" }, async ({ page }) => {
      await signIn(page, "reviewer");
      await page.goto(appUrl(`/reviews/${revisionId}`));
      await waitForHydration(page, "#comment-body");
      await tabTo(page, "Approve", named("Approve"), log);
      await page.keyboard.press("Enter");
      // The confirm dialog opens with focus on Cancel; Tab reaches "Yes, approve".
      const dialog = page.getByRole("alertdialog", { name: "Approve this revision?" });
      const asked = await dialog.innerText();
      await page.keyboard.press("Tab");
      await expect.poll(() => page.evaluate(() => document.activeElement?.textContent?.trim())).toBe("Yes, approve");
      await page.keyboard.press("Enter");
      await status(page, /^Your approval is recorded \(1 of 2\)\.$|^Approved\.$/).waitFor();
      expect(asked ?? "", "a safety-relevant change asks before approving").toMatch(/safety-relevant/);
    });
    expectNoMisses([], log, `/reviews/${revisionId} (dark)`);
  });

  it("filters, sorts and pages a data table with keys only", async () => {
    const misses: string[] = [];
    const log = new FocusLog();
    // Enough audit events for a second page (25 a page), however few other suites have written yet.
    const { revisionId } = await makeProfile(false);
    const engineer = demoUser("engineer");
    const cookie = await apiSignIn(engineer.email, engineer.password);
    for (let i = 0; i < 30; i++) {
      const r = await api(cookie, "POST", `/api/v1/revisions/${revisionId}/comments`, { path: "/debounceMs", body: `Paging note ${i}` });
      if (r.status !== 201) throw new Error(`comment: ${r.status} ${r.text}`);
    }
    await withSession({ label: "keyboard-grid", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      await signIn(page, "admin");
      await page.goto(appUrl("/audit"));
      const table = page.getByRole("table", { name: "Audit events" });
      await table.locator("tbody tr").first().waitFor();
      await waitForHydration(page, 'input[type="search"]');
      const summary = page.getByRole("navigation", { name: "Audit events pages" }).locator("p[aria-live]");

      // Paging: Next moves to page 2; at the last page focus is handed to Previous, and back again.
      const pageLabel = page.getByRole("navigation", { name: "Audit events pages" }).getByText(/^Page \d+ of \d+$/);
      const pages = Number(/of (\d+)/.exec(await pageLabel.innerText())![1]);
      expect(pages, "the audit log has more than one page in the test database").toBeGreaterThan(1);
      await tabTo(page, "Next", named("Next"), log);
      await page.keyboard.press("Enter");
      await pageLabel.filter({ hasText: `Page 2 of ${pages}` }).waitFor();
      let at = await focused(page);
      if (pages === 2 ? at?.name !== "Previous" : at?.name !== "Next") misses.push(`after Next, focus is on ${at?.selector ?? "(body)"}`);
      if (pages > 2) {
        await tabTo(page, "Previous", named("Previous"), log, { back: true });
      }
      if ((await focused(page))?.name !== "Previous") await tabTo(page, "Previous", named("Previous"), log, { back: true });
      await page.keyboard.press("Space");
      await pageLabel.filter({ hasText: `Page 1 of ${pages}` }).waitFor();
      at = await focused(page);
      if (at?.name !== "Next") misses.push(`back on page 1 (Previous disabled), focus is on ${at?.selector ?? "(body)"} instead of Next`);

      // Sorting: Shift+Tab up to the Who header; Enter sorts ascending, Space descending.
      await tabTo(page, "the Who column's sort button", (f) => f.tag === "button" && /^Who\b/.test(f.name), log, { back: true });
      const who = table.locator("thead th").filter({ hasText: /^Who/ });
      await page.keyboard.press("Enter");
      await expect.poll(() => who.getAttribute("aria-sort")).toBe("ascending");
      const firstAsc = await table.locator("tbody tr").first().locator("td").nth(1).innerText();
      await page.keyboard.press("Space");
      await expect.poll(() => who.getAttribute("aria-sort")).toBe("descending");
      const firstDesc = await table.locator("tbody tr").first().locator("td").nth(1).innerText();
      expect(firstAsc.localeCompare(firstDesc, "en", { sensitivity: "base" }), `ascending starts with ${firstAsc}, descending with ${firstDesc}`).toBeLessThanOrEqual(0);
      at = await focused(page);
      if (!at || !/^Who\b/.test(at.name)) misses.push(`after sorting, focus left the Who header button for ${at?.selector ?? "(body)"}`);

      // Filtering: Shift+Tab to the Filter box, type, the table narrows; Escape clears a search field.
      await tabTo(page, "the Filter box", (f) => f.tag === "input" && f.name === "Filter", log, { back: true });
      const totalBefore = await summary.innerText();
      await page.keyboard.type("no-such-event-zzz");
      await table.getByText(/^No rows match/).waitFor();
      await tabTo(page, "Clear filter", named("Clear filter"), log);
      await page.keyboard.press("Enter");
      at = await focused(page);
      if (at?.name !== "Filter") misses.push(`Clear filter does not return focus to the Filter box (focus on ${at?.selector ?? "(body)"})`);
      await expect.poll(() => summary.innerText()).toBe(totalBefore);
      if (at?.name !== "Filter") await tabTo(page, "the Filter box", (f) => f.tag === "input" && f.name === "Filter", log, { back: true });
      await page.keyboard.type("admin");
      await expect.poll(() => summary.innerText()).not.toBe(totalBefore);
      const rows = await table.locator("tbody tr").count();
      expect(rows).toBeGreaterThan(0);
    });
    expectNoMisses(misses, log, "/audit");
  });
});
