/**
 * Debian's Chromium driven by playwright-core (never a downloaded browser build).
 * Flags keep Chromium off the network: this machine reaches only the package registries.
 */
import { execSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export function chromiumPath(): string {
  return execSync("command -v chromium", { encoding: "utf8" }).trim();
}

export function baseUrl(): string {
  // Not BASE_URL: Vite (and so vitest) sets that variable to "/" itself.
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error("E2E_BASE_URL is not set: run browser tests through scripts/test.sh");
  return url.replace(/\/$/, "");
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS, headless: true });
}

/** A fresh, isolated context (its own cookies), as a second person on another machine. */
export async function newContext(browser: Browser): Promise<BrowserContext> {
  return browser.newContext({
    baseURL: baseUrl(),
    viewport: { width: 1366, height: 900 },
    acceptDownloads: true,
  });
}

/** A persistent profile, for tests that need a real user-data directory. */
export async function launchPersistent(): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(tmpdir(), "craquelure-profile-"));
  return chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath(),
    args: CHROMIUM_ARGS,
    headless: true,
    baseURL: baseUrl(),
    viewport: { width: 1366, height: 900 },
    acceptDownloads: true,
  });
}

export type { Browser, BrowserContext, Page };
