import type { Page } from "playwright-core";

/** What every console page shares: the Main navigation and the account menu. */
export class ConsoleShell {
  constructor(private readonly page: Page) {}

  /** The visible Main navigation (the sidebar on desktop widths). */
  readonly mainNav = () => this.page.getByRole("navigation", { name: "Main" });
  readonly heading = (name: string | RegExp) => this.page.getByRole("heading", { level: 1, name });
  readonly forbiddenHeading = () => this.heading("Your role does not open this page");
  readonly notFoundHeading = () => this.heading("This page is not here");

  async navItems(): Promise<{ label: string; href: string }[]> {
    await this.mainNav().waitFor();
    return this.mainNav()
      .getByRole("link")
      .evaluateAll((links) => links.map((a) => ({ label: (a.textContent ?? "").trim(), href: a.getAttribute("href") ?? "" })));
  }

  /** Opens the account menu and signs out; resolves on the sign-in page. */
  async signOut(): Promise<void> {
    await this.page.locator("summary").filter({ hasText: "Account menu for" }).click();
    await this.page.getByRole("button", { name: "Sign out" }).click();
    await this.page.waitForURL((url) => url.pathname === "/sign-in");
  }
}
