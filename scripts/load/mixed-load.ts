import { percentile } from "../bench-api-measure";

import type { LoadSeed } from "./seed-load";

// The mixed workload of bench:load and test:faults: `connections` people at once, each working
// on their own scenario in a loop — list the team's scenarios, read the latest revision, save a
// new revision on it, comment on it. Each client is a plain loop over Node's own HTTP client
// (undici, keep-alive), so every answer is tied to the person who asked: each save and comment
// the server acknowledged (201) is remembered, and afterwards the database is asked for them.

export interface Acked {
  saves: { scenarioId: string; number: number }[];
  comments: string[];
}

export interface LoadResult {
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  statuses: Record<number, number>;
  errors5xx: number;
  /** Requests that got no HTTP answer at all (refused, reset, timed out). */
  socketErrors: number;
  /** 503 answers, and how many of them carried Retry-After (all of them should). */
  unavailable: number;
  unavailableWithRetryAfter: number;
  acked: Acked;
  /** Status counts per second since the start, for reading what happened around a fault. */
  timeline: Record<number, number>[];
}

const rounded = (x: number) => Math.round(x * 10) / 10;

export async function runMixedLoad(
  baseUrl: string,
  seed: LoadSeed,
  options: { connections: number; seconds: number; file: unknown },
): Promise<LoadResult> {
  const acked: Acked = { saves: [], comments: [] };
  const team = `${baseUrl}/api/v1/teams/${seed.teamSlug}`;
  const started = performance.now();
  const until = started + options.seconds * 1000;
  const times: number[] = [];
  const statuses: Record<number, number> = {};
  const timeline: Record<number, number>[] = [];
  let socketErrors = 0;
  let unavailable = 0;
  let unavailableWithRetryAfter = 0;

  /** One request, timed and counted; undefined when no HTTP answer came back. */
  async function call(cookie: string, path: string, body?: unknown) {
    const t = performance.now();
    try {
      const response = await fetch(`${team}${path}`, {
        method: body === undefined ? "GET" : "POST",
        headers: { cookie, ...(body === undefined ? {} : { "content-type": "application/json" }) },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(10_000),
      });
      const text = await response.text();
      const now = performance.now();
      times.push(now - t);
      statuses[response.status] = (statuses[response.status] ?? 0) + 1;
      const second = Math.floor((now - started) / 1000);
      timeline[second] ??= {};
      timeline[second][response.status] = (timeline[second][response.status] ?? 0) + 1;
      if (response.status === 503) {
        unavailable++;
        if (response.headers.get("retry-after")) unavailableWithRetryAfter++;
      }
      return { status: response.status, text };
    } catch {
      socketErrors++;
      // Nothing listening (or a hang): do not spin; a person would wait a moment too.
      await new Promise((resolve) => setTimeout(resolve, 100));
      return undefined;
    }
  }

  async function person(i: number) {
    const scenarioId = seed.scenarioIds[i % seed.scenarioIds.length];
    const cookie = seed.cookies[i % seed.cookies.length];
    let base = 1;
    for (let pass = 0; performance.now() < until; pass++) {
      await call(cookie, `/scenarios?pageSize=25&page=${1 + (pass % 4)}`);
      if (performance.now() >= until) break;
      await call(cookie, `/scenarios/${scenarioId}/revisions/${base}`);
      if (performance.now() >= until) break;
      const saved = await call(cookie, `/scenarios/${scenarioId}/revisions`, {
        baseRevision: base,
        message: `load save on ${base}`,
        file: options.file,
      });
      try {
        if (saved?.status === 201) {
          base = JSON.parse(saved.text).number;
          acked.saves.push({ scenarioId, number: base });
        } else if (saved?.status === 409) {
          // An earlier save committed but its answer was lost (an outage): go on from there.
          base = JSON.parse(saved.text).error.latest.number;
        }
      } catch {}
      if (performance.now() >= until) break;
      const commented = await call(cookie, `/scenarios/${scenarioId}/revisions/1/comments`, {
        body: `load comment after revision ${base}`,
      });
      if (commented?.status === 201) acked.comments.push(JSON.parse(commented.text).id);
    }
  }

  await Promise.all(Array.from({ length: options.connections }, (_, i) => person(i)));
  const elapsed = (performance.now() - started) / 1000;
  times.sort((a, b) => a - b);
  const errors5xx = Object.entries(statuses)
    .filter(([s]) => Number(s) >= 500)
    .reduce((n, [, c]) => n + c, 0);
  return {
    requests: times.length,
    rps: Math.round(times.length / elapsed),
    p50: rounded(percentile(times, 50)),
    p95: rounded(percentile(times, 95)),
    p99: rounded(percentile(times, 99)),
    statuses,
    errors5xx,
    socketErrors,
    unavailable,
    unavailableWithRetryAfter,
    acked,
    timeline,
  };
}
