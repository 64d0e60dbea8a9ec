/**
 * Speed of the loading desk in headless Chromium (npm run bench:ui; not a test).
 * Starts the production build on its own port (builds it first into .next-bench; --reuse keeps an existing one),
 * opens /sandbox on a 20,000-increment path, then times parameter edits from the input event:
 *   firstPaint  first chart redrawn with rows of the new run
 *   full        every chart drawn with the complete result
 *   longestTask longest main-thread task (PerformanceObserver "longtask") from the edit to full
 * Targets: < 100 ms, < 300 ms, < 50 ms. Reads the page's documented hook window.__craquelure
 * (lib/client/loading-desk/instrumentation.ts). Last line: bench:ui: firstPaint=<ms> full=<ms> longestTask=<ms>
 */
import { type ChildProcess, execSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { chromium, type Page } from "playwright-core";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { defaultLoadingDeskState } from "@/lib/client/loading-desk/default-scenario";
import { toScenarioFile } from "@/lib/client/loading-desk/scenario-state";
import { encodeState } from "@/lib/client/loading-desk/url-state";

const PORT = Number(process.env.BENCH_PORT ?? 3190);
const EDITS = 6;
const CHARTS = 5;
const PATH =
  "# 20,000 increments\nrepeat 10 grow 1\n  ε11=0.14% over 1000\n  σ11=0 over 1000\nend\n";
const ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

function scenarioHash(): string {
  const state = { ...defaultLoadingDeskState(), name: "bench: 20,000 increments", pathText: PATH };
  const parsed = parsePathText(PATH);
  if (!parsed.ok) throw new Error("bench path does not parse");
  return `#s=${encodeState(toScenarioFile(state, parsed.doc))}`;
}

async function waitForServer(url: string, ms: number): Promise<void> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${ms} ms`);
}

interface Sample {
  firstPaint: number;
  full: number;
  longestTask: number;
}

/** One edit of Y0_1, measured from its input event. */
async function measureEdit(page: Page, value: string): Promise<Sample> {
  const from = await page.evaluate(() => window.__craquelure!.events.length);
  await page.locator("#param-A-Y0_1").fill(value);
  return page.evaluate(
    ({ from, charts }) =>
      new Promise<Sample>((resolve, reject) => {
        const t0 = window.__benchInputAt!;
        const started = performance.now();
        const poll = () => {
          const ev = window.__craquelure!.events.slice(from);
          const edit = ev.find((e) => e.name === "edit");
          const drawn = edit
            ? ev.filter(
                (e) =>
                  e.name === "chart-drawn" &&
                  (e.detail.gen as number) >= (edit.detail.gen as number),
              )
            : [];
          const done = drawn.filter((e) => e.detail.complete);
          if (new Set(done.map((e) => e.detail.chart)).size >= charts) {
            const first = drawn[0].t;
            const full = Math.max(...done.map((e) => e.t));
            const tasks = window.__benchTasks!.filter(
              (t) => t.start + t.duration >= t0 && t.start <= full,
            );
            resolve({
              firstPaint: first - t0,
              full: full - t0,
              longestTask: Math.max(0, ...tasks.map((t) => t.duration)),
            });
          } else if (performance.now() - started > 30_000)
            reject(new Error("the edit was not drawn within 30 s"));
          else setTimeout(poll, 20);
        };
        poll();
      }),
    { from, charts: CHARTS },
  );
}

const BENCH_DIST_DIR = ".next-bench";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  // Its own build folder (next.config.ts reads CRAQUELURE_DIST_DIR): never times a stale build,
  // never replaces the one scripts/start.sh serves. --reuse skips the build when one exists.
  process.env.CRAQUELURE_DIST_DIR = BENCH_DIST_DIR;
  if (!process.argv.includes("--reuse") || !existsSync(`${BENCH_DIST_DIR}/BUILD_ID`)) {
    console.log("bench:ui: building (next build)…");
    execSync("npx next build", {
      stdio: "inherit",
      env: { ...process.env, NODE_ENV: "production" },
    });
  }
  if (
    await fetch(`http://127.0.0.1:${PORT}/`).then(
      () => true,
      () => false,
    )
  )
    throw new Error(
      `port ${PORT} is taken (an old server would serve a stale build); set BENCH_PORT`,
    );
  const server: ChildProcess = spawn(
    "node_modules/.bin/next",
    ["start", "-H", "127.0.0.1", "-p", String(PORT)],
    {
      stdio: "ignore",
      env: { ...process.env, NODE_ENV: "production" },
      detached: true,
    },
  );
  const stop = () => {
    try {
      process.kill(-server.pid!, "SIGTERM");
    } catch {
      // already gone
    }
  };
  try {
    const base = `http://127.0.0.1:${PORT}`;
    await waitForServer(`${base}/sandbox`, 60_000);
    const browser = await chromium.launch({
      executablePath: execSync("command -v chromium").toString().trim(),
      args: ARGS,
    });
    const page = await browser.newPage({ viewport: { width: 1366, height: 900 } });
    // tsx (esbuild) wraps named functions in __name(); give the page a no-op of it.
    await page.addInitScript({ content: "window.__name = (f) => f;" });
    await page.addInitScript(() => {
      window.__benchTasks = [];
      new PerformanceObserver((list) => {
        for (const e of list.getEntries())
          window.__benchTasks!.push({ start: e.startTime, duration: e.duration });
      }).observe({ type: "longtask", buffered: true });
      document.addEventListener("input", () => (window.__benchInputAt = performance.now()), true);
    });
    await page.goto(`${base}/sandbox${scenarioHash()}`);
    await page.waitForFunction(
      (n) => {
        const ev = window.__craquelure?.events ?? [];
        return (
          new Set(
            ev
              .filter((e) => e.name === "chart-drawn" && e.detail.complete)
              .map((e) => e.detail.chart),
          ).size >= n
        );
      },
      CHARTS,
      { timeout: 60_000 },
    );
    const rows = await page.evaluate(
      () => window.__craquelure!.events.filter((e) => e.name === "run-done").pop()?.detail.rows,
    );
    console.log(`bench:ui: path of ${Number(rows) - 1} increments drawn; ${EDITS} edits of Y0_1`);
    const samples: Sample[] = [];
    for (let k = 0; k < EDITS; k++) {
      const s = await measureEdit(page, k % 2 ? "0.05" : "0.06");
      samples.push(s);
      console.log(
        `  edit ${k + 1}: firstPaint ${s.firstPaint.toFixed(0)} ms, full ${s.full.toFixed(0)} ms, longest task ${s.longestTask.toFixed(0)} ms`,
      );
      await page.waitForTimeout(300);
    }
    await browser.close();
    const fp = median(samples.map((s) => s.firstPaint));
    const full = median(samples.map((s) => s.full));
    const lt = Math.max(...samples.map((s) => s.longestTask));
    console.log(
      "targets: firstPaint < 100, full < 300, longestTask < 50 (medians of the edits; longest task over all)",
    );
    console.log(
      `bench:ui: firstPaint=${fp.toFixed(0)} full=${full.toFixed(0)} longestTask=${lt.toFixed(0)}`,
    );
  } finally {
    stop();
  }
}

declare global {
  interface Window {
    __craquelure?: { events: { name: string; t: number; detail: Record<string, unknown> }[] };
    __benchTasks?: { start: number; duration: number }[];
    __benchInputAt?: number;
  }
}

main().catch((err) => {
  console.error(`bench:ui: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
