/**
 * A seeded test record over the saved demo scenario's stress–strain chart: drawn on σ11–ε11,
 * gone when the chart shows another pair, and not part of what the revision saves.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

const TEAM = "demo-composites-lab";
const RECORD = "Demo cyclic tension A (invented)";

async function stressStrainTraces(page: Page): Promise<{ name: string; dash?: string }[]> {
  return page.evaluate(() => {
    const gd = document.querySelector(
      '[data-chart="stress-strain"] .js-plotly-plot',
    ) as unknown as {
      data?: { name: string; line?: { dash?: string } }[];
    } | null;
    return (gd?.data ?? []).map((t) => ({ name: t.name, dash: t.line?.dash }));
  });
}

describe("test records over the scenario's charts", () => {
  let browser: Browser;
  let page: Page;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await (await newContext(browser)).newPage();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("draws a ticked record on its own stress–strain pair only", async () => {
    await page.goto("/sign-in");
    await page.getByLabel("E-mail address").fill("editor@demo.craquelure.local");
    await page.getByLabel("Password").fill("demo-editor-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));

    await page.goto(`/teams/${TEAM}/scenarios`);
    await page
      .getByRole("link", { name: /^Demo SMC plate/ })
      .first()
      .click();
    await page.waitForURL(/\/scenarios\/[0-9a-f-]{36}$/);
    await page.getByText("Test records on the charts").click();
    await page.getByRole("checkbox", { name: new RegExp(RECORD.replace(/[()]/g, "\\$&")) }).check();

    const name = `test: ${RECORD}`;
    await expect
      .poll(async () => (await stressStrainTraces(page)).filter((t) => t.name === name), {
        timeout: 30_000,
      })
      .toEqual([{ name, dash: "dot" }]);
    await screenshot(page, "record-overlay-sig11");

    await page.getByLabel("Stress component (vertical axis)").selectOption("sig22");
    await page.getByLabel("Strain component (horizontal axis)").selectOption("eps22");
    await expect
      .poll(async () => (await stressStrainTraces(page)).map((t) => t.name), { timeout: 10_000 })
      .not.toContain(name);
  });
});
