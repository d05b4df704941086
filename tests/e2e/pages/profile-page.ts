import type { Locator, Page } from "playwright-core";
import { appUrl, waitForHydration } from "../support/browser";

/** Monaco renders spaces as no-break spaces. */
const plain = (text: string) => text.replace(/\u00a0/g, " ");

/**
 * /profiles/[profileId]: the head revision in the workbench (Text and Fields views, the Problems
 * panel), the "What changed" message, Save, and the submit-for-review panel.
 */
export class ProfilePage {
  constructor(private readonly page: Page) {}

  readonly heading = (name: string) => this.page.getByRole("heading", { level: 1, name, exact: true });
  /** The line under the heading: layer, door model, parameter set, "newest revision rN" and its state. */
  readonly intro = () => this.page.locator("main header p").first();
  readonly message = () => this.page.getByLabel("What changed (saved with the revision)");
  readonly messageError = () => this.page.locator("#revision-message-error");
  readonly tab = (name: "Text" | "Fields") => this.page.getByRole("tablist", { name: "Editor view" }).getByRole("tab", { name });
  readonly editor = () => this.page.locator(".monaco-editor").first();
  readonly saveButton = () => this.toolbarButton("Save");
  readonly submitButton = () => this.toolbarButton("Submit for review");
  /** The workspace's error notice ("Not done", with the server's issues). */
  readonly errorNotice = () => this.page.getByRole("main").getByRole("alert").filter({ hasText: "Not done" });
  readonly status = (text: string | RegExp) => this.page.getByRole("main").getByRole("status").filter({ hasText: text });
  readonly problems = () => this.page.getByRole("complementary", { name: "Problems" });
  /** A Problems panel entry naming a JSON pointer such as /debounceMs. */
  readonly problemAt = (pointer: string) => this.problems().getByRole("button").filter({ has: this.page.locator("code", { hasText: new RegExp(`^${escape(pointer)}$`) }) });
  readonly squiggles = (severity: "error" | "warning") => this.editor().locator(`.squiggly-${severity}`);
  readonly field = (label: string) => this.page.getByRole("tabpanel", { name: "Fields" }).getByLabel(label, { exact: true });
  /** A parameter's block in the Fields view: label, control, limits and its errors and findings. */
  readonly fieldBlock = (pointer: string) => this.page.getByRole("tabpanel", { name: "Fields" }).locator(`[data-pointer="${pointer}"]`);
  /** The workbench's own notice, e.g. "Not submitted: …". */
  readonly workbenchNotice = (text: string | RegExp) => this.page.getByRole("main").getByRole("alert").filter({ hasText: text });
  readonly submitPanel = (revisionNumber: number) => this.page.getByRole("dialog", { name: `Submit revision ${revisionNumber} for review` });
  readonly reasonFor = (ruleId: string) => this.page.locator(`textarea#ack-${ruleId}`);

  private toolbarButton(name: string): Locator {
    // The toolbar buttons carry their key shortcuts; the submit panel's button is named by revision.
    return this.page.getByRole("main").locator("button[aria-keyshortcuts]").filter({ hasText: new RegExp(`^${escape(name)}$`) });
  }

  async open(profileId: number): Promise<void> {
    await this.page.goto(appUrl(`/profiles/${profileId}`));
    await this.page.getByRole("main").locator("header h1").waitFor();
    await waitForHydration(this.page, "#revision-message");
    await this.editorReady();
  }

  /** Waits until Monaco has mounted and rendered its lines. */
  async editorReady(): Promise<void> {
    await this.editor().locator(".view-lines .view-line").first().waitFor();
  }

  /**
   * Replaces the whole Text view document the way pasting it would. Monaco treats typed and
   * keyboard.insertText() input as typing: it auto-closes the first "{" and auto-indents every new
   * line, so a multi-line document comes out mangled. A paste is taken verbatim.
   */
  async replaceText(text: string): Promise<void> {
    await this.tab("Text").click();
    await this.focusEditor();
    await this.page.keyboard.press("ControlOrMeta+A");
    await this.page.evaluate((pasted) => {
      const data = new DataTransfer();
      data.setData("text/plain", pasted);
      document.activeElement!.dispatchEvent(new ClipboardEvent("paste", { clipboardData: data, bubbles: true, cancelable: true }));
    }, text);
  }

  async focusEditor(): Promise<void> {
    await this.editor().locator(".view-lines").click();
    // Monaco's input is a hidden textarea or, where the browser has EditContext, a div.
    await this.page.waitForFunction((editor) => !!editor && editor.contains(document.activeElement) && document.activeElement !== document.body, await this.editor().elementHandle());
  }

  /**
   * The Text view line holding `needle`, found with Monaco's own find widget so the line is
   * scrolled into view (Monaco renders only the visible lines).
   */
  async textLine(needle: string): Promise<string> {
    await this.tab("Text").click();
    await this.focusEditor();
    await this.page.keyboard.press("ControlOrMeta+F");
    const find = this.editor().locator(".find-widget textarea, .find-widget input").first();
    await find.waitFor();
    await find.fill(needle);
    await this.page.keyboard.press("Enter");
    await this.page.keyboard.press("Escape");
    const line = this.editor().locator(".view-line").filter({ hasText: needle }).first();
    await line.waitFor();
    return plain(await line.innerText());
  }

  /** Waits until the live check has run on the current text ("Checking…" is gone) and returns the summary. */
  async problemSummary(): Promise<string> {
    const summary = this.problems().locator("[aria-live=polite]").first();
    await summary.filter({ hasNotText: "Checking…" }).waitFor();
    return summary.innerText();
  }

  /** Scrolls back to the top of the page (the editor's focus scrolls it), for a screenshot of the whole header. */
  async scrollToTop(): Promise<void> {
    await this.page.evaluate(() => window.scrollTo(0, 0));
  }

  async writeMessage(text: string): Promise<void> {
    await this.message().fill(text);
  }
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");
}
