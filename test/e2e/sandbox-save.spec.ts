import { randomBytes } from "node:crypto";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser } from "./support/browser";
import { screenshot } from "./support/screenshot";

// Issue 13 item 2: sandbox work survives "Sign in to save" and goes into the team as revision 1.
const TEAM = "demo-composites-lab";
const editor = { email: "editor@demo.craquelure.local", password: "demo-editor-password" };
const runId = randomBytes(3).toString("hex");
const scenarioName = `Rib from the sandbox ${runId}`;
const typedPath = "ε11=1.2% over 80\nσ11=0 over 40";

describe("sandbox → sign in → save to team", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("keeps the typed path across sign-in and saves it as revision 1 of a new scenario", async () => {
    const page = await (await newContext(browser)).newPage();
    await page.goto("/sandbox");
    const pathBox = page.getByLabel("Path in text form");
    await pathBox.fill(typedPath);
    await screenshot(page, "sandbox-save-01-typed-signed-out");

    await page.getByRole("link", { name: "Sign in to save" }).click();
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByLabel("E-mail address").fill(editor.email);
    await page.getByLabel("Password").fill(editor.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => url.pathname === "/sandbox");

    // Back in the sandbox with the same work, and the button now saves.
    await expect.poll(() => pathBox.inputValue(), { timeout: 30_000 }).toBe(typedPath);
    await page.getByRole("button", { name: "Save to team…" }).click();
    const form = page.getByRole("form", { name: "Save to team" });
    await form.getByLabel("Team").selectOption(TEAM);
    await form.getByLabel("Scenario name").fill(scenarioName);
    await form.getByLabel("What this revision holds (revision message)").fill("From the sandbox");
    await screenshot(page, "sandbox-save-02-form");
    await form.getByRole("button", { name: "Save as revision 1" }).click();

    await page.waitForURL(/\/teams\/demo-composites-lab\/scenarios\/[0-9a-f-]{36}$/);
    await expect
      .poll(() => page.getByTestId("revision-line").textContent(), { timeout: 30_000 })
      .toContain("Revision 1 of 1");
    expect(await page.getByTestId("scenario-title").textContent()).toContain(scenarioName);
    await expect
      .poll(() => page.getByLabel("Path in text form").inputValue(), { timeout: 30_000 })
      .toBe(typedPath);
    await screenshot(page, "sandbox-save-03-revision-1");

    // The kept work is gone once saved: a fresh sandbox opens on its template again.
    await page.goto("/sandbox");
    await expect
      .poll(() => page.getByLabel("Path in text form").inputValue(), { timeout: 30_000 })
      .not.toBe(typedPath);
  });
});
