/** Screenshots are test artefacts, kept in artifacts/screenshots/ for people to look at. */
import { mkdirSync } from "node:fs";
import path from "node:path";

import type { Page } from "playwright-core";

const DIR = path.resolve("artifacts/screenshots");

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(DIR, { recursive: true });
  const file = path.join(DIR, `${name.replace(/[^a-z0-9-]+/gi, "-")}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
