import { randomBytes } from "node:crypto";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { readMail } from "./support/mail";
import { screenshot } from "./support/screenshot";

// One story: an editor keeps a scenario in the demo team, a reviewer signs it off in another
// browser, and a share link shows the curves to someone without an account until it is revoked.
const TEAM = "demo-composites-lab";
const runId = randomBytes(3).toString("hex");
const scenarioName = `Bumper beam SMC ${runId}`;
const editor = { email: "editor@demo.craquelure.local", password: "demo-editor-password" };
const reviewer = { email: "reviewer@demo.craquelure.local", password: "demo-reviewer-password" };
const owner = { email: "owner@demo.craquelure.local", password: "demo-owner-password" };

async function signIn(page: Page, who: { email: string; password: string }) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(who.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/teams/);
}

/** Resolves once the stress–strain chart holds a computed curve of at least `points` points. */
async function curveDrawn(page: Page, points = 20) {
  await page.waitForFunction(
    (min) => {
      const gd = document.querySelector(
        '[data-chart="stress-strain"] .js-plotly-plot',
      ) as unknown as {
        data?: { x: ArrayLike<number> }[];
      } | null;
      return !!gd?.data?.some((t) => t.x && t.x.length >= min);
    },
    points,
    { timeout: 60_000 },
  );
}

/** Waits for a page value: the app answers through the network, so this polls (not a timing test). */
function eventually<T>(read: () => Promise<T>, options: { timeout?: number } = {}) {
  return expect.poll(read, { timeout: options.timeout ?? 30_000, interval: 200 });
}

async function revisionLine(page: Page): Promise<string> {
  return (await page.getByTestId("revision-line").textContent()) ?? "";
}

