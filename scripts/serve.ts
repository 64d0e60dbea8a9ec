/**
 * The production server: one Next request handler per core behind Node's cluster balancer
 * (the primary accepts connections and hands them round robin to the app processes).
 * Run: node --import tsx scripts/serve.ts  (scripts/start.sh, the browser tests and the benches do).
 *
 * Settings: PORT (3000), HOST (127.0.0.1), CRAQUELURE_APP_PROCESSES (default: one per core, at
 * least two), CRAQUELURE_LOOP_DELAY_LOG=1 (each app process logs its event-loop delay every 2 s:
 * the benches use it to tell a busy request thread from a busy machine). SIGTERM or SIGINT stops every app process, then the primary.
 *
 * Every request gets `x-craquelure-peer` set from its socket, and any copy the client sent is
 * dropped first: lib/server/accounts/auth/client-address.ts keys the rate limits on it.
 */
import cluster from "node:cluster";
import http from "node:http";
import os from "node:os";
import { monitorEventLoopDelay } from "node:perf_hooks";

import { stampPeer } from "@/lib/server/http/client-peer";

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? "127.0.0.1";
const processes = Math.max(
  2,
  Number(process.env.CRAQUELURE_APP_PROCESSES) || os.availableParallelism(),
);
// Idle keep-alive sockets outlive any client's (65 s), so a client never reuses one we are closing.
const KEEP_ALIVE_MS = 65_000;
const STOP_GRACE_MS = 10_000;

function log(message: string) {
  console.error(`[serve ${process.pid}] ${message}`);
}

function runPrimary() {
  let stopping = false;
  const listening = new Set<number>();
  for (let i = 0; i < processes; i++) cluster.fork();
  cluster.on("listening", (worker) => listening.add(worker.id));
  log(`${processes} app processes on http://${host}:${port}`);

  cluster.on("exit", (worker, code, signal) => {
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(process.exitCode ?? 0);
      return;
    }
    if (!listening.has(worker.id)) {
      // It never served (no build, bad settings): replacing it would only fail again.
      log(`app process ${worker.process.pid} failed before serving; stopping`);
      stopping = true;
      for (const other of Object.values(cluster.workers ?? {})) other?.process.kill("SIGTERM");
      process.exitCode = 1;
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(1);
      return;
    }
    // A crashed app process is replaced; the others keep serving meanwhile.
    log(`app process ${worker.process.pid} ended (${signal ?? code}); starting another`);
    cluster.fork();
  });

  const stop = () => {
    if (stopping) return;
    stopping = true;
    const workers = Object.values(cluster.workers ?? {});
    if (workers.length === 0) process.exit(0);
    for (const worker of workers) worker?.process.kill("SIGTERM");
    setTimeout(() => {
      for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill("SIGKILL");
      process.exit(1);
    }, STOP_GRACE_MS + 2_000).unref();
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

/** How late this process's timers fire: time its request thread was busy (or not given a core). */
function logLoopDelay() {
  const delay = monitorEventLoopDelay({ resolution: 10 });
  delay.enable();
  const ms = (ns: number) => (ns / 1e6).toFixed(1);
  setInterval(() => {
    log(
      `loop delay p50=${ms(delay.percentile(50))} p99=${ms(delay.percentile(99))} max=${ms(delay.max)} ms`,
    );
    delay.reset();
  }, 2_000).unref();
}

async function runAppProcess() {
  // Imported here so the primary never loads Next (it only balances).
  const { default: next } = await import("next");
  const app = next({ dev: false, dir: process.cwd(), hostname: host, port });
  const handle = app.getRequestHandler();
  await app.prepare();

  const server = http.createServer((req, res) => {
    stampPeer(req, req.socket.remoteAddress);
    void handle(req, res);
  });
  server.keepAliveTimeout = KEEP_ALIVE_MS;
  server.headersTimeout = KEEP_ALIVE_MS + 1_000;
  server.listen(port, host);
  if (process.env.CRAQUELURE_LOOP_DELAY_LOG === "1") logLoopDelay();

  // SIGINT reaches the whole process group on Ctrl-C; the primary decides, so ignore it here.
  process.on("SIGINT", () => {});
  process.on("SIGTERM", () => {
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => {
      server.closeAllConnections();
      process.exit(0);
    }, STOP_GRACE_MS).unref();
  });
}

if (cluster.isPrimary) {
  // The app processes inherit this environment: the compute pool sizes its threads by their number
  // (lib/server/compute/limits.ts).
  Object.assign(process.env, {
    NODE_ENV: "production",
    CRAQUELURE_APP_PROCESSES: String(processes),
  });
  runPrimary();
} else {
  runAppProcess().catch((error: unknown) => {
    log(`app process failed to start: ${error instanceof Error ? error.stack : String(error)}`);
    process.exit(1);
  });
}
