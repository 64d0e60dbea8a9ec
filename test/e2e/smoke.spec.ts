import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser } from "./support/browser";
import { screenshot } from "./support/screenshot";

describe("the production build answers", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("serves the home page with the product name and a way into the sandbox", async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    const response = await page.goto("/");
    expect(response?.status()).toBe(200);
    await expect(page.title()).resolves.toContain("Craquelure");
    expect(await page.getByRole("link", { name: /sandbox/i }).count()).toBeGreaterThan(0);
    await screenshot(page, "home");
    await context.close();
  });
});
