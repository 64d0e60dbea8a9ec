/**
 * An enlarged chart of the sandbox loading desk, drawn against ε11 (issue 15 item 2): the dialog,
 * the axis title and data, the readout at the cursor, Escape, the stamped SVG, and 390 px.
 * Plotted data is read from the chart's Plotly element.
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

interface Drawn {
  xTitle: string;
  x: number[][];
  meta: { set: string; series: string }[];
}

const card = (page: Page, chart: string) => page.locator(`[data-chart="${chart}"]`);

async function drawn(page: Page, chart: string): Promise<Drawn> {
  return page.evaluate((chart) => {
    const gd = document.querySelector(`[data-chart="${chart}"] .js-plotly-plot`) as unknown as {
      data: { x: number[]; meta: { set: string; series: string } }[];
      layout: { xaxis: { title: { text: string } } };
    };
    return {
      xTitle: gd.layout.xaxis.title.text,
      x: gd.data.map((t) => Array.from(t.x)),
      meta: gd.data.map((t) => t.meta),
    };
  }, chart);
}

/** Waits until the first run is drawn on the damage and stress–strain charts. */
async function ready(page: Page): Promise<void> {
  await page.goto("/sandbox");
  await page.waitForFunction(
    () =>
      ["damage", "stress-strain"].every((c) => {
        const gd = document.querySelector(`[data-chart="${c}"] .js-plotly-plot`) as unknown as {
          data?: { x: number[] }[];
        } | null;
        return (gd?.data?.[0]?.x.length ?? 0) > 100;
      }),
    null,
    { timeout: 60_000 },
  );
}

async function enlargeAgainstEps11(page: Page): Promise<void> {
  await card(page, "damage")
    .getByRole("button", { name: "Enlarge Damage against increment" })
    .click();
  await card(page, "damage").getByLabel("Horizontal axis").selectOption("eps11");
  await page.waitForFunction(
    () => document.querySelector('[data-chart="damage"] .xtitle')?.textContent === "ε11 (mm/mm)",
    null,
    { timeout: 15_000 },
  );
}

async function widths(page: Page): Promise<{ scroll: number; inner: number }> {
  return page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    inner: window.innerWidth,
  }));
}

describe("an enlarged chart with strain on the horizontal axis", () => {
  let browser: Browser;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await (await newContext(browser)).newPage();
    await ready(page);
  });

  afterAll(async () => {
    await browser?.close();
  });

  it("enlarges the damage chart into a dialog and draws it against ε11", async () => {
    await enlargeAgainstEps11(page);
    const dialog = page.getByRole("dialog", { name: "Damage against ε11" });
    await expect(dialog.isVisible()).resolves.toBe(true);
    const box = (await dialog.boundingBox())!;
    // 1366 × 900 window, the dialog 24 px in from each side
    expect(box.width).toBeGreaterThan(1300);
    expect(box.height).toBeGreaterThan(800);
    const plotBox = (await card(page, "damage").locator(".js-plotly-plot").boundingBox())!;
    expect(plotBox.height).toBeGreaterThan(600);

    const damage = await drawn(page, "damage");
    expect(damage.xTitle).toBe("ε11 (mm/mm)");
    // both damage curves now run over ε11: the same extent as σ11–ε11 of the same set
    const ss = await drawn(page, "stress-strain");
    const ssX = ss.x[ss.meta.findIndex((m) => m.set === "A" && m.series === "curve")];
    const d1X = damage.x[damage.meta.findIndex((m) => m.set === "A" && m.series === "d1")];
    expect(Math.max(...d1X)).toBe(Math.max(...ssX));
    expect(Math.min(...d1X)).toBe(Math.min(...ssX));
    await expect(
      card(page, "damage")
        .getByText(/Drag to zoom/)
        .isVisible(),
    ).resolves.toBe(true);
  });

  it("reads out ε11, damage and the increment under the pointer", async () => {
    const at = await page.evaluate(() => {
      const gd = document.querySelector('[data-chart="damage"] .js-plotly-plot') as unknown as {
        data: { x: number[]; y: number[] }[];
        _fullLayout: {
          xaxis: { _offset: number; l2p: (v: number) => number };
          yaxis: { _offset: number; l2p: (v: number) => number };
        };
      } & HTMLElement;
      const { x, y } = gd.data[0];
      const k = Math.floor(x.length * 0.8);
      const r = gd.getBoundingClientRect();
      const { xaxis, yaxis } = gd._fullLayout;
      return {
        left: r.left + xaxis._offset + xaxis.l2p(x[k]),
        top: r.top + yaxis._offset + yaxis.l2p(y[k]),
      };
    });
    await page.mouse.move(at.left, at.top);
    const label = card(page, "damage").locator(".hovertext").first();
    await label.waitFor({ timeout: 5_000 });
    const text = (await label.textContent()) ?? "";
    expect(text).toContain("ε11 (mm/mm):");
    expect(text).toContain("damage (–):");
    expect(text).toMatch(/increment \d+/);
    await screenshot(page, "chart-enlarged-eps11-1366");
  });

  it("saves the enlarged chart as an SVG stamped with its title", async () => {
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Save Damage against ε11 as SVG" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^craquelure-.*-damage-against-ε11-.*\.svg$/);
    const svg = readFileSync((await download.path())!, "utf8");
    expect(svg).toContain("Damage against ε11");
    expect(svg).toContain("no design allowable");
    expect(Number(svg.match(/<svg[^>]* width="(\d+)"/)?.[1])).toBeGreaterThan(1200);
  });

  it("closes on Escape, focus back on its Enlarge button, the axis kept", async () => {
    await page.keyboard.press("Escape");
    await expect(page.getByRole("dialog").count()).resolves.toBe(0);
    const focused = await page.evaluate(() => document.activeElement?.getAttribute("aria-label"));
    expect(focused).toBe("Enlarge Damage against ε11");
    expect((await drawn(page, "damage")).xTitle).toBe("ε11 (mm/mm)");
  });

  it("fits a 390 px window, enlarged or not", async () => {
    const ctx = await browser.newContext({
      baseURL: baseUrl(),
      viewport: { width: 390, height: 844 },
    });
    const narrow = await ctx.newPage();
    await ready(narrow);
    await enlargeAgainstEps11(narrow);
    await screenshot(narrow, "chart-enlarged-eps11-390");
    const open = await widths(narrow);
    expect(open.scroll, `enlarged: ${open.scroll} px in ${open.inner}`).toBeLessThanOrEqual(
      open.inner,
    );
    await narrow.keyboard.press("Escape");
    const closed = await widths(narrow);
    expect(closed.scroll, `closed: ${closed.scroll} px in ${closed.inner}`).toBeLessThanOrEqual(
      closed.inner,
    );
    await ctx.close();
  });
});
