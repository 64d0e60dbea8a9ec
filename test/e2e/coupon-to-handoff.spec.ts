/**
 * Issue 13's acceptance: the whole job as two people in one go. The editor uploads two cyclic
 * records, identifies, refines, saves the set, checks it in a new scenario beside the demo set,
 * saves revision 1, pins a comment and asks for review; the reviewer finds it in "Awaiting my
 * review", follows the pinned comment and approves; a share link opens read-only without an
 * account and gives the CSV; the editor takes the bundle from the Hand-off panel and prints the
 * report, whose text names the set, the verdict and the reviewer.
 */
import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";

import JSZip from "jszip";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { demoCsvText } from "@/lib/calibration/demo-csv";

import { launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

const TEAM = "demo-composites-lab";
const runId = randomBytes(3).toString("hex");
const editor = { email: "editor@demo.craquelure.local", password: "demo-editor-password" };
const reviewer = { email: "reviewer@demo.craquelure.local", password: "demo-reviewer-password" };
const REVIEWER_NAME = "Rita Reviewer (invented)";
const setName = `Coupon fit ${runId}`;
const scenarioName = `Check of ${setName}`;
const PIN = 250;

/** A second invented coupon: the demo curve (spec A.3 set) with another noise seed. */
function secondCouponCsv(): string {
  const p = demoCyclicTension(DEMO_PARAMS, { noiseStress: 0.05, noiseStrain: 5e-6, seed: 7 });
  const lines = ["strain [mm/mm],stress [MPa],transverse strain [mm/mm]"];
  for (let i = 0; i < p.strain.length; i++)
    lines.push(
      [p.strain[i], p.stress[i], p.transverseStrain![i]].map((v) => v.toPrecision(8)).join(","),
    );
  return lines.join("\n") + "\n";
}

const COUPONS = [
  { name: `coupon-a-${runId}.csv`, text: demoCsvText() },
  { name: `coupon-b-${runId}.csv`, text: secondCouponCsv() },
];

async function signIn(page: Page, who: { email: string; password: string }) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(who.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

/** Waits for a page value: the app answers through the network, so this polls. */
function eventually<T>(read: () => Promise<T>, timeout = 30_000) {
  return expect.poll(read, { timeout, interval: 250 });
}

/** Resolves once the stress–strain chart holds `sets` computed curves of `points` points each. */
async function curvesDrawn(page: Page, sets: number, points: number) {
  await page.waitForFunction(
    ([n, min]) => {
      const gd = document.querySelector(
        '[data-chart="stress-strain"] .js-plotly-plot',
      ) as unknown as { data?: { x: ArrayLike<number>; meta?: { series?: string } }[] } | null;
      const curves = (gd?.data ?? []).filter((t) => t.meta?.series === "curve");
      return curves.length >= n && curves.every((t) => t.x && t.x.length >= min);
    },
    [sets, points] as const,
    { timeout: 90_000 },
  );
}

async function uploadCoupon(page: Page, coupon: { name: string; text: string }, specimen: string) {
  await page.locator("#test-files").setInputFiles({
    name: coupon.name,
    mimeType: "text/csv",
    buffer: Buffer.from(coupon.text, "utf8"),
  });
  const card = page.getByTestId("upload-card");
  await card.getByText(/841 rows/).waitFor();
  await page.locator("#upload-0-strain").selectOption({ label: "strain [mm/mm]" });
  await page.locator("#upload-0-stress").selectOption({ label: "stress [MPa]" });
  await page
    .locator("#upload-0-transverseStrain")
    .selectOption({ label: "transverse strain [mm/mm]" });
  await card.locator(".js-plotly-plot").waitFor();
  await page.locator("#upload-0-specimen").fill(specimen);
  await page.getByRole("button", { name: "Save test record" }).click();
  await card.waitFor({ state: "detached" });
  await page
    .getByTestId("records-table")
    .getByRole("row", { name: new RegExp(specimen) })
    .waitFor();
}

describe("issue 13: from coupon tests to a signed-off hand-off", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("walks the thread as an editor, a reviewer and a reader without an account", async () => {
    const ed = await (await newContext(browser)).newPage();
    await signIn(ed, editor);

    // 1. Two cyclic coupon records.
    await ed.goto(`/teams/${TEAM}/tests`);
    await uploadCoupon(ed, COUPONS[0], `A-${runId}`);
    await uploadCoupon(ed, COUPONS[1], `B-${runId}`);
    await screenshot(ed, "thread-01-two-records");

    // 2. Identify from both.
    await ed.goto(`/teams/${TEAM}/fits/new`);
    for (const c of COUPONS)
      await ed
        .getByRole("checkbox", { name: new RegExp(`^${c.name.replace(/\.csv$/, "")} — `) })
        .check();
    await ed.getByRole("button", { name: "Identify" }).click();
    await ed.getByTestId("loop-table").first().waitFor({ timeout: 60_000 });
    await ed.getByTestId("threshold-chart").last().locator(".js-plotly-plot").waitFor();
    expect(await ed.getByTestId("loop-table").count()).toBe(2);
    const e1 = Number(
      await ed.locator('[data-testid=identify-report] [data-param="E1"]').first().textContent(),
    );
    // Both coupons come from the invented spec A.3 set, E1 = 11000 MPa.
    expect(Math.abs(e1 / DEMO_PARAMS.E1 - 1)).toBeLessThan(0.03);
    await screenshot(ed, "thread-02-identified");

    // 3. Refine E1 and a1 over both records (the others held, to keep the run short).
    for (const key of ["E2", "nu12", "G12", "Y0_2", "a2", "beta", "alpha", "Y0_1"]) {
      const box = ed.getByLabel(`${key} free`);
      if (await box.isChecked()) await box.uncheck();
    }
    await ed.getByRole("button", { name: "Refine" }).click();
    const refined = ed.getByTestId("refine-result");
    await refined.waitFor({ timeout: 180_000 });
    for (const c of COUPONS)
      expect(await refined.textContent()).toMatch(
        new RegExp(`${c.name.replace(/\.csv$/, "")}: RMS [0-9.e-]+ MPa over 841 points`),
      );
    await screenshot(ed, "thread-03-refined");

    // 4. Save the refined values as a library set.
    await ed.getByLabel("Name of the new parameter set").fill(setName);
    await ed.getByRole("button", { name: "Save as parameter set" }).click();
    await ed.waitForURL(/\/fits\/[0-9a-f-]{36}$/);
    await ed.getByRole("heading", { name: new RegExp(setName) }).waitFor();
    expect(await ed.getByTestId("fit-residuals").textContent()).toContain("over 841 points");
    await screenshot(ed, "thread-04-fit-saved");

    // 5. "Check in a new scenario", then the demo set beside it for comparison.
    await ed.getByRole("link", { name: "Check in a new scenario" }).click();
    await ed.waitForURL(/\/scenarios\/new\?set=/);
    await curvesDrawn(ed, 1, 1000);
    expect(await ed.getByLabel("Name of set A").inputValue()).toBe(setName);
    await ed.locator("#set-pick").selectOption({ label: "Demo SMC (invented values)" });
    await ed.getByRole("button", { name: "Add set" }).click();
    await curvesDrawn(ed, 2, 1000);
    expect(await ed.getByLabel("Name of set B").inputValue()).toBe("Demo SMC (invented values)");
    await screenshot(ed, "thread-05-check-scenario-two-sets");

    // 6. Revision 1.
    expect(await ed.getByLabel("Scenario name").inputValue()).toBe(scenarioName);
    await ed.getByRole("button", { name: "Save revision", exact: true }).click();
    await ed.getByRole("button", { name: "Save revision 1" }).click();
    await ed.waitForURL(/\/scenarios\/[0-9a-f-]{36}$/);
    const scenarioPath = new URL(ed.url()).pathname;
    await eventually(() => ed.getByTestId("revision-line").textContent()).toContain(
      "Revision 1 of 1",
    );
    await curvesDrawn(ed, 2, 1000);
    await screenshot(ed, "thread-06-revision-1");

    // 7. A comment pinned at an increment, then the review request (to the demo reviewer where
    // the form lets the requester choose).
    await ed.getByLabel("Add a comment").fill("Closure in compression: see the second leg.");
    await ed.getByLabel("Pin to increment (0–", { exact: false }).first().fill(String(PIN));
    await ed.getByRole("button", { name: "Comment", exact: true }).click();
    const pinned = ed.getByTestId("comment").filter({ hasText: "Closure in compression" });
    await eventually(() => pinned.textContent()).toContain(`at increment ${PIN}`);
    const choice = ed.getByRole("checkbox", { name: /Rita Reviewer/ });
    if (await choice.count()) await choice.check();
    await ed.getByRole("button", { name: "Request review" }).click();
    await eventually(() =>
      ed.locator("#review-title ~ div [data-testid=review-state]").textContent(),
    ).toBe("In review");
    await eventually(() => ed.getByTestId("revision-line").textContent()).toContain("In review");
    await screenshot(ed, "thread-07-review-requested");

    // 8. The reviewer, in a browser of her own, finds it on the team overview.
    const rv = await (await newContext(browser)).newPage();
    await signIn(rv, reviewer);
    await rv.goto(`/teams/${TEAM}`);
    const waiting = rv
      .getByTestId("awaiting-review")
      .getByRole("link", { name: `${scenarioName}, revision 1` });
    await waiting.waitFor();
    await screenshot(rv, "thread-08-awaiting-my-review");
    await waiting.click();
    await rv.waitForURL((url) => url.pathname === scenarioPath);
    await curvesDrawn(rv, 2, 1000);

    // 9. The pinned comment moves the increment cursor; then the verdict.
    const pin = rv.getByRole("button", { name: `at increment ${PIN}` });
    await pin.click();
    await eventually(() => rv.locator("#increment-cursor").inputValue()).toBe(String(PIN));
    expect(await pin.getAttribute("aria-pressed")).toBe("true");
    await screenshot(rv, "thread-09-pinned-comment-followed");
    await rv.getByLabel("Note with the verdict (optional)").fill("Closure looks right.");
    await rv.getByRole("button", { name: "Approve" }).click();
    await eventually(() => rv.getByTestId("review-summary").textContent()).toContain(
      `Approved — ${REVIEWER_NAME}`,
    );
    await screenshot(rv, "thread-10-approved");

    // 10. The editor shares revision 1; a reader without an account sees it read-only.
    await ed.goto(scenarioPath);
    await eventually(() => ed.getByTestId("review-summary").textContent()).toContain("Approved");
    await ed.getByRole("button", { name: "Create a share link to revision 1" }).click();
    const link = await ed.getByTestId("new-share-link").inputValue();
    expect(link).toMatch(/\/share\/[A-Za-z0-9_-]{22}$/);
    await screenshot(ed, "thread-11-share-link");

    const reader = await (await newContext(browser)).newPage();
    await reader.goto(new URL(link).pathname);
    await eventually(() => reader.getByTestId("shared-title").textContent()).toBe(scenarioName);
    await curvesDrawn(reader, 2, 1000);
    expect(await reader.getByTestId("read-only-banner").textContent()).toContain("Read-only");
    expect(await reader.getByRole("textbox", { name: "Scenario name" }).count()).toBe(0);
    expect(await reader.getByRole("button", { name: /Save revision/ }).count()).toBe(0);
    const [csv] = await Promise.all([
      reader.waitForEvent("download"),
      reader.getByRole("button", { name: "Download CSV" }).click(),
    ]);
    const rows = readFileSync((await csv.path())!, "utf8")
      .replace(/^\uFEFF/, "")
      .trimEnd()
      .split("\n");
    expect(rows[0]).toContain("σ11 [MPa]");
    // Both sets, first column the set. The demo set B runs all 1140 increments of the path; the
    // fitted set A may stop where it reaches its critical damage (identified from the coupons'
    // last loop, a lower bound), and then the CSV ends at the increment the set list names.
    const perSet = rows.slice(1).map((r) => r.split(",")[0]);
    const count = (id: string) => perSet.filter((s) => s === id).length;
    expect(new Set(perSet)).toEqual(new Set(["A", "B"]));
    expect(count("B")).toBe(1141);
    const statusA = (await reader.locator('[data-set="A"]').textContent()) ?? "";
    const failedAt = statusA.match(/failed: .* at increment (\d+)/)?.[1];
    expect(count("A")).toBe(failedAt ? Number(failedAt) + 1 : 1141);
    await screenshot(reader, "thread-12-shared-read-only");

    // 11. The bundle from the Hand-off panel.
    const handoff = ed.getByRole("navigation", { name: "Hand-off" });
    const [bundle] = await Promise.all([
      ed.waitForEvent("download"),
      handoff.getByRole("link", { name: "Reference bundle (zip)" }).click(),
    ]);
    const zip = await JSZip.loadAsync(readFileSync((await bundle.path())!));
    expect(zip.file("reference-bundle/README.txt")).not.toBeNull();
    await screenshot(ed, "thread-13-handoff-panel");

    // 12. The report, printed to PDF: the set's name, the verdict and the reviewer.
    await handoff.getByRole("link", { name: "Calibration report" }).click();
    await ed.waitForURL(/\/reports\//);
    await eventually(() => ed.getByTestId("report-verdict").textContent()).toContain("Approved");
    await screenshot(ed, "thread-14-report");
    await ed.emulateMedia({ media: "print" });
    const pdf = await ed.pdf({ format: "A4", printBackground: true });
    // Lines wrap anywhere in a PDF: compare with runs of white space made single spaces.
    const text = (await new PDFParse({ data: new Uint8Array(pdf) }).getText()).text.replace(
      /\s+/g,
      " ",
    );
    expect(text).toContain(setName);
    expect(text).toMatch(/Verdict Approved Reviewer Rita Reviewer \(invented\)/);
    expect(text).toContain("no design allowable");
  }, 900_000);
});
