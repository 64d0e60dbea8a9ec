/**
 * At 390 px (a phone held upright) no page of the engineer's thread scrolls sideways: the header
 * collapses into a menu and wide tables scroll inside their own box.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { baseUrl, launchBrowser, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

const TEAM = "demo-composites-lab";

async function widths(page: Page): Promise<{ scroll: number; inner: number }> {
  return page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    inner: window.innerWidth,
  }));
}

async function firstLink(page: Page, pattern: RegExp): Promise<string> {
  const hrefs = await page
    .locator("a[href]")
    .evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? ""));
  const href = hrefs.find((h) => pattern.test(h));
  if (!href) throw new Error(`no link matching ${pattern} on ${page.url()}`);
  return href;
}

describe("narrow screens (390 px)", () => {
  let browser: Browser;
  let page: Page;
  beforeAll(async () => {
    browser = await launchBrowser();
    const ctx = await browser.newContext({
      baseURL: baseUrl(),
      viewport: { width: 390, height: 844 },
    });
    page = await ctx.newPage();
  });
  afterAll(async () => {
    await browser?.close();
  });

  async function expectNoSidewaysScroll(path: string, name: string) {
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    await screenshot(page, `narrow-390-${name}`);
    const { scroll, inner } = await widths(page);
    expect(scroll, `${path} is ${scroll} px wide in a ${inner} px window`).toBeLessThanOrEqual(
      inner,
    );
  }

  it("home, sandbox and sign-in fit, and the menu holds the places", async () => {
    await expectNoSidewaysScroll("/", "home");
    await expectNoSidewaysScroll("/sandbox", "sandbox");
    await expectNoSidewaysScroll("/sign-in", "sign-in");
    await page.getByTestId("header-menu").locator("summary").click();
    await expect(
      page.getByTestId("header-menu").getByRole("link", { name: "Sandbox" }).isVisible(),
    ).resolves.toBe(true);
  });

  it("the team's scenarios, a scenario, its report and a test record fit once signed in", async () => {
    await page.goto("/sign-in");
    await page.getByLabel("E-mail address").fill("editor@demo.craquelure.local");
    await page.getByLabel("Password").fill("demo-editor-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    await page.getByTestId("header-menu").locator("summary").click();
    await expect(
      page.getByTestId("header-menu").getByRole("button", { name: "Sign out" }).isVisible(),
    ).resolves.toBe(true);

    await expectNoSidewaysScroll(`/teams/${TEAM}/scenarios`, "scenarios");
    const scenario = await firstLink(page, /\/scenarios\/[0-9a-f-]{36}$/);
    await expectNoSidewaysScroll(`/teams/${TEAM}/parameter-sets`, "parameter-sets");
    await expectNoSidewaysScroll(`/teams/${TEAM}/members`, "members");
    await expectNoSidewaysScroll(`/teams/${TEAM}/tests`, "tests");
    const record = await firstLink(page, /\/tests\/[0-9a-f-]{36}$/);
    await expectNoSidewaysScroll(record, "test-record");
    await expectNoSidewaysScroll(scenario, "scenario");
    const report = await firstLink(page, /^\/reports\//);
    await expectNoSidewaysScroll(report, "report");
  });
});
