/**
 * Issue 19's browser check: an engineer enters a three-layer orientation state (the skin / core /
 * skin preset of spec A.5), sees the fibre distributions and the stiffness roses, opens the result
 * in the sandbox and finds its moduli and damage frame carried into set A.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser, type BrowserContext } from "./support/browser";
import { screenshot } from "./support/screenshot";

const TEAM = "demo-composites-lab";

/** "E1 = 9698 MPa" → 9698, from the result line of the orientation section. */
function valueIn(text: string, key: string): number {
  const m = new RegExp(`${key} = (-?[0-9.]+)`).exec(text);
  if (!m) throw new Error(`${key} not in "${text}"`);
  return Number(m[1]);
}

describe("orientation state of a moulded layer stack", () => {
  let browser: Browser;
  let context: BrowserContext;

  beforeAll(async () => {
    browser = await launchBrowser();
    context = await newContext(browser);
  });
  afterAll(async () => {
    await context?.close();
    await browser?.close();
  });

  it("shows the roses of a three-layer state and carries its values into a scenario", async () => {
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail address").fill("editor@demo.craquelure.local");
    await page.getByLabel("Password").fill("demo-editor-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/teams/);
    await page.goto(`/teams/${TEAM}/fits/new`);
    await page.getByText("Starting values from constituents (estimates)").click();
    await page.getByRole("button", { name: "Skin / core / skin" }).click();
    const layers = page.getByTestId("orientation-layers").locator("tbody tr");
    await expect(layers.count()).resolves.toBe(3);
    // skins turned off the flow direction (a12 = 0.2 ≤ √(a11·a22) = 0.4): the stack's principal
    // direction, and so the damage frame, leaves the flow axis
    await page.getByLabel("a12 of row 1").fill("0.2");
    await page.getByLabel("a12 of row 3").fill("0.2");
    const rose = page.getByTestId("stiffness-rose");
    await rose.scrollIntoViewIfNeeded();
    await expect(rose.locator("path").count()).resolves.toBe(3);
    await expect(
      page.getByTestId("orientation-pictures").locator("figure").count(),
    ).resolves.toBeGreaterThanOrEqual(3);
    await screenshot(page, "orientation-three-layers");
    const result = (await page.getByTestId("orientation-result").textContent()) ?? "";
    const E1 = valueIn(result, "E1");
    const E2 = valueIn(result, "E2");
    const thetaD = valueIn(result, "thetaD");
    expect(Math.abs(thetaD)).toBeGreaterThan(1);

    const [sandbox] = await Promise.all([
      context.waitForEvent("page"),
      page.getByRole("link", { name: "Open in the sandbox" }).click(),
    ]);
    await sandbox.waitForLoadState("networkidle");
    await sandbox.getByTestId("loading-desk").waitFor();
    const shown = async (symbol: string) =>
      Number(await sandbox.locator(`#param-A-${symbol}`).inputValue());
    // the result line rounds E1, E2 to whole MPa and thetaD to 0.1°; the desk shows 6 digits
    expect(Math.abs((await shown("E1")) - E1)).toBeLessThanOrEqual(0.5);
    expect(Math.abs((await shown("E2")) - E2)).toBeLessThanOrEqual(0.5);
    expect(Math.abs((await shown("thetaD")) - thetaD)).toBeLessThanOrEqual(0.05);
    await expect(
      sandbox
        .getByText(/Orientation state \(estimate/)
        .first()
        .isVisible(),
    ).resolves.toBe(true);
    await screenshot(sandbox, "orientation-in-sandbox");
  });
});
