import { spawn, type ChildProcess } from "node:child_process";
import { mkdirSync, openSync } from "node:fs";

/**
 * The production server as scripts/start.sh runs it (scripts/serve.ts: the cluster balancer and
 * one app process per core), in its own process group so stopping it takes every app process.
 * With BENCH_CPU_PROF_DIR set, every process (the app processes inherit the primary's flags)
 * writes a V8 CPU profile there when it stops; scripts/cpu-profile-top.ts sums them up.
 */
export function startApp(port: number, logFile: string): ChildProcess {
  const log = openSync(logFile, "a");
  const profileDir = process.env.BENCH_CPU_PROF_DIR;
  if (profileDir) mkdirSync(profileDir, { recursive: true });
  const profile = profileDir ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : [];
  return spawn(process.execPath, [...profile, "--import", "tsx", "scripts/serve.ts"], {
    stdio: ["ignore", log, log],
    detached: true,
    env: { ...process.env, PORT: String(port), HOST: "127.0.0.1" },
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
