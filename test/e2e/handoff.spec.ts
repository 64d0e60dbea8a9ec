import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";

import JSZip from "jszip";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { baseUrl, launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { screenshot } from "./support/screenshot";

// The hand-off story: an editor makes an API token, a script runs the scenario, records a
// conformance check and a parameter study through it, a reviewer approves, and the calibration
// report prints to a PDF holding the parameter table and the verdict.
const TEAM = "demo-composites-lab";
const FIXTURE = "test/fixtures/demo-scenario.json";
const demo = JSON.parse(readFileSync(path.resolve(FIXTURE), "utf8"));
const editor = { email: "editor@demo.craquelure.local", password: "demo-editor-password" };
const reviewer = { email: "reviewer@demo.craquelure.local", password: "demo-reviewer-password" };

async function signIn(page: Page, who: { email: string; password: string }) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(who.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/teams/);
}

function api(token: string, route: string, init: RequestInit = {}) {
  return fetch(`${baseUrl()}/api/v1${route}`, {
    ...init,
    headers: {
      authorization: `Bearer ${token}`,
      "content-type": "application/json",
      ...init.headers,
    },
  });
}

const drive = () =>
  execFileSync("npm", ["run", "--silent", "drive", "--", FIXTURE], { encoding: "utf8" });

describe("hand-off to the simulation team", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("token, run, conformance, study, review and a printed report", async () => {
    const ed = await (await newContext(browser)).newPage();
    await signIn(ed, editor);

    // A token from the account page, shown once.
    await ed.goto("/account");
    const tokenName = `pipeline ${randomBytes(2).toString("hex")}`;
    await ed.getByLabel("Name").fill(tokenName);
    await ed.getByLabel("Role").selectOption("editor");
    await ed.getByRole("button", { name: "Create token" }).click();
    const secret = (
      (await ed.getByTestId("new-api-token").locator("code").textContent()) ?? ""
    ).trim();
    expect(secret).toMatch(/^crq_/);
    await screenshot(ed, "handoff-account-token");

    // The script runs the demo scenario: the same bytes as the command line.
    const run = await api(secret, "/runs", { method: "POST", body: JSON.stringify(demo) });
    expect(run.status).toBe(200);
    expect(await run.text()).toBe(drive());

    // A saved scenario (revision 1) to hand off.
    const created = await ed.request.post(`/api/v1/teams/${TEAM}/scenarios`, {
      data: { name: `Hand-off ${randomBytes(3).toString("hex")}`, file: demo },
    });
    expect(created.status()).toBe(201);
    const scenarioId = (await created.json()).scenario.id as string;
    const rev = `/teams/${TEAM}/scenarios/${scenarioId}/revisions/1`;

    // Conformance check of the command line's own output: passes, shown with both curves.
    const check = await api(secret, `${rev}/conformance`, {
      method: "POST",
      body: JSON.stringify({ fileName: "fe-history.csv", text: drive() }),
    });
    expect(check.status).toBe(201);
    const checkBody = await check.json();
    expect(checkBody.passed).toBe(true);
    await ed.goto(`${rev}/conformance?check=${checkBody.id}`);
    await expect.poll(() => ed.getByTestId("conformance-result").textContent()).toContain("pass");
    await ed.waitForSelector('[data-testid="conformance-curves"] .js-plotly-plot', {
      timeout: 60_000,
    });
    await screenshot(ed, "handoff-conformance");

    // A small parameter study through the queue, worked by the app's own worker.
    const study = await api(secret, `/teams/${TEAM}/studies`, {
      method: "POST",
      body: JSON.stringify({
        scenario: demo,
        grid: { axes: [{ parameter: "Y0_1", from: 0.04, to: 0.06, count: 3 }] },
      }),
    });
    expect(study.status).toBe(201);
    const { id: studyId } = await study.json();
    await expect
      .poll(
        async () => (await (await api(secret, `/teams/${TEAM}/studies/${studyId}`)).json()).state,
        {
          timeout: 60_000,
          interval: 500,
        },
      )
      .toBe("done");

    await ed.goto(`${rev}/study?study=${studyId}`);
    await expect
      .poll(() => ed.getByTestId("study-progress").textContent())
      .toContain("3 of 3 sets finished");
    await screenshot(ed, "handoff-study");

    // The reference bundle, fetched with the token.
    const bundle = await api(secret, `${rev}/bundle`);
    expect(bundle.status).toBe(200);
    const zip = await JSZip.loadAsync(await bundle.arrayBuffer());
    expect(zip.file("reference-bundle/README.txt")).not.toBeNull();

    // Review: the editor asks the reviewer (her id as the review form lists it), she approves.
    await ed.goto(`/teams/${TEAM}/scenarios/${scenarioId}`);
    const reviewerId = await ed
      .getByRole("checkbox", { name: "Rita Reviewer (invented)" })
      .getAttribute("value");
    expect(
      (
        await ed.request.post(`/api/v1${rev}/review`, {
          data: { action: "request", reviewers: [reviewerId] },
        })
      ).status(),
    ).toBe(200);
    const rv = await (await newContext(browser)).newPage();
    await signIn(rv, reviewer);
    const approved = await rv.request.post(`/api/v1${rev}/review`, {
      data: { action: "approve", note: "fit for hand-off" },
    });
    expect(approved.status()).toBe(200);

    // The calibration report prints to PDF with the parameter table and the verdict.
    await rv.goto(`/reports/${TEAM}/${scenarioId}/1`);
    await expect.poll(() => rv.getByTestId("report-verdict").textContent()).toContain("Approved");
    await screenshot(rv, "handoff-report");
    await rv.emulateMedia({ media: "print" });
    const pdf = await rv.pdf({ format: "A4", printBackground: true });
    // Lines wrap anywhere in a PDF: compare with runs of white space made single spaces.
    const parsed = await new PDFParse({ data: new Uint8Array(pdf) }).getText();
    const text = parsed.text.replace(/\s+/g, " ");
    // Every printed page carries the revision stamp and "Page n of N" in its margins.
    const pageCount = parsed.pages.length;
    expect(pageCount).toBeGreaterThan(1);
    for (const page of parsed.pages) {
      const pageText = page.text.replace(/\s+/g, " ");
      expect(pageText).toContain(`Page ${page.num} of ${pageCount}`);
      expect(pageText).toMatch(/· revision 1 ·/);
    }
    // The sign-off block: verdict, reviewer, date.
    expect(text).toMatch(
      /Sign-off Verdict Approved Reviewer Rita Reviewer \(invented\) Date \d{4}-\d{2}-\d{2}/,
    );
    expect(text).toContain("Parameters");
    expect(text).toMatch(/E1 Young's modulus, axis 1 MPa 11000/);
    expect(text).toMatch(/dcrit/);
    expect(text).toMatch(/Verdict: Approved by/);
    expect(text).toContain("no design allowable");
    expect(text).toMatch(/fe-history\.csv/);

    // Revoked on the account page, the token stops working at once.
    await ed.goto("/account");
    ed.once("dialog", (dialog) => void dialog.accept());
    await ed
      .getByRole("row", { name: new RegExp(tokenName) })
      .getByRole("button", { name: "Revoke" })
      .click();
    await expect
      .poll(() => ed.getByRole("row", { name: new RegExp(tokenName) }).textContent())
      .toContain("revoked");
    expect(
      (await api(secret, "/runs", { method: "POST", body: JSON.stringify(demo) })).status,
    ).toBe(401);
  });
});
