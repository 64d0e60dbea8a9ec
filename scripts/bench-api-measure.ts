/** One autocannon phase with its own p95 (autocannon reports p90 and p97.5, not p95). */
import { readdirSync, readFileSync } from "node:fs";

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
  /** CPU the app's processes spent per request (Linux /proc), independent of other load. */
  serverCpuMs: number;
  /** Start and end on the system's monotonic clock in µs, the clock V8's CPU profiles use. */
  startedUs: number;
  endedUs: number;
}

const monotonicUs = () => Number(process.hrtime.bigint() / 1000n);

/**
 * user + system CPU time in ms (clock ticks of 10 ms, from /proc) of every live process in the
 * process group `group`: the app is started as a group leader, so a cluster of app processes
 * (and anything they spawn) is counted whole.
 */
function cpuMsOfGroup(group: number | undefined): number {
  if (group === undefined) return NaN;
  let total = 0;
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const fields = readFileSync(`/proc/${entry}/stat`, "utf8").split(") ")[1].split(" ");
      // After the command: state, ppid, pgrp, …, utime (14th field), stime (15th).
      if (Number(fields[2]) === group) total += (Number(fields[11]) + Number(fields[12])) * 10;
    } catch {
      // The process ended between the listing and the read.
    }
  }
  return total;
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
  /** Process group of the app (its leader's pid). */
  serverGroup: number | undefined,
): Promise<Phase> {
  const cpuBefore = cpuMsOfGroup(serverGroup);
  const startedUs = monotonicUs();
  const times: number[] = [];
  const statuses: Record<number, number> = {};
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(options, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on("response", (_client, status, _bytes, ms) => {
      times.push(ms);
      statuses[status] = (statuses[status] ?? 0) + 1;
    });
  });
  const endedUs = monotonicUs();
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
    serverCpuMs: ms((cpuMsOfGroup(serverGroup) - cpuBefore) / Math.max(1, times.length)),
    startedUs,
    endedUs,
  };
}
