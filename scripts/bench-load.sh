#!/usr/bin/env bash
# npm run bench:load — 100 concurrent clients for 60 s mixing list, read, save revision and
# comment, on a PostgreSQL cluster (fsync on, as in production) and a production build
# (.next-load) of its own; never touches .data/ or a running app. Stops all it started.
# Last line: bench:load: rps=<n> p95=<ms> p99=<ms> errors5xx=<n> lost=<n>
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh
source scripts/lib/bench-stack.sh

# No studies in this workload; the app's log is shown if the run fails.
export STUDY_WORKER=off
bench_stack_up bench-load .next-load craquelure_load 21000 28000 \
  "-c shared_buffers=256MB -c max_connections=100"
export BENCH_APP_LOG=$RUN_DIR/app.log

npx tsx scripts/load/bench-load.ts || { tail -n 30 "$BENCH_APP_LOG" >&2; exit 1; }
