/**
 * The sandbox loading desk in Chromium: a path template, the plotted data, a parameter edit, a
 * second set, CSV and scenario-file round trips, and the solver's worker scope.
 * Plotted data is read from the chart's Plotly element; progress from window.__craquelure.
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { EXPORT_HEADER } from "@/lib/client/loading-desk/csv-export";
import {
  launchBrowser,
  newContext,
  type Browser,
  type BrowserContext,
  type Page,
} from "./support/browser";
import { screenshot } from "./support/screenshot";

interface Trace {
  x: number[];
  y: number[];
  meta?: { set: string; series: string };
}

const CHARTS = ["stress-strain", "damage", "force", "permanent-strain", "energy"];

async function eventCount(page: Page): Promise<number> {
  return page.evaluate(
    () =>
      (window as unknown as { __craquelure?: { events: unknown[] } }).__craquelure?.events.length ??
      0,
  );
}

/** Waits until an edit after event `from` has been computed and every chart drew its final state. */
async function settled(page: Page, from: number): Promise<void> {
  await page.waitForFunction(
    ({ from, charts }) => {
      type Ev = { name: string; detail: Record<string, unknown> };
      const ev: Ev[] =
        (window as unknown as { __craquelure?: { events: Ev[] } }).__craquelure?.events ?? [];
      const edits = ev.slice(from).filter((e) => e.name === "edit");
      if (edits.length === 0) return false;
      const gen = edits[edits.length - 1].detail.gen as number;
      const drawn = new Set(
        ev
          .filter(
            (e) => e.name === "chart-drawn" && e.detail.complete && (e.detail.gen as number) >= gen,
          )
          .map((e) => e.detail.chart),
      );
      return charts.every((c) => drawn.has(c));
    },
    { from, charts: CHARTS },
    { timeout: 60_000 },
  );
}

async function traces(page: Page, chart: string): Promise<Trace[]> {
  return page.evaluate((chart) => {
    const gd = document.querySelector(`[data-chart="${chart}"] .js-plotly-plot`) as unknown as {
      data: Trace[];
    };
    return gd.data.map((t) => ({ x: Array.from(t.x), y: Array.from(t.y), meta: t.meta }));
  }, chart);
}

const curve = (ts: Trace[], set: string, series = "curve") =>
  ts.find((t) => t.meta?.set === set && t.meta?.series === series)!;

