/** One autocannon phase with its own p95 (autocannon reports p90 and p97.5, not p95). */
import { readFileSync } from "node:fs";

import autocannon from "autocannon";

export interface Phase {
  name: string;
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  statuses: Record<number, number>;
  /** CPU the app process spent per request (Linux /proc), independent of other load. */
  serverCpuMs: number;
}

/** user + system CPU time of a process in ms, from /proc (clock ticks of 10 ms). */
function cpuMsOf(pid: number | undefined): number {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return NaN;
  }
}

export const ms = (x: number) => Math.round(x * 10) / 10;

export const percentile = (sorted: number[], p: number) =>
  sorted.length
    ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]
    : NaN;

/** autocannon has no p95 of its own: every response time is kept and ranked here. */
export async function measure(
  name: string,
  options: autocannon.Options,
  serverPid: number | undefined,
): Promise<Phase> {
  const cpuBefore = cpuMsOf(serverPid);
  const times: number[] = [];
  const statuses: Record<number, number> = {};
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(options, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on("response", (_client, status, _bytes, ms) => {
      times.push(ms);
      statuses[status] = (statuses[status] ?? 0) + 1;
    });
  });
  times.sort((a, b) => a - b);
  const bad = Object.entries(statuses).reduce((n, [s, c]) => n + (Number(s) >= 400 ? c : 0), 0);
  return {
    name,
    requests: times.length,
    rps: Math.round(times.length / Math.max(1, result.duration)),
    p50: ms(percentile(times, 50)),
    p95: ms(percentile(times, 95)),
    p99: ms(percentile(times, 99)),
    errors: bad + result.errors + result.timeouts,
    statuses,
    serverCpuMs: ms((cpuMsOf(serverPid) - cpuBefore) / Math.max(1, times.length)),
  };
}
