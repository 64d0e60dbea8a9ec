import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

// Issue 13 item 8: the owner downloads the demo team's export, creates an empty team, imports
// the file there through the settings page and finds the demo scenarios in the new team.
const DEMO_TEAM = "demo-composites-lab";
const owner = { email: "owner@demo.craquelure.local", password: "demo-owner-password" };
const runId = randomBytes(3).toString("hex");

async function signIn(page: Page, who: { email: string; password: string }) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(who.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/teams/);
}

describe("team import", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("imports the demo team's export into a new, empty team", async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, owner);

    await page.goto(`/teams/${DEMO_TEAM}/scenarios`);
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download the team export" }).click(),
    ]);
    const exportPath = (await download.path())!;
    const exported = JSON.parse(readFileSync(exportPath, "utf8")) as {
      scenarios: { name: string }[];
    };
    expect(exported.scenarios.length).toBeGreaterThan(0);

    // The demo team holds work: its own import section says so before any upload.
    await page.getByRole("link", { name: "Import a team export" }).click();
    await page.waitForURL(/\/settings#import$/);
    await expect
      .poll(() => page.getByRole("alert").first().textContent())
      .toContain("An import goes into an empty team");
    await screenshot(page, "team-import-01-demo-team-not-empty");

    await page.goto("/teams");
    await page.getByLabel("Team name").fill(`Import check ${runId}`);
    await page.getByRole("button", { name: "Create team" }).click();
    await page.waitForURL(/\/teams\/[^/]+$/);
    const slug = new URL(page.url()).pathname.split("/")[2];
    expect(slug).not.toBe(DEMO_TEAM);

    await page.goto(`/teams/${slug}/settings`);
    await page.getByLabel("Team export file (.json)").setInputFiles(exportPath);
    const totals = page.getByRole("table", { name: "What the import will create" });
    await totals.waitFor();
    const scenariosRow = (await totals.getByRole("row").first().textContent()) ?? "";
    const scenarioCount = Number(scenariosRow.replace(/\D+/g, ""));
    expect(scenarioCount).toBe(exported.scenarios.length);
    await screenshot(page, "team-import-02-summary");

    await page.getByRole("button", { name: "Import" }).click();
    const done = page.getByText(/^Imported \d+ scenarios?/);
    await done.waitFor({ timeout: 60_000 });
    expect(await done.textContent()).toContain(`Imported ${scenarioCount} scenario`);
    await screenshot(page, "team-import-03-done");

    await page.getByRole("link", { name: "Open the scenarios" }).click();
    await page.waitForURL(new RegExp(`/teams/${slug}/scenarios`));
    await page.getByText(exported.scenarios[0].name).first().waitFor({ timeout: 30_000 });
    await screenshot(page, "team-import-04-new-team-scenarios");
  });
});
