/**
 * Calibration in Chromium: the demo editor uploads the invented cyclic CSV, maps its columns,
 * identifies, checks the loop table and the values against the invented generating set, saves
 * them as a parameter set and sees the computed curve over the test curve.
 */
import { randomBytes } from "node:crypto";
import path from "node:path";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";

import {
  launchBrowser,
  newContext,
  type Browser,
  type BrowserContext,
  type Page,
} from "./support/browser";
import { screenshot } from "./support/screenshot";

const TEAM = "demo-composites-lab";
const FIXTURE = path.resolve("test/fixtures/calibration/demo-cyclic-tension.csv");

async function param(page: Page, key: string): Promise<number> {
  const text = await page
    .locator(`[data-testid=identify-report] [data-param="${key}"]`)
    .first()
    .textContent();
  return Number(text);
}

async function overlayTraces(page: Page): Promise<{ name: string; n: number }[]> {
  return page.evaluate(() => {
    const gd = document.querySelector("[data-testid=fit-overlay] .js-plotly-plot") as unknown as {
      data?: { name: string; x: number[] }[];
    } | null;
    return (gd?.data ?? []).map((t) => ({ name: t.name, n: t.x.length }));
  });
}

describe("calibration from an uploaded cyclic test", () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
    context = await newContext(browser);
    page = await context.newPage();
  });
  afterAll(async () => {
    await context?.close();
    await browser?.close();
  });

  it("uploads, maps, identifies, saves and overlays", async () => {
    await page.goto("/sign-in");
    await page.getByLabel("E-mail address").fill("editor@demo.craquelure.local");
    await page.getByLabel("Password").fill("demo-editor-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));

    await page.goto(`/teams/${TEAM}/tests`);
    const specimen = `E2E-${randomBytes(3).toString("hex")}`;
    await page.locator("#test-files").setInputFiles(FIXTURE);
    const card = page.getByTestId("upload-card");
    await card.getByText(/841 rows/).waitFor();
    await page.locator("#upload-0-strain").selectOption({ label: "strain [mm/mm]" });
    await page.locator("#upload-0-stress").selectOption({ label: "stress [MPa]" });
    await page
      .locator("#upload-0-transverseStrain")
      .selectOption({ label: "transverse strain [mm/mm]" });
    await card.locator(".js-plotly-plot").waitFor();
    await page.locator("#upload-0-specimen").fill(specimen);
    await screenshot(page, "calibration-upload-mapping");
    await page.getByRole("button", { name: "Save test record" }).click();
    await card.waitFor({ state: "detached" });
    const row = page.getByTestId("records-table").getByRole("row", { name: new RegExp(specimen) });
    await row.waitFor();
    expect(await row.textContent()).toContain("841");

    await page.goto(`/teams/${TEAM}/fits/new`);
    await page
      .getByText(/^demo-cyclic-tension — /)
      .first()
      .click();
    await page.getByRole("button", { name: "Identify" }).click();
    await page.getByTestId("loop-table").first().waitFor();
    const loops = await page.getByTestId("loop-table").first().locator("tbody tr").count();
    expect(loops).toBeGreaterThanOrEqual(6);
    const within = (value: number, target: number, tol: number) =>
      expect(Math.abs(value / target - 1), `${value} vs ${target}`).toBeLessThan(tol);
    within(await param(page, "E1"), DEMO_PARAMS.E1, 0.03);
    within(await param(page, "Y0_1"), DEMO_PARAMS.Y0_1, 0.1);
    within(await param(page, "a1"), DEMO_PARAMS.a1, 0.03);
    within(await param(page, "alpha"), DEMO_PARAMS.alpha, 0.1);
    await page.getByTestId("threshold-chart").locator(".js-plotly-plot").waitFor();
    await screenshot(page, "calibration-identified");

    const setName = `E2E fitted ${specimen}`;
    await page.getByLabel("Name of the new parameter set").fill(setName);
    await page.getByRole("button", { name: "Save as parameter set" }).click();
    await page.waitForURL(/\/fits\/[0-9a-f-]{36}$/);
    await page.getByRole("heading", { name: new RegExp(setName) }).waitFor();
    await page.getByTestId("fit-overlay").locator(".js-plotly-plot").waitFor();
    const traces = await overlayTraces(page);
    expect(traces.map((t) => t.name)).toEqual([
      "demo-cyclic-tension (test)",
      "demo-cyclic-tension (computed)",
    ]);
    expect(traces[1].n).toBe(traces[0].n);
    await screenshot(page, "calibration-fit-overlay");
  });

  it("refines in the fit worker with chosen free parameters and reports the RMS per record", async () => {
    await page.goto(`/teams/${TEAM}/fits/new`);
    await page.getByText(/^Demo cyclic tension A \(invented\) — /).click();
    await page.getByRole("button", { name: "Identify" }).click();
    await page.getByTestId("loop-table").first().waitFor();
    for (const key of ["E2", "nu12", "G12", "Y0_2", "a2", "beta", "alpha", "Y0_1"]) {
      await page.getByLabel(`${key} free`).uncheck();
    }
    await page.getByRole("button", { name: "Refine" }).click();
    const result = page.getByTestId("refine-result");
    await result.waitFor({ timeout: 90_000 });
    expect(await result.textContent()).toMatch(
      /Demo cyclic tension A \(invented\): RMS [0-9.e-]+ MPa over 841 points/,
    );
    await screenshot(page, "calibration-refined");
  });
});