describe("sandbox loading desk", () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
    context = await newContext(browser);
    page = await context.newPage();
    await page.goto("/sandbox");
    await settled(page, 0);
  });

  afterAll(async () => {
    await context?.close();
    await browser?.close();
  });

  it("opens computed and drawn, with the solver in a dedicated worker", async () => {
    const scopes = await page.evaluate(() =>
      (
        window as unknown as {
          __craquelure: { events: { name: string; detail: { scope?: string } }[] };
        }
      ).__craquelure.events
        .filter((e) => e.name === "run-done")
        .map((e) => e.detail.scope),
    );
    expect(scopes.length).toBeGreaterThan(0);
    expect(new Set(scopes)).toEqual(new Set(["DedicatedWorkerGlobalScope"]));
    expect(curve(await traces(page, "stress-strain"), "A").x.length).toBeGreaterThan(100);
    await screenshot(page, "loading-desk-default");
  });

  it("tension → unload → compression: compressive stress, unloading slope E·(1 − d)", async () => {
    const n = await eventCount(page);
    await page.getByLabel("Path template").selectOption("tension-unload-compression");
    await settled(page, n);
    const ss = curve(await traces(page, "stress-strain"), "A");
    expect(Math.min(...ss.y)).toBeLessThan(-50);
    const d1 = curve(await traces(page, "damage"), "A", "d1");
    const d = Math.max(...d1.y);
    expect(d).toBeGreaterThan(0.1);
    // the unloading leg starts at the largest strain and ends at zero stress
    const top = ss.x.indexOf(Math.max(...ss.x));
    let end = top;
    while (end + 1 < ss.y.length && ss.y[end + 1] < ss.y[end] && ss.y[end] > 1e-9) end++;
    const mid = Math.round((top + end) / 2);
    expect(end - top).toBeGreaterThan(10);
    const slope = (ss.y[top] - ss.y[mid]) / (ss.x[top] - ss.x[mid]);
    expect(Math.abs(slope / (11000 * (1 - d)) - 1)).toBeLessThan(0.01);
    await screenshot(page, "loading-desk-tension-unload-compression");
  });

  it("changing Y0 changes the curve", async () => {
    const before = curve(await traces(page, "stress-strain"), "A");
    const n = await eventCount(page);
    await page.locator("#param-A-Y0_1").fill("0.08");
    await settled(page, n);
    const after = curve(await traces(page, "stress-strain"), "A");
    expect(Math.max(...after.y)).toBeGreaterThan(Math.max(...before.y) + 1);
  });

  it("a second set adds a second trace", async () => {
    const n = await eventCount(page);
    await page.getByRole("button", { name: "Add set" }).click();
    await settled(page, n);
    const ts = (await traces(page, "stress-strain")).filter((t) => t.meta?.series === "curve");
    expect(ts.map((t) => t.meta!.set).sort()).toEqual(["A", "B"]);
    expect(Math.max(...ts[0].y)).not.toBeCloseTo(Math.max(...ts[1].y), 3);
    await screenshot(page, "loading-desk-two-sets");
  });

  it("exports CSV with one header line of symbols and units", async () => {
    await page.getByLabel("Results CSV of").selectOption("A");
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Download CSV" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^craquelure-.*-set-a-.*\.csv$/);
    const text = readFileSync((await download.path())!, "utf8");
    const lines = text
      .replace(/^\uFEFF/, "")
      .trimEnd()
      .split("\n");
    expect(lines[0]).toBe(EXPORT_HEADER);
    expect(lines[0]).toContain("σ11 [MPa]");
    expect(lines).toHaveLength(252);
  });

  it("imports the exported scenario file and draws the same curves", async () => {
    const original = await traces(page, "stress-strain");
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Download scenario file" }).click(),
    ]);
    const file = (await download.path())!;
    let n = await eventCount(page);
    await page.getByLabel("Path template").selectOption("shear-reversal");
    await settled(page, n);
    expect(curve(await traces(page, "stress-strain"), "A").x).not.toEqual(curve(original, "A").x);
    n = await eventCount(page);
    await page.getByTestId("import-file").setInputFiles(file);
    await settled(page, n);
    const back = await traces(page, "stress-strain");
    for (const set of ["A", "B"]) {
      expect(curve(back, set).x).toEqual(curve(original, set).x);
      expect(curve(back, set).y).toEqual(curve(original, set).y);
    }
  });

  it("carries the scenario in the address: a new tab on the link draws the same curves", async () => {
    const ours = curve(await traces(page, "stress-strain"), "B");
    await page.waitForFunction(() => location.hash.startsWith("#s="));
    const link = await page.evaluate(() => location.href);
    const other = await context.newPage();
    await other.goto(link);
    await settled(other, 0);
    expect(curve(await traces(other, "stress-strain"), "B").y).toEqual(ours.y);
    await other.close();
  });

  it("saves a chart as SVG with a meaningful name", async () => {
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: /Save Stress–strain.* as SVG/ }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^craquelure-.*-stress-strain-.*\.svg$/);
    const svg = readFileSync((await download.path())!, "utf8");
    expect(svg).toContain("<svg");
    // the image says what it shows once it travels alone: sets, date, the caution
    expect(svg).toContain("Sets: A");
    expect(svg).toContain("no design allowable");
  });

  it("shows where an imported file is wrong", async () => {
    await page.getByTestId("import-file").setInputFiles({
      name: "bad.json",
      mimeType: "application/json",
      buffer: Buffer.from(
        JSON.stringify({
          format: "craquelure.scenario/1",
          parameterSets: [{ E1: -5 }],
          path: { legs: [] },
        }),
      ),
    });
    await expect
      .poll(() => page.getByTestId("import-errors").textContent())
      .toContain("parameterSets[0].E1");
    await screenshot(page, "loading-desk-import-error");
  });

  it("reports a path text error at line and column, and recovers", async () => {
    const box = page.getByLabel("Path in text form");
    await box.fill("ε11=1% over 100\nσ11=0 over 5O");
    await expect
      .poll(() => page.locator("#path-errors").textContent())
      .toContain("line 2, column 13");
    const n = await eventCount(page);
    await box.fill("ε11=1% over 100\nσ11=0 over 50");
    await settled(page, n);
  });

  it("turns a solver failure into a message, and the next edit computes again", async () => {
    const other = await context.newPage();
    // A solver script that dies on load, as a broken worker would (the bundler names every
    // worker script after "worker"; the sandbox has no other worker).
    const workerScript = (url: URL) => /worker/i.test(url.pathname);
    await other.route(workerScript, (route) =>
      route.fulfill({ contentType: "text/javascript", body: "throw new Error('solver failed');" }),
    );
    await other.goto("/sandbox");
    await expect
      .poll(() => other.getByTestId("run-notes").textContent(), { timeout: 30_000 })
      .toContain("The solver stopped unexpectedly");
    await screenshot(other, "loading-desk-solver-error");
    expect(await other.content()).not.toMatch(/at .*\.(js|ts):\d+/);
    await other.unroute(workerScript);
    const n = await eventCount(other);
    await other.locator("#param-A-Y0_1").fill("0.06");
    await settled(other, n);
    expect(curve(await traces(other, "stress-strain"), "A").x.length).toBeGreaterThan(100);
    await expect.poll(() => other.getByTestId("run-notes").count()).toBe(0);
    await other.close();
  });
});
