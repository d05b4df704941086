import { describe, expect, it } from "vitest";
import { navFor } from "@/lib/nav";
import { ConsoleShell } from "./pages/console-shell";
import { PeoplePage } from "./pages/people-page";
import { SignInPage } from "./pages/sign-in-page";
import { appUrl, withSession } from "./support/browser";
import { DEMO_ROLES, demoUser } from "./support/demo-users";

describe("navigation by role", () => {
  it.each(DEMO_ROLES)("shows only the %s's areas after sign-in, guards People and signs out", async (role) => {
    const user = demoUser(role);
    await withSession({ label: `navigation-${role}` }, async ({ page }) => {
      const signIn = new SignInPage(page);
      const shell = new ConsoleShell(page);
      await signIn.open();
      await signIn.signIn(user.email, user.password);
      expect(new URL(page.url()).pathname).toBe("/");

      const expected = navFor(role).map(({ label, href }) => ({ label, href }));
      expect(await shell.navItems()).toEqual(expected);

      await page.goto(appUrl("/admin/users"));
      if (role === "admin") {
        await new PeoplePage(page).heading().waitFor();
      } else {
        await shell.forbiddenHeading().waitFor();
        expect(await page.getByRole("heading", { level: 1, name: "People" }).count()).toBe(0);
        await page.goto(appUrl("/"));
      }

      await shell.signOut();
      await signIn.notice("You are signed out.").waitFor();

      // The session is really gone: the console sends us back to sign-in.
      await page.goto(appUrl("/"));
      await signIn.heading().waitFor();
      expect(new URL(page.url()).pathname).toBe("/sign-in");
    });
  });
});
