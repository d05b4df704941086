import { describe, expect, it } from "vitest";
import { navFor } from "@/lib/nav";
import { ConsoleShell } from "./pages/console-shell";
import { MailPage } from "./pages/mail-page";
import { PeoplePage } from "./pages/people-page";
import { LINK_USED, SetPasswordPage } from "./pages/set-password-page";
import { SignInPage } from "./pages/sign-in-page";
import { BASE_URL, uniqueEmail, withSession } from "./support/browser";
import { demoUser } from "./support/demo-users";

/** The mailed link with its origin swapped for the one under test. */
function onBaseUrl(link: string): string {
  const url = new URL(link);
  return `${BASE_URL}${url.pathname}${url.search}`;
}

describe("invitation", () => {
  it("lets an invited engineer set a password from the mailed link, sign in once, and not reuse the link", async () => {
    const email = uniqueEmail("invitee");
    const admin = demoUser("admin");

    const link = await withSession({ label: "invitation-admin" }, async ({ page }) => {
      await new SignInPage(page).open();
      await new SignInPage(page).signIn(admin.email, admin.password);

      const people = new PeoplePage(page);
      await people.open();
      await people.invite({ name: "Ines Invitee", email, role: "engineer" });
      await people.notice().filter({ hasText: `Invitation sent to ${email}` }).waitFor();

      const mail = new MailPage(page);
      await mail.openMessageTo(email);
      await page.getByRole("heading", { level: 1, name: "Your Roostline invitation" }).waitFor();
      const setPasswordLinks = (await mail.messageLinks()).filter((l) => new URL(l).pathname === "/set-password");
      expect(setPasswordLinks).toHaveLength(1);
      return onBaseUrl(setPasswordLinks[0]!);
    });
    expect(new URL(link).searchParams.get("welcome")).toBe("1");

    // The invitee uses a browser of their own.
    await withSession({ label: "invitation-invitee" }, async ({ page }) => {
      const password = "a sentence only Ines knows";
      const setPassword = new SetPasswordPage(page);
      await setPassword.open(link);
      await page.getByRole("heading", { level: 1, name: "Welcome to Roostline" }).waitFor();
      await setPassword.submit(password);

      const signIn = new SignInPage(page);
      await page.waitForURL((url) => url.pathname === "/sign-in" && url.searchParams.get("passwordSet") === "1");
      await signIn.ready();
      await signIn.notice("Your password is set. Sign in with it now.").waitFor();

      await signIn.signIn(email, password);
      const nav = await new ConsoleShell(page).navItems();
      expect(nav.map((n) => n.label)).toEqual(navFor("engineer").map((n) => n.label));

      // A spent link says so at once, without offering the form again.
      await page.goto(link);
      await page.getByText(LINK_USED).waitFor();
      expect(await setPassword.form().count()).toBe(0);
    });
  });
});
