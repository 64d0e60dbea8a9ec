#!/usr/bin/env bash
# npm run bench:isolation — is /api/health still quick while the compute pool is full? Own
# throwaway PostgreSQL cluster, own port, the bench build (.next-bench, shared with bench:api);
# stops everything it started, also on Ctrl-C. Last line:
# bench:isolation: health_p95=… health_max=… runs_ok=…
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

export NEXT_TELEMETRY_DISABLED=1 NODE_ENV=production
export CRAQUELURE_DIST_DIR=.next-bench
RUN_DIR=$(pwd)/.test-data/bench-isolation-$$
PGPORT=${BENCH_PG_PORT:-$((24000 + $$ % 900))}
export BENCH_APP_PORT=${BENCH_APP_PORT:-$((31000 + $$ % 900))}
export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/craquelure_bench
export APP_URL=http://127.0.0.1:$BENCH_APP_PORT
# Mail is not part of this benchmark; point SMTP at a closed port on loopback.
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
pg_cluster_start "$RUN_DIR/pg" "$PGPORT" "-c max_connections=100"
pg_create_db "$PGPORT" craquelure_bench
npm run --silent db:migrate

build_if_stale "$RUN_DIR/build.log"

# The driver seeds, starts scripts/serve.ts (every core) as its own child and stops it before it returns.
npx tsx scripts/bench-isolation.ts
