import type { Page } from "playwright-core";
import { appUrl } from "../support/browser";

/** /admin/mail and /admin/mail/[id]: the outbox and what the local SMTP stand-in captured. */
export class MailPage {
  constructor(private readonly page: Page) {}

  readonly heading = () => this.page.getByRole("heading", { level: 1, name: "Mail" });
  readonly capturedRowsTo = (email: string) =>
    this.page.getByRole("table", { name: "Captured messages" }).getByRole("row").filter({ hasText: email });

  async open(): Promise<void> {
    await this.page.goto(appUrl("/admin/mail"));
    await this.heading().waitFor();
  }

  /** Reloads the list until a message to `email` is there (delivery takes a moment), then opens it. */
  async openMessageTo(email: string, timeoutMs = 15_000): Promise<void> {
    const until = Date.now() + timeoutMs;
    await this.open();
    while ((await this.capturedRowsTo(email).count()) === 0) {
      if (Date.now() > until) throw new Error(`no captured message to ${email} within ${timeoutMs} ms`);
      await this.page.waitForTimeout(500);
      await this.open();
    }
    await this.capturedRowsTo(email).first().getByRole("link").click();
    await this.page.waitForURL(/\/admin\/mail\/\d+$/);
  }

  /** The links listed on an opened message. */
  async messageLinks(): Promise<string[]> {
    const links = this.page.locator("a[data-testid=mail-link]");
    await links.first().waitFor();
    return links.evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? ""));
  }
}
