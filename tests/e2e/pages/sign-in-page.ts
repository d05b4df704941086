import type { Page } from "playwright-core";
import { appUrl, waitForHydration } from "../support/browser";

export const WRONG_CREDENTIALS = "That e-mail address and password do not match an account. Check both and try again.";

/** /sign-in: the e-mail and password form and the notices above it. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  readonly heading = () => this.page.getByRole("heading", { level: 1, name: "Sign in to Roostline" });
  readonly form = () => this.page.getByRole("form", { name: "Sign in" });
  /** The form's error notice (role=alert). */
  readonly error = () => this.form().getByRole("alert");
  readonly notice = (text: string) => this.page.getByRole("status").filter({ hasText: text });

  async open(query = ""): Promise<void> {
    await this.page.goto(appUrl(`/sign-in${query}`));
    await this.ready();
  }

  /** Waits for the heading and for React to own the form (a click before that would submit it natively). */
  async ready(): Promise<void> {
    await this.heading().waitFor();
    await waitForHydration(this.page, 'form[aria-label="Sign in"]');
  }

  async submit(email: string, password: string): Promise<void> {
    await this.form().getByLabel("E-mail").fill(email);
    await this.form().getByLabel("Password", { exact: true }).fill(password);
    await this.form().getByRole("button", { name: "Sign in" }).click();
  }

  /** Signs in and waits until the console has loaded. */
  async signIn(email: string, password: string): Promise<void> {
    await this.submit(email, password);
    await this.page.waitForURL((url) => url.pathname !== "/sign-in");
    await this.page.getByRole("main").waitFor();
  }
}
