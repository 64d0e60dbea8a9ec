import { randomBytes } from "node:crypto";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { baseUrl, launchBrowser, newContext, type Browser, type Page } from "./support/browser";
import { readMail, type OutboxMessage } from "./support/mail";
import { screenshot } from "./support/screenshot";

// One story across two people: Ada founds a team and invites Ben, who accepts in his own browser.
const PASSWORD = "kiln fired glaze twelve";
const runId = randomBytes(4).toString("hex");
const ada = { name: "Ada Founder", email: `ada-${runId}@e2e.craquelure.local` };
const ben = { name: "Ben Invitee", email: `ben-${runId}@e2e.craquelure.local` };
const teamName = `Bumper beam materials ${runId}`;

/** The app path of the first link to `prefix` in a mail (e-mail links carry APP_URL's host). */
function linkPath(message: OutboxMessage, prefix: string): string {
  const match = message.text.match(new RegExp(`https?://[^\\s/]+(${prefix}/[A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no ${prefix} link in "${message.subject}"`);
  return match[1];
}

// Shown after every sign-up, whether or not the address had an account (issue 12 item 5).
const SIGN_UP_NOTICE =
  "Thank you. We sent a mail to that address: follow its link to confirm the address, then sign in.";

async function signUpAndVerify(page: Page, who: { name: string; email: string }) {
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill(who.name);
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Create account" }).click();
  await page.waitForURL(/\/sign-in\?notice=check-mail/);
  await page.getByText(SIGN_UP_NOTICE).waitFor();

  const mail = await readMail({ to: who.email, subject: "Confirm your e-mail" });
  await page.goto(linkPath(mail, "/verify"));
  await page.getByRole("button", { name: "Confirm e-mail address" }).click();
  await page.waitForURL(/\/sign-in\?notice=verified/);
}

async function signIn(page: Page, who: { email: string }) {
  await page.getByLabel("E-mail address").fill(who.email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
}

describe("foundation: accounts, a team, an invitation", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("signs up, verifies by mail, creates a team, invites a second person who joins as editor", async () => {
    const adaContext = await newContext(browser);
    const adaPage = await adaContext.newPage();
    await signUpAndVerify(adaPage, ada);

    // Signing up again with Ada's address answers exactly like a new sign-up; Ada is told by mail.
    const probePage = await (await newContext(browser)).newPage();
    await probePage.goto("/sign-up");
    await probePage.getByLabel("Name").fill("Someone else");
    await probePage.getByLabel("E-mail address").fill(ada.email);
    await probePage.getByLabel("Password").fill(PASSWORD);
    await probePage.getByRole("button", { name: "Create account" }).click();
    await probePage.waitForURL(/\/sign-in\?notice=check-mail/);
    await probePage.getByText(SIGN_UP_NOTICE).waitFor();
    expect(await probePage.getByText("exists already").count()).toBe(0);
    await readMail({ to: ada.email, subject: "Someone tried to sign up" });

    await signIn(adaPage, ada);
    await adaPage.waitForURL(/\/teams$/);
    await expect(adaPage.getByTestId("signed-in-as").textContent()).resolves.toBe(ada.email);
    const cookie = (await adaContext.cookies()).find((c) => c.name === "craq_session");
    expect(cookie).toMatchObject({
      httpOnly: true,
      sameSite: "Lax",
      secure: baseUrl().startsWith("https:"),
    });

    await adaPage.getByLabel("Team name").fill(teamName);
    await adaPage.getByRole("button", { name: "Create team" }).click();
    await adaPage.waitForURL(/\/teams\/bumper-beam-materials-/);
    const teamPath = new URL(adaPage.url()).pathname;
    await expect(adaPage.getByTestId("my-role").textContent()).resolves.toContain("Owner");
    await screenshot(adaPage, "foundation-team-home");

    await adaPage.goto(`${teamPath}/members`);
    await adaPage.getByLabel("E-mail address").fill(ben.email);
    await adaPage.getByLabel("Role").selectOption("editor");
    await adaPage.getByRole("button", { name: "Send invitation" }).click();
    await adaPage.getByText(`Invitation sent to ${ben.email}.`).waitFor();

    // Ben, in a browser of his own, creates his account and then follows the invitation.
    const benContext = await newContext(browser);
    const benPage = await benContext.newPage();
    await signUpAndVerify(benPage, ben);
    const invitation = await readMail({ to: ben.email, subject: "invited you" });
    await benPage.goto(linkPath(invitation, "/invite"));
    await benPage.locator("main").getByRole("link", { name: "Sign in" }).click();
    await signIn(benPage, ben);
    await benPage.waitForURL(/\/invite\//);
    await benPage.getByRole("button", { name: "Accept and join" }).click();
    await benPage.waitForURL(new RegExp(`${teamPath}$`));
    await expect(benPage.getByTestId("my-role").textContent()).resolves.toContain("Editor");
    await screenshot(benPage, "foundation-invitee-joined");

    // Ada sees Ben listed with the role she chose.
    await adaPage.goto(`${teamPath}/members`);
    const benRow = adaPage.getByTestId(`member-${ben.email}`);
    await expect(benRow.getByLabel(`Role of ${ben.name}`).inputValue()).resolves.toBe("editor");
    await screenshot(adaPage, "foundation-members");

    await benContext.close();
    await adaContext.close();
  });

  it("refuses a state-changing request from another origin before it reaches the app", async () => {
    const response = await fetch(`${baseUrl()}/sign-in`, {
      method: "POST",
      headers: { origin: "https://elsewhere.example", "content-type": "text/plain" },
      body: "x",
    });
    expect(response.status).toBe(403);
    expect(await response.text()).toBe("Cross-origin request refused.");
  });
});
