import { mkdirSync, rmSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { demoUsers } from "@/db/seed/demo";
import { inStage } from "@/lib/fleet/stage";
import { defaultDocument } from "@/lib/profiles/defaults";
import { runSimulation, type FetchLike, type SimulationSummary } from "@/scripts/simulate";
import { ControllerPage, ReleasePanel, ReleasesPage } from "./pages/fleet-pages";
import { ProfilePage } from "./pages/profile-page";
import { SignInPage } from "./pages/sign-in-page";
import { ARTIFACTS, BASE_URL, DESKTOP, withSession } from "./support/browser";
import { apiSignIn, approvedBaseProfile, registerControllers, siteBySlug, stagedSerials, writeTokensFile, type RegisteredController } from "./support/fleet";
import { createDoorModel, uniqueTag } from "./support/profiles";

const SCREENSHOTS = path.join(ARTIFACTS, "screenshots");
const CALIBRATION_CSV = path.resolve(process.cwd(), "tests/fixtures/calibration/example-run.csv");
const CAUTION = "Controllers will move doors with animals nearby on this configuration.";
const FIRST_STAGE = 50;

function account(email: string) {
  const user = demoUsers.find((u) => u.email === email);
  if (!user) throw new Error(`the seed has no ${email}`);
  return user;
}
const admin = account("admin@hollowmere.example");
const engineer = account("engineer@hollowmere.example");
const technician = account("technician@hollowmere.example");
const reviewers = [account("reviewer@hollowmere.example"), account("reviewer2@hollowmere.example")] as const;

/** The base document the brief asks for: schema defaults with a 2,000 counts/s stall threshold, a 12 s timeout and Berlin time. */
function fleetDocument(): Record<string, unknown> {
  const doc = defaultDocument(2) as Record<string, unknown> & { stall: Record<string, unknown> };
  doc.stall.thresholdCps = 2000;
  doc.travelTimeoutMs = 12000;
  doc.timeZone = "Europe/Berlin";
  return doc;
}

type Round = { summary: SimulationSummary; configStatus: Map<string, number>; hosts: Set<string>; log: string[] };

/** One simulator round against the test server; records each controller's config status and every host asked. */
async function simulateOnce(tokensFile: string, controllers: number): Promise<Round> {
  const configStatus = new Map<string, number>();
  const hosts = new Set<string>();
  const log: string[] = [];
  const recordingFetch: FetchLike = async (url, init) => {
    const u = new URL(url);
    hosts.add(u.hostname);
    const res = await fetch(url, init);
    const m = /^\/api\/v1\/controllers\/([^/]+)\/config$/.exec(u.pathname);
    if (m && (init.method ?? "GET") === "GET") configStatus.set(decodeURIComponent(m[1]!), res.status);
    return res;
  };
  const summary = await runSimulation({ once: true, baseUrl: BASE_URL, tokens: tokensFile, controllers, intervalS: 1, progressS: 60 }, recordingFetch, (line) => log.push(line));
  return { summary, configStatus, hosts, log };
}

describe("fleet release", () => {
  it("releases an approved base profile to half of one site, widens it to all four controllers, and drafts an overlay from a calibration run", async () => {
    const tag = uniqueTag();
    mkdirSync(SCREENSHOTS, { recursive: true });

    // Data of this run's own: a door model, its approved base profile and four controllers at Lindenhof.
    const doorModelId = await createDoorModel(tag);
    const site = await siteBySlug("lindenhof");
    const [engineerCookie, technicianCookie, ...reviewerCookies] = await Promise.all([
      apiSignIn(engineer.email, engineer.password),
      apiSignIn(technician.email, technician.password),
      ...reviewers.map((r) => apiSignIn(r.email, r.password)),
    ]);
    const profileName = `E2E fleet ${tag}`;
    const base = await approvedBaseProfile({ engineerCookie: engineerCookie!, reviewerCookies, name: profileName, doorModelId, content: fleetDocument() });
    expect(base.requiredApprovals, "a new base profile is safety-relevant: two approvals").toBe(2);

    // Two serials in the 50 % stage and two outside it, so the first round shows both answers.
    const serials = stagedSerials(tag, 4, FIRST_STAGE, 2);
    const controllers: RegisteredController[] = await registerControllers(technicianCookie!, { serials, doorModelId, siteId: site.id });
    const staged = serials.filter((s) => inStage(s, FIRST_STAGE));
    expect(staged).toHaveLength(2);
    const tokensFile = writeTokensFile(controllers);

    try {
      // 1. The admin checks and releases r1 to 50 % of Lindenhof from the profile page.
      const releaseId = await withSession({ label: "fleet-admin-release", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
        const signIn = new SignInPage(page);
        await signIn.open();
        await signIn.signIn(admin.email, admin.password);

        await new ProfilePage(page).open(base.profileId);
        const panel = new ReleasePanel(page);
        await panel.ready();
        expect(await panel.heading().innerText()).toBe("Release r1");
        await panel.checkForSite(site.name, FIRST_STAGE);
        const check = await panel.check().innerText();
        expect(check).toContain(`4 controllers in the target; ${staged.length} in the first stage.`);
        expect(check).toContain(CAUTION);
        return panel.release(FIRST_STAGE);
      });
      expect(releaseId).toBeGreaterThan(0);

      // 2. One simulator round: the staged half gets a verified configuration, the rest 404.
      const first = await simulateOnce(tokensFile, 4);
      expect([...first.hosts]).toEqual(["127.0.0.1"]);
      expect(first.summary.errors, first.summary.errorSamples.join("\n")).toBe(0);
      expect(first.summary.exitCode).toBe(0);
      expect(first.summary).toMatchObject({ controllers: 4, ok: staged.length, verified: staged.length, refused: 0, notFound: 4 - staged.length, checkIns: 4 });
      for (const serial of serials) expect(first.configStatus.get(serial), `GET config for ${serial}`).toBe(staged.includes(serial) ? 200 : 404);

      // 3. Adoption on /releases, widening to 100 %, a second round: all four running.
      await withSession({ label: "fleet-admin-releases", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
        const signIn = new SignInPage(page);
        await signIn.open();
        await signIn.signIn(admin.email, admin.password);

        const releases = new ReleasesPage(page);
        await releases.open();
        expect(await releases.adoptionLine(releaseId)).toBe(`${staged.length} of ${staged.length} running`);
        expect(await releases.adoption(releaseId).innerText()).toContain("4 in target");

        const asked = await releases.widen(releaseId, 100);
        expect(asked).toContain(`Widen release ${releaseId} to 100 %?`);
        expect(asked).toContain("More doors with animals nearby will move on it.");
        await releases.adoption(releaseId).filter({ hasText: /^2 of 4 running/ }).waitFor();

        const second = await simulateOnce(tokensFile, 4);
        expect([...second.hosts]).toEqual(["127.0.0.1"]);
        expect(second.summary.errors, second.summary.errorSamples.join("\n")).toBe(0);
        expect(second.summary).toMatchObject({ ok: 4, verified: 4, refused: 0, notFound: 0, checkIns: 4, exitCode: 0 });
        for (const serial of serials) expect(second.configStatus.get(serial), `GET config for ${serial}`).toBe(200);

        await page.reload();
        await releases.heading().waitFor();
        expect(await releases.adoptionLine(releaseId)).toBe("4 of 4 running");
        await page.evaluate(() => window.scrollTo(0, 0));
        await page.screenshot({ path: path.join(SCREENSHOTS, "releases.png") });
      });

      // 4. The technician uploads a recorded run for one controller and drafts an overlay from it.
      const serial = staged[0]!;
      await withSession({ label: "fleet-technician-calibration", viewport: DESKTOP, theme: "light" }, async ({ page }) => {
        const signIn = new SignInPage(page);
        await signIn.open();
        await signIn.signIn(technician.email, technician.password);

        const controller = new ControllerPage(page);
        await controller.open(serial);
        const runId = await controller.upload(CALIBRATION_CSV);
        expect(runId).toBeGreaterThan(0);
        await controller.runPlot(runId).waitFor();
        await controller.suggestions().waitFor();
        expect(await controller.suggestions().getByRole("row").count()).toBeGreaterThan(0);

        await controller.draftButton(serial).click();
        await controller.draftSaved().waitFor();
        const href = await controller.draftSaved().getByRole("link", { name: "Open it" }).getAttribute("href");
        expect(href).toMatch(/^\/profiles\/\d+$/);
        expect(Number(href!.split("/").pop())).not.toBe(base.profileId);

        await page.evaluate(() => window.scrollTo(0, 0));
        await page.screenshot({ path: path.join(SCREENSHOTS, "controller.png") });
      });
    } finally {
      rmSync(path.dirname(tokensFile), { recursive: true, force: true });
    }
  }, 180_000);
});
