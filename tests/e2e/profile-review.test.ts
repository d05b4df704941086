import { mkdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { demoUsers } from "@/db/seed/demo";
import { ProfilePage } from "./pages/profile-page";
import { ReviewPage } from "./pages/review-page";
import { SignInPage } from "./pages/sign-in-page";
import { ARTIFACTS, DESKTOP, withSession } from "./support/browser";
import { createBaseProfile, createDoorModel, databaseNow, reviewableDocument, uniqueTag, waitForCapturedMail, type CreatedProfile } from "./support/profiles";

const SCREENSHOTS = path.join(ARTIFACTS, "screenshots");
const DEBOUNCE = "Button debounce time";

function account(email: string) {
  const user = demoUsers.find((u) => u.email === email);
  if (!user) throw new Error(`the seed has no ${email}`);
  return user;
}
const engineer = account("engineer@hollowmere.example");
const reviewers = [account("reviewer@hollowmere.example"), account("reviewer2@hollowmere.example")] as const;

const asText = (doc: Record<string, unknown>) => JSON.stringify(doc, null, 2);

describe("profile review", () => {
  it("takes a base profile from a schema error through a saved, submitted revision to two approvals and the author's mail", async () => {
    const startedAt = await databaseNow();
    const tag = uniqueTag();
    const profileName = `E2E ${tag}`;
    const doorModelId = await createDoorModel(tag);
    const doc = reviewableDocument();
    const saveMessage = `Debounce 60 ms for bouncy reed contacts (${tag})`;
    mkdirSync(SCREENSHOTS, { recursive: true });

    const created: CreatedProfile = await withSession({ label: "profile-review-engineer", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(engineer.email, engineer.password);
      const made = await createBaseProfile(page, { name: profileName, doorModelId, content: doc });

      const profile = new ProfilePage(page);
      await profile.open(made.profileId);
      await profile.heading(profileName).waitFor();
      expect(await profile.intro().innerText()).toMatch(/newest revision r1\b/);
      expect(await profile.problemSummary()).toBe("1 safety warning.");

      // 1. A string where the schema wants an integer: marked in Problems and in the text, refused on save.
      await profile.replaceText(asText({ ...doc, debounceMs: "fast" }));
      await profile.problemAt("/debounceMs").waitFor();
      expect(await profile.problemSummary()).toMatch(/^1 schema issue\b/);
      await profile.problemAt("/debounceMs").click();
      await profile.squiggles("error").first().waitFor();

      await profile.saveButton().click();
      await profile.messageError().filter({ hasText: "Say in a few words what changed" }).waitFor();

      await profile.writeMessage("Debounce as a word");
      await profile.saveButton().click();
      await profile.errorNotice().waitFor();
      const refusal = await profile.errorNotice().innerText();
      expect(refusal).toContain("/debounceMs");
      expect(refusal).toMatch(/does not match its schema/);
      expect(await profile.intro().innerText()).toMatch(/newest revision r1\b/);

      await profile.replaceText(asText(doc));
      await profile.problemAt("/debounceMs").waitFor({ state: "detached" });
      expect(await profile.problemSummary()).toBe("1 safety warning.");

      // 2. Fields and text edit the same document.
      await profile.tab("Fields").click();
      expect(await profile.field(DEBOUNCE).inputValue()).toBe("30");
      await profile.field(DEBOUNCE).fill("45");
      expect(await profile.textLine('"debounceMs"')).toMatch(/"debounceMs": 45,/);

      await profile.replaceText(asText({ ...doc, debounceMs: 60 }));
      await profile.tab("Fields").click();
      expect(await profile.field(DEBOUNCE).inputValue()).toBe("60");

      // 3. Saved with a message (Ctrl+S in the text editor): a new revision r2.
      await profile.writeMessage(saveMessage);
      await profile.tab("Text").click();
      await profile.focusEditor();
      await page.keyboard.press("Control+S");
      await profile.status("Saved as a new revision.").waitFor();
      await page.getByRole("main").locator("header p").filter({ hasText: /newest revision r2\b/ }).waitFor();
      await profile.editorReady();
      expect(await profile.textLine('"debounceMs"')).toMatch(/"debounceMs": 60,/);
      await page.getByRole("table", { name: "Revisions" }).getByRole("row").filter({ hasText: saveMessage }).waitFor();
      await profile.scrollToTop();
      await page.screenshot({ path: path.join(SCREENSHOTS, "profile-editor.png") });

      // 4. Submitting needs a reason for the RL-NO-SITE warning.
      await profile.submitButton().click();
      const panel = profile.submitPanel(2);
      await panel.waitFor();
      await profile.reasonFor("RL-NO-SITE").waitFor();
      await panel.getByRole("button", { name: "Submit revision 2" }).click();
      // Refused in the browser, with the message next to the reason it is about.
      await panel.getByRole("alert").filter({ hasText: /reason of at least 10 characters/ }).waitFor();
      expect(await profile.reasonFor("RL-NO-SITE").getAttribute("aria-invalid")).toBe("true");
      expect(await profile.intro().innerText()).toMatch(/\bDraft\b/);

      await profile.reasonFor("RL-NO-SITE").fill("Base profile: the site overlays are checked against each site.");
      await panel.getByRole("button", { name: "Submit revision 2" }).click();
      await profile.status(/^Submitted\. It needs 2 approvals/).waitFor();
      await panel.waitFor({ state: "detached" });
      await page.getByRole("main").locator("header p").filter({ hasText: "Awaiting review" }).waitFor();

      const revisionId = Number(new URL(await page.getByRole("link", { name: "Open the review" }).evaluate((a) => (a as HTMLAnchorElement).href)).pathname.split("/").pop());
      return { profileId: made.profileId, revisionId };
    });

    // 5. Two reviewers, each in a browser of their own.
    const comment = `Is 60 ms slow enough for the reed switch? (${tag})`;
    await withSession({ label: "profile-review-reviewer-1", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(reviewers[0].email, reviewers[0].password);

      const review = new ReviewPage(page);
      await review.openQueue();
      expect(await review.queueRow(profileName).innerText()).toContain(`r2: ${saveMessage}`);
      expect(await review.openFromQueue(profileName)).toBe(created.revisionId);
      expect(await review.heading().innerText()).toBe(`r2: ${saveMessage}`);
      expect(await review.intro().innerText()).toMatch(/0 of 2 approvals/);

      await review.comparison().waitFor();
      expect(await review.comparisonRow("/debounceMs").innerText()).toMatch(/—\s*→\s*60/);
      expect(await review.checks().innerText()).toContain("Base profile: the site overlays are checked against each site.");

      await review.commentOn("/debounceMs", comment);
      await page.reload();
      await review.ready();
      expect(await review.comparisonRow("/debounceMs").innerText()).toContain(`${reviewers[0].name}: ${comment}`);
      await page.evaluate(() => window.scrollTo(0, 0));
      await page.screenshot({ path: path.join(SCREENSHOTS, "review.png") });

      const asked = await review.approve();
      expect(asked).toMatch(/safety-relevant/);
      await review.status("Your approval is recorded (1 of 2).").waitFor();
      await review.intro().filter({ hasText: "1 of 2 approvals" }).waitFor();
    });

    await withSession({ label: "profile-review-reviewer-2", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(reviewers[1].email, reviewers[1].password);

      const review = new ReviewPage(page);
      await review.open(created.revisionId);
      expect(await review.comparisonRow("/debounceMs").innerText()).toContain(`${reviewers[0].name}: ${comment}`);
      expect(await review.approve()).toMatch(/safety-relevant/);
      await review.status(/^Approved\.$/).waitFor();
      await review.intro().filter({ hasText: "2 of 2 approvals" }).waitFor();
      expect(await review.intro().innerText()).toContain("Approved");
    });

    // 6. The author hears by mail.
    const mail = await waitForCapturedMail({
      to: engineer.email,
      since: startedAt,
      matches: (m) => /approved/i.test(m.subject) && new RegExp(`/profiles/${created.profileId}(?!\\d)`).test(m.textBody),
    });
    expect(mail.subject).toBe("Revision 2 is approved");
    expect(mail.textBody).toContain(saveMessage);
  });

  it("checks a value typed in Fields at once and will not submit a document with a schema issue (Ctrl+Enter)", async () => {
    const tag = uniqueTag();
    const doorModelId = await createDoorModel(tag);
    const doc = reviewableDocument();

    await withSession({ label: "profile-fields-check", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(engineer.email, engineer.password);
      const { profileId } = await createBaseProfile(page, { name: `E2E fields ${tag}`, doorModelId, content: doc });

      const profile = new ProfilePage(page);
      await profile.open(profileId);
      await profile.tab("Fields").click();

      // Not a number: held in the field with its message, never written to the document.
      await profile.field(DEBOUNCE).fill("fast");
      await profile.fieldBlock("/debounceMs").filter({ hasText: "must be a whole number" }).waitFor();
      expect(await profile.field(DEBOUNCE).getAttribute("aria-invalid")).toBe("true");
      expect(await profile.textLine('"debounceMs"')).toMatch(/"debounceMs": 30,/);

      // A number beyond the schema's 500 ms: written, flagged in the field and in Problems.
      await profile.tab("Fields").click();
      await profile.field(DEBOUNCE).fill("600");
      await profile.fieldBlock("/debounceMs").filter({ hasText: "must be at most 500 ms" }).waitFor();
      await profile.problemAt("/debounceMs").waitFor();
      expect(await profile.textLine('"debounceMs"')).toMatch(/"debounceMs": 600,/);

      await page.keyboard.press("Control+Enter");
      await profile.workbenchNotice(/^Not submitted: 1 schema issue\b/).waitFor();
      expect(await profile.submitPanel(1).count()).toBe(0);
      expect(await profile.intro().innerText()).toMatch(/newest revision r1\b.*\bDraft\b/);
    });
  });
});
