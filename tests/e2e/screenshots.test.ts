import { mkdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { MailPage } from "./pages/mail-page";
import { PeoplePage } from "./pages/people-page";
import { SignInPage } from "./pages/sign-in-page";
import { ARTIFACTS, DESKTOP, PHONE, withSession } from "./support/browser";
import { demoUser } from "./support/demo-users";

const DIR = path.join(ARTIFACTS, "screenshots");
const VIEWPORTS = { desktop: DESKTOP, phone: PHONE };
const CASES = (["desktop", "phone"] as const).flatMap((viewport) => (["light", "dark"] as const).map((theme) => ({ viewport, theme })));

describe("screenshots", () => {
  it.each(CASES)("renders sign-in, overview, people and mail in the $theme theme on $viewport", async ({ viewport, theme }) => {
    mkdirSync(DIR, { recursive: true });
    await withSession({ label: `screenshots-${viewport}-${theme}`, viewport: VIEWPORTS[viewport], theme }, async ({ page }) => {
      const shot = async (name: string) => {
        expect(await page.evaluate(() => document.documentElement.classList.contains("dark"))).toBe(theme === "dark");
        await page.screenshot({ path: path.join(DIR, `${name}-${viewport}-${theme}.png`) });
      };
      const admin = demoUser("admin");

      const signIn = new SignInPage(page);
      await signIn.open();
      await expectVisible(page, "Sign in to Roostline");
      await shot("sign-in");

      await signIn.signIn(admin.email, admin.password);
      await expectVisible(page, `Good to see you, ${admin.name.split(" ")[0]}`);
      await shot("overview");

      await new PeoplePage(page).open();
      await expectVisible(page, "People");
      await shot("people");

      await new MailPage(page).open();
      await expectVisible(page, "Mail");
      await shot("mail");
    });
  });
});

/** Waits for the page's h1 (a loading skeleton may come first), then asserts it is shown. */
async function expectVisible(page: Page, heading: string): Promise<void> {
  const h1 = page.getByRole("heading", { level: 1, name: heading, exact: true });
  await h1.waitFor({ state: "visible" });
  expect(await h1.isVisible()).toBe(true);
}
