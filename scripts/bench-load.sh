#!/usr/bin/env bash
# npm run bench:load — 100 concurrent clients for 60 s mixing list, read, save revision and
# comment, on a PostgreSQL cluster (fsync on, as in production) and a production build
# (.next-load) of its own; never touches .data/ or a running app. Stops all it started.
# Last line: bench:load: rps=<n> p95=<ms> p99=<ms> errors5xx=<n> lost=<n>
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

export NEXT_TELEMETRY_DISABLED=1 NODE_ENV=production
export CRAQUELURE_DIST_DIR=.next-load
RUN_DIR=$(pwd)/.test-data/bench-load-$$
PGPORT=${BENCH_PG_PORT:-$((21000 + $$ % 900))}
export BENCH_APP_PORT=${BENCH_APP_PORT:-$((28000 + $$ % 900))}
export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/craquelure_load
export APP_URL=http://127.0.0.1:$BENCH_APP_PORT BENCH_APP_LOG=$RUN_DIR/app.log
# No mail is sent by this workload; studies are not part of it.
export SMTP_HOST=127.0.0.1 SMTP_PORT=9 STUDY_WORKER=off

cleanup() {
  trap - INT TERM EXIT
  [ -n "${PGBIN:-}" ] && pg_cluster_discard "$RUN_DIR/pg"
  rm -rf "$RUN_DIR"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
ensure_postgres_installed
mkdir -p "$RUN_DIR"
pg_cluster_start "$RUN_DIR/pg" "$PGPORT" "-c shared_buffers=256MB -c max_connections=100"
pg_create_db "$PGPORT" craquelure_load
npm run --silent db:migrate

build_if_stale "$RUN_DIR/build.log"

npx tsx scripts/load/bench-load.ts || { tail -n 30 "$BENCH_APP_LOG" >&2; exit 1; }
