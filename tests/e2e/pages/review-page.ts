import type { Page } from "playwright-core";
import { appUrl, waitForHydration } from "../support/browser";

/** /reviews (the queue) and /reviews/[revisionId] (comparison, checks, comments and the decision). */
export class ReviewPage {
  constructor(private readonly page: Page) {}

  readonly queueHeading = () => this.page.getByRole("heading", { level: 1, name: "Reviews", exact: true });
  readonly queue = () => this.page.getByRole("table", { name: "Waiting for your review" });
  /** The queue row of a profile's revision (profile names are unique to a test run). */
  readonly queueRow = (profileName: string) => this.queue().getByRole("row").filter({ hasText: profileName });

  readonly heading = () => this.page.getByRole("main").locator("header h1");
  /** The line under the heading: profile, author, state and "N of M approvals". */
  readonly intro = () => this.page.getByRole("main").locator("header p").first();
  readonly comparison = () => this.page.getByRole("table", { name: "Changed parameters" });
  readonly comparisonRow = (path: string) => this.comparison().locator(`tr[data-path="${path}"]`);
  readonly checks = () => this.page.getByRole("heading", { level: 2, name: "Checks" }).locator("..");
  readonly parameter = () => this.page.getByLabel("Parameter", { exact: true });
  readonly comment = () => this.page.getByLabel("Comment", { exact: true });
  readonly decisionNote = () => this.page.getByLabel("Note to the author (needed when sending back)");
  readonly approveButton = () => this.page.getByRole("button", { name: "Approve", exact: true });
  readonly status = (text: string | RegExp) => this.page.getByRole("main").getByRole("status").filter({ hasText: text });
  /** What the decision panel says once a decision is recorded. */
  readonly decisionOutcome = () => this.status(/^(Your approval is recorded \(\d+ of \d+\)\.|Approved\.|Sent back to the author\.)$/);
  readonly error = () => this.page.getByRole("main").getByRole("alert");

  async openQueue(): Promise<void> {
    await this.page.goto(appUrl("/reviews"));
    await this.queueHeading().waitFor();
  }

  /** Follows the queue's link to a profile's revision; resolves on the review page. */
  async openFromQueue(profileName: string): Promise<number> {
    await this.queueRow(profileName).getByRole("link").click();
    await this.page.waitForURL(/\/reviews\/\d+$/);
    await this.ready();
    return Number(new URL(this.page.url()).pathname.split("/").pop());
  }

  async open(revisionId: number): Promise<void> {
    await this.page.goto(appUrl(`/reviews/${revisionId}`));
    await this.ready();
  }

  async ready(): Promise<void> {
    await this.heading().waitFor();
    await waitForHydration(this.page, "#comment-body");
  }

  /** Comments on one parameter (by its JSON pointer) and waits for the refreshed page to show it. */
  async commentOn(path: string, text: string): Promise<void> {
    await this.parameter().selectOption(path);
    await this.comment().fill(text);
    await this.page.getByRole("button", { name: "Add comment" }).click();
    await this.comparisonRow(path).filter({ hasText: text }).waitFor();
  }

  /** Approves through the confirm dialog (which repeats the safety caution for a safety-relevant change); returns its text. */
  async approve(note?: string): Promise<string | null> {
    if (note) await this.decisionNote().fill(note);
    await this.approveButton().click();
    const dialog = this.page.getByRole("alertdialog", { name: "Approve this revision?" });
    const asked = await dialog.innerText();
    await dialog.getByRole("button", { name: "Yes, approve", exact: true }).click();
    await this.decisionOutcome().or(this.error()).first().waitFor();
    return asked;
  }
}
