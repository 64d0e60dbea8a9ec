import { spawn, spawnSync, type ChildProcess } from "node:child_process";

import { sleep } from "./app-process";

// The faults a run injects: the database cluster and the fake mail server, each stopped and
// started again. Both belong to the run (scripts/test-faults.sh made them); nothing else is touched.

export function pgControl(action: "stop" | "start"): void {
  const r = spawnSync("bash", ["scripts/load/pg-control.sh", action], { stdio: "inherit" });
  if (r.status !== 0) throw new Error(`pg-control ${action} failed`);
}

export function startSmtp(): ChildProcess {
  return spawn(process.execPath, ["--import", "tsx", "scripts/fake-smtp.ts"], {
    stdio: "ignore",
    env: process.env,
  });
}

export async function stopSmtp(smtp: ChildProcess): Promise<void> {
  if (smtp.exitCode !== null) return;
  const gone = new Promise((resolve) => smtp.once("exit", resolve));
  smtp.kill("SIGTERM");
  await gone;
}

/** Resolves once something listens on the port again (the fake server takes a moment). */
export async function waitForPort(port: number, limitMs: number): Promise<void> {
  const { connect } = await import("node:net");
  const t = Date.now();
  while (Date.now() - t < limitMs) {
    const up = await new Promise<boolean>((resolve) => {
      const s = connect(port, "127.0.0.1");
      s.once("connect", () => (s.destroy(), resolve(true)));
      s.once("error", () => resolve(false));
    });
    if (up) return;
    await sleep(100);
  }
  throw new Error(`nothing listens on port ${port} after ${limitMs} ms`);
}

export interface Check {
  name: string;
  ok: boolean;
  detail: string;
}

export function check(checks: Check[], name: string, ok: boolean, detail: string): void {
  checks.push({ name, ok, detail });
  console.log(`${ok ? "ok  " : "FAIL"} ${name}: ${detail}`);
}
