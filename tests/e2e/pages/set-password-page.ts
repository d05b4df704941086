import type { Page } from "playwright-core";
import { waitForHydration } from "../support/browser";

export const LINK_USED = "This link has expired or has already been used";

/** /set-password: where an invitee or a reset link chooses a password. */
export class SetPasswordPage {
  constructor(private readonly page: Page) {}

  readonly form = () => this.page.getByRole("form", { name: "Set password" });
  readonly error = () => this.form().getByRole("alert");

  async open(url: string): Promise<void> {
    await this.page.goto(url);
    await this.form().waitFor();
    await waitForHydration(this.page, 'form[aria-label="Set password"]');
  }

  async submit(password: string): Promise<void> {
    await this.form().getByLabel("New password").fill(password);
    await this.form().getByLabel("Repeat the password").fill(password);
    await this.form().getByRole("button", { name: "Set password" }).click();
  }
}
