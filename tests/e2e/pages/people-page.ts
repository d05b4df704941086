import type { Page } from "playwright-core";
import type { Role } from "@/lib/auth/permissions";
import { appUrl, waitForHydration } from "../support/browser";

/** /admin/users: the people table and the invitation form. */
export class PeoplePage {
  constructor(private readonly page: Page) {}

  readonly heading = () => this.page.getByRole("heading", { level: 1, name: "People" });
  readonly inviteForm = () => this.page.getByRole("form", { name: "Invite a colleague" });
  readonly notice = () => this.inviteForm().getByRole("status");

  async open(): Promise<void> {
    await this.page.goto(appUrl("/admin/users"));
    await this.heading().waitFor();
    await waitForHydration(this.page, 'form[aria-label="Invite a colleague"]');
  }

  async invite(person: { name: string; email: string; role: Role }): Promise<void> {
    const form = this.inviteForm();
    await form.getByLabel("Name").fill(person.name);
    await form.getByLabel("E-mail").fill(person.email);
    await form.getByLabel("Role").selectOption(person.role);
    await form.getByRole("button", { name: "Send invitation" }).click();
  }
}
