import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { ConsoleShell } from "./pages/console-shell";
import { SignInPage, WRONG_CREDENTIALS } from "./pages/sign-in-page";
import { appUrl, expectNoStackTrace, uniqueEmail, withSession } from "./support/browser";
import { userExists } from "./support/db";
import { demoUser } from "./support/demo-users";
import { actionId, callFormAction } from "./support/server-action";

const INVITE = () => actionId("app/(console)/admin/users/actions.ts", "inviteUserAction");

async function signedInCookie(page: Page, role: Role): Promise<string> {
  const user = demoUser(role);
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(user.email, user.password);
  const cookies = await page.context().cookies(appUrl("/"));
  return cookies.map((c) => `${c.name}=${c.value}`).join("; ");
}

describe("bad input", () => {
  it("answers a wrong password and an unknown e-mail with the same message and no error details", async () => {
    await withSession({ label: "bad-sign-in" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();

      await signIn.submit(demoUser("admin").email, "not-the-password");
      await signIn.error().filter({ hasText: WRONG_CREDENTIALS }).waitFor();
      expect(await signIn.error().innerText()).toBe(WRONG_CREDENTIALS);
      expectNoStackTrace(await page.locator("body").innerText());

      // A fresh form, so the alert read below is the answer to the unknown address.
      await signIn.open();
      await signIn.submit(uniqueEmail("nobody"), "not-the-password");
      await signIn.error().filter({ hasText: WRONG_CREDENTIALS }).waitFor();
      expect(await signIn.error().innerText()).toBe(WRONG_CREDENTIALS);
      expectNoStackTrace(await page.locator("body").innerText());
      expect(new URL(page.url()).pathname).toBe("/sign-in");
    });
  });

  it("refuses a viewer who calls the invite action directly, and creates no user", async () => {
    await withSession({ label: "viewer-invite-action" }, async ({ page }) => {
      const cookie = await signedInCookie(page, "viewer");
      const email = uniqueEmail("smuggled");
      const { status, result, text } = await callFormAction({
        pagePath: "/admin/users",
        id: INVITE(),
        cookie,
        prevState: { ok: true },
        fields: { name: "Smuggled Admin", email, role: "admin" },
      });
      expect(status).toBe(200);
      expect(result).toMatchObject({ ok: false, code: "forbidden", message: "Your role does not allow this." });
      expectNoStackTrace(text);
      expect(await userExists(email)).toBe(false);
    });
  });

  it("accepts the same hand-made request from an admin, so the refusal above comes from the role check", async () => {
    await withSession({ label: "admin-invite-action" }, async ({ page }) => {
      const cookie = await signedInCookie(page, "admin");
      const email = uniqueEmail("direct");
      const { result } = await callFormAction({
        pagePath: "/admin/users",
        id: INVITE(),
        cookie,
        prevState: { ok: true },
        fields: { name: "Direct Invitee", email, role: "viewer" },
      });
      expect(result).toMatchObject({ ok: true, message: `Invitation sent to ${email} as Viewer.` });
      expect(await userExists(email)).toBe(true);
    });
  });

  it("shows the not-found page without a stack trace for /admin/mail/not-a-number", async () => {
    await withSession({ label: "mail-not-a-number" }, async ({ page }) => {
      await signedInCookie(page, "admin");
      await page.goto(appUrl("/admin/mail/not-a-number"));
      await new ConsoleShell(page).notFoundHeading().waitFor();
      expectNoStackTrace(await page.locator("body").innerText());
    });
  });
});
