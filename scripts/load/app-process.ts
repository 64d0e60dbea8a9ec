import { spawn, type ChildProcess } from "node:child_process";
import { openSync } from "node:fs";
import path from "node:path";

/** `next start` in its own process group (so stopping it takes its children too). */
export function startApp(port: number, logFile: string): ChildProcess {
  const nextBin = path.join(process.cwd(), "node_modules/next/dist/bin/next");
  const log = openSync(logFile, "a");
  return spawn(process.execPath, [nextBin, "start", "-H", "127.0.0.1", "-p", String(port)], {
    stdio: ["ignore", log, log],
    detached: true,
    env: process.env,
  });
}

export function stopApp(app: ChildProcess | undefined): void {
  if (app?.pid && app.exitCode === null) {
    try {
      process.kill(-app.pid, "SIGTERM");
    } catch {}
  }
}

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Polls until the URL answers 200; returns the wait in ms. */
export async function waitFor200(url: string, init: RequestInit, limitMs: number): Promise<number> {
  const t = Date.now();
  while (Date.now() - t < limitMs) {
    try {
      if ((await fetch(url, init)).status === 200) return Date.now() - t;
    } catch {}
    await sleep(100);
  }
  throw new Error(`${url} did not answer 200 within ${limitMs} ms`);
}
