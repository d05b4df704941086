import { describe, expect, it } from "vitest";
import { SignInPage } from "./pages/sign-in-page";
import { ARTIFACTS, appUrl, withSession } from "./support/browser";
import { demoUser } from "./support/demo-users";

const TOOLS = [
  { path: "/tools/travel", heading: "Drive train" },
  { path: "/tools/stall", heading: "Stall check" },
  { path: "/tools/debounce", heading: "Debounce" },
  { path: "/tools/sun", heading: "Sun and dusk" },
  { path: "/tools/timecode", heading: "Time codes" },
];

describe("calculation tools", () => {
  it("opens every tool page for a viewer, with its heading and no script errors", async () => {
    const viewer = demoUser("viewer");
    await withSession({ label: "tools" }, async ({ page }) => {
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(viewer.email, viewer.password);
      for (const tool of TOOLS) {
        await page.goto(appUrl(tool.path));
        const h1 = page.getByRole("heading", { level: 1 });
        await h1.waitFor();
        expect(await h1.textContent()).toContain(tool.heading.split(" ")[0]);
        await page.screenshot({ path: `${ARTIFACTS}/screenshots/tool-${tool.path.split("/").pop()}.png` });
      }
    });
  });

  it("answers a tool route with a 400 naming the wrong field", async () => {
    const res = await fetch(appUrl("/api/v1/tools/stall?nominalCps=2000&fraction=2&windowMs=50"));
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe("/fraction");
  });
});