describe("team workspace: revisions, review, share link", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("saves revisions, gets a verdict with mail, shares and revokes a link, survives a save race", async () => {
    const ed = await (await newContext(browser)).newPage();
    await signIn(ed, editor);

    // Revision 1 from the template.
    await ed.goto(`/teams/${TEAM}/scenarios`);
    await ed.getByRole("link", { name: "New scenario" }).click();
    await ed.waitForURL(/\/scenarios\/new$/);
    await ed.getByLabel("Scenario name").fill(scenarioName);
    await ed.getByLabel("Material").fill("SMC, 28 % glass (invented)");
    await ed.getByLabel("Tags (separated by commas)").fill(`e2e-${runId}, crash`);
    await curveDrawn(ed);
    await ed.getByRole("button", { name: "Save revision", exact: true }).click();
    await ed.getByRole("button", { name: "Save revision 1" }).click();
    await ed.waitForURL(/\/scenarios\/[0-9a-f-]{36}$/);
    const scenarioPath = new URL(ed.url()).pathname;
    await eventually(() => revisionLine(ed)).toContain("Revision 1 of 1");
    await curveDrawn(ed);
    await screenshot(ed, "workspace-01-revision-1");

    // Revision 2: a higher damage threshold in direction 1.
    await ed.locator("#param-A-Y0_1").fill("0.08");
    await ed.getByRole("button", { name: "Save revision", exact: true }).click();
    await ed
      .getByLabel("What changed (revision message)")
      .fill("Y0_1 raised to 0.08 after the cyclic test");
    await ed.getByRole("button", { name: "Save new revision" }).click();
    await eventually(() => revisionLine(ed)).toContain("Revision 2 of 2");
    await eventually(() => ed.getByTestId("revision-diff").textContent()).toContain("Y0_1");
    await ed.getByRole("checkbox", { name: "Rita Reviewer (invented)" }).check();
    await ed.getByRole("button", { name: "Request review" }).click();
    await eventually(() =>
      ed.locator("#review-title ~ div [data-testid=review-state]").textContent(),
    ).toBe("In review");
    await screenshot(ed, "workspace-02-revision-2-in-review");

    // The team's table lists it with its state.
    await ed.goto(`/teams/${TEAM}/scenarios?tag=e2e-${runId}`);
    const row = ed.getByRole("row", { name: new RegExp(scenarioName) });
    await eventually(() => row.textContent()).toContain("In review");
    expect(await row.textContent()).toContain("rev 2");
    await screenshot(ed, "workspace-03-scenarios-table");

    // The reviewer, in a browser of her own, comments and approves.
    const rv = await (await newContext(browser)).newPage();
    await signIn(rv, reviewer);
    await rv.goto(scenarioPath);
    await eventually(() => revisionLine(rv)).toContain("Revision 2 of 2");
    expect(await rv.getByRole("button", { name: "Save revision", exact: true }).count()).toBe(0);
    await rv.getByLabel("Add a comment").fill("Unloading modulus at 0.6 % <b>looks</b> plausible.");
    await rv.getByLabel("Pin to increment (0–", { exact: false }).first().fill("120");
    await rv.getByRole("button", { name: "Comment", exact: true }).click();
    const comment = rv.getByTestId("comment").filter({ hasText: "Unloading modulus" });
    await eventually(() => comment.textContent()).toContain("at increment 120");
    expect(await comment.textContent()).toContain("<b>looks</b>");
    await rv.getByLabel("Note with the verdict (optional)").fill("Fine for the crash deck.");
    await rv.getByRole("button", { name: "Approve" }).click();
    await eventually(() => rv.getByTestId("review-summary").textContent()).toContain("Approved");
    await eventually(() => revisionLine(rv)).toContain("Approved");
    await curveDrawn(rv);
    await screenshot(rv, "workspace-04-reviewer-approved");

    // The editor sees the verdict and has the mail.
    await ed.goto(scenarioPath);
    await eventually(() => ed.getByTestId("review-summary").textContent()).toContain("Approved");
    await eventually(() => ed.getByTestId("comment-list").textContent()).toContain(
      "Unloading modulus",
    );
    const mail = await readMail({ to: editor.email, subject: scenarioName });
    expect(mail.subject).toMatch(/approved/i);
    expect(mail.text).toContain("Fine for the crash deck.");

    // A share link, shown once; opened without an account it draws the curves.
    await ed.getByRole("button", { name: /Create a share link to revision 2/ }).click();
    const link = await ed.getByTestId("new-share-link").inputValue();
    expect(link).toMatch(/\/share\/[A-Za-z0-9_-]{22}$/);
    await screenshot(ed, "workspace-05-share-link-created");
    const outsider = await (await newContext(browser)).newPage();
    await outsider.goto(new URL(link).pathname);
    await eventually(() => outsider.getByTestId("shared-title").textContent()).toBe(scenarioName);
    await curveDrawn(outsider);
    expect(await outsider.getByRole("note").first().textContent()).toContain("no design allowable");
    expect(await outsider.getByRole("button", { name: "Save revision" }).count()).toBe(0);
    await screenshot(outsider, "workspace-06-shared-view");

    // Revoked: the same link shows nothing but "no longer available".
    await ed.getByRole("button", { name: "Done" }).click();
    await ed.getByTestId("share-links").getByRole("button", { name: "Revoke" }).first().click();
    await eventually(() => ed.getByTestId("share-links").textContent()).toContain("revoked");
    const late = await (await newContext(browser)).newPage();
    const response = await late.goto(new URL(link).pathname);
    expect(response?.status()).toBe(404);
    await late.getByRole("heading", { name: "No longer available" }).waitFor();
    expect(await late.content()).not.toContain(scenarioName);
    await screenshot(late, "workspace-07-share-revoked");

    // Two saves from the same base: the owner's lands first, the editor's answers 409, keeps
    // the edits, shows the other revision beside them and then saves on top.
    await ed.goto(scenarioPath);
    await curveDrawn(ed);
    await ed.locator("#param-A-Y0_2").fill("0.06");
    await ed.getByRole("button", { name: "Save revision", exact: true }).click();
    const own = await (await newContext(browser)).newPage();
    await signIn(own, owner);
    await own.goto(scenarioPath);
    await curveDrawn(own);
    await own.locator("#param-A-a1").fill("0.7");
    await own.getByRole("button", { name: "Save revision", exact: true }).click();
    await own.getByRole("button", { name: "Save new revision" }).click();
    await eventually(() => revisionLine(own)).toContain("Revision 3 of 3");

    await ed.getByLabel("What changed (revision message)").fill("Y0_2 to 0.06");
    await ed.getByRole("button", { name: "Save new revision" }).click();
    const clash = ed.getByRole("alert").filter({ hasText: "was saved while you were editing" });
    await eventually(() => clash.textContent()).toContain("Olga Owner");
    expect(await ed.locator("#param-A-Y0_2").inputValue()).toBe("0.06");
    await ed.getByRole("button", { name: "Review revision 3 beside my edits" }).click();
    await eventually(() => clash.getByTestId("revision-diff").textContent()).toContain("Y0_2");
    expect(await clash.getByTestId("revision-diff").textContent()).toContain("a1");
    await screenshot(ed, "workspace-08-save-conflict");
    await ed.getByRole("button", { name: "Save as revision 4" }).click();
    await eventually(() => revisionLine(ed)).toContain("Revision 4 of 4");
    expect(await ed.locator("#param-A-Y0_2").inputValue()).toBe("0.06");
    expect(await revisionLine(ed)).toContain("Y0_2 to 0.06");
  });
});
