import type { Locator, Page } from "playwright-core";
import { appUrl, waitForHydration } from "../support/browser";

/** The "Release rN" panel on a base profile's page (components/fleet/release-panel.tsx). */
export class ReleasePanel {
  constructor(private readonly page: Page) {}

  readonly heading = () => this.page.getByRole("heading", { level: 2, name: /^Release r\d+$/ });
  /** The panel's own container: the heading's parent. */
  readonly root = (): Locator => this.heading().locator("..");
  readonly target = () => this.root().getByLabel("To", { exact: true });
  readonly site = () => this.root().getByLabel("Site", { exact: true });
  readonly percent = () => this.root().getByLabel("First stage (% of the target)");
  readonly checkButton = () => this.root().getByRole("button", { name: "Check the release" });
  readonly check = () => this.page.getByRole("region", { name: "Release check" });
  readonly releaseButton = (percent: number) => this.check().getByRole("button", { name: `Release to ${percent} %` });
  readonly released = () => this.page.getByRole("main").getByRole("status").filter({ hasText: /^Released as release \d+\./ });

  async ready(): Promise<void> {
    await this.heading().waitFor();
    await waitForHydration(this.page, "#field-target");
  }

  /** Chooses one site and the first stage, then asks for the check. */
  async checkForSite(siteName: string, percent: number): Promise<void> {
    await this.target().selectOption({ label: "One site" });
    await this.site().selectOption({ label: siteName });
    await this.percent().fill(String(percent));
    await this.checkButton().click();
    await this.check().waitFor();
  }

  /** Confirms the checked release; resolves with the new release's id. */
  async release(percent: number): Promise<number> {
    await this.releaseButton(percent).click();
    await this.page.getByRole("alertdialog").getByRole("button", { name: "Yes, release", exact: true }).click();
    await this.released().waitFor();
    const text = await this.released().innerText();
    return Number(/release (\d+)/.exec(text)![1]);
  }
}

/** /releases: the releases table with adoption and the widen/pause/roll back controls. */
export class ReleasesPage {
  constructor(private readonly page: Page) {}

  readonly heading = () => this.page.getByRole("heading", { level: 1, name: "Releases", exact: true });
  readonly table = () => this.page.getByRole("table", { name: "Releases" });
  /** A release's row, by its first cell: "#id" directly followed (in its text content) by the creation time, "2026-12-02 02:46 UTC". */
  readonly row = (releaseId: number) =>
    this.table().locator("tbody tr").filter({ has: this.page.locator("td:first-child", { hasText: new RegExp(`^#${releaseId}(?=\\d{4}-\\d{2}-\\d{2} )`) }) });
  /**
   * The Adoption cell. The page means to mark it data-testid="adoption-{id}", but <Td> in
   * components/ui/surface.tsx takes only children and className and drops the attribute, so the
   * cell is found by its column (Release, Profile, Target, Stage, Adoption, …) instead.
   */
  readonly adoption = (releaseId: number) => this.row(releaseId).locator("td").nth(4);
  readonly widenInput = (releaseId: number) => this.row(releaseId).locator(`#widen-${releaseId}`);
  readonly widenButton = (releaseId: number) => this.row(releaseId).getByRole("button", { name: "Widen", exact: true });

  async open(): Promise<void> {
    await this.page.goto(appUrl("/releases"));
    await this.heading().waitFor();
  }

  /** "K of N running" from the adoption cell (its first line). */
  async adoptionLine(releaseId: number): Promise<string> {
    return (await this.adoption(releaseId).innerText()).split("\n")[0]!.trim();
  }

  /** Widens the release to `percent`, accepting the confirm dialog; resolves when the row shows the new stage. Returns the confirm text. */
  async widen(releaseId: number, percent: number): Promise<string> {
    await waitForHydration(this.page, `#widen-${releaseId}`);
    await this.widenInput(releaseId).fill(String(percent));
    await this.widenButton(releaseId).click();
    const dialog = this.page.getByRole("alertdialog", { name: `Widen release ${releaseId} to ${percent} %?` });
    const asked = await dialog.innerText();
    await dialog.getByRole("button", { name: "Yes, widen", exact: true }).click();
    await this.row(releaseId).getByRole("cell", { name: `${percent} %`, exact: true }).waitFor();
    return asked;
  }
}

/** /controllers/[serial]: assigned configuration, door health and the calibration upload. */
export class ControllerPage {
  constructor(private readonly page: Page) {}

  readonly heading = (serial: string) => this.page.getByRole("heading", { level: 1, name: serial, exact: true });
  readonly fileInput = () => this.page.getByLabel(/^Recorded run/);
  readonly runPlot = (runId?: number) => this.page.getByRole("img", { name: runId === undefined ? /^Calibration run \d+/ : new RegExp(`^Calibration run ${runId}\\b`) });
  readonly suggestions = () => this.page.getByRole("table", { name: "Suggested parameters" });
  readonly draftButton = (serial: string) => this.page.getByRole("button", { name: `Make these a draft overlay for ${serial}` });
  readonly draftSaved = () => this.page.getByRole("main").getByRole("status").filter({ hasText: /^Draft overlay saved\./ });
  readonly uploadError = () => this.page.getByRole("main").getByRole("alert").filter({ hasText: /^Not uploaded/ });

  async open(serial: string): Promise<void> {
    await this.page.goto(appUrl(`/controllers/${encodeURIComponent(serial)}`));
    await this.heading(serial).waitFor();
    await waitForHydration(this.page, "#calibration-file");
  }

  /** Uploads a CSV and waits for the plot (or the error notice). Returns the run's id from the plot's title. */
  async upload(file: string): Promise<number> {
    await this.fileInput().setInputFiles(file);
    await this.runPlot().or(this.uploadError()).first().waitFor();
    if (await this.uploadError().count()) throw new Error(`upload refused: ${await this.uploadError().innerText()}`);
    const title = await this.page.locator("svg title#run-plot-title").textContent();
    return Number(/Calibration run (\d+)/.exec(title ?? "")![1]);
  }
}
