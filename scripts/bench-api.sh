#!/usr/bin/env bash
# npm run bench:api — the workspace API under load, on its own throwaway PostgreSQL cluster and
# its own production build (.next-bench), so it never touches .data/ or a running app.
# Stops everything it started, also on Ctrl-C. Last line:
# bench:api: list_p95=… save_p95=… floor_p95=… list_ratio=… save_ratio=… list_cpu=… save_cpu=… errors=…
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

export NEXT_TELEMETRY_DISABLED=1 NODE_ENV=production
export CRAQUELURE_DIST_DIR=.next-bench
RUN_DIR=$(pwd)/.test-data/bench-api-$$
PGPORT=${BENCH_PG_PORT:-$((23000 + $$ % 900))}
export BENCH_APP_PORT=${BENCH_APP_PORT:-$((30000 + $$ % 900))}
export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/craquelure_bench
export APP_URL=http://127.0.0.1:$BENCH_APP_PORT
# Review mails are not part of this benchmark; point SMTP at a closed port on loopback.
export SMTP_HOST=127.0.0.1 SMTP_PORT=9

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
# Production-like durability (fsync on); more memory than the tiny default for 100k revisions.
pg_cluster_start "$RUN_DIR/pg" "$PGPORT" "-c shared_buffers=256MB -c max_connections=100"
pg_create_db "$PGPORT" craquelure_bench
npm run --silent db:migrate

build_if_stale "$RUN_DIR/build.log"

# The load script seeds, starts scripts/serve.ts (every core) as its own child and stops it before it returns.
npx tsx scripts/bench-api.ts
