#!/usr/bin/env bash
# npm run test:faults — faults under load on a cluster, mail server and production build of
# its own (.next-load): PostgreSQL stopped and started, the mail server stopped and started.
# FAULTS_MODE=short (what scripts/test.sh runs) keeps it well under two minutes once built.
# Last line: test:faults: passed=<n> failed=<n>
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

export NEXT_TELEMETRY_DISABLED=1 NODE_ENV=production
export CRAQUELURE_DIST_DIR=${FAULTS_DIST_DIR:-.next-load}
RUN_DIR=$(pwd)/.test-data/faults-$$
export PG_DIR=$RUN_DIR/pg PGPORT=${FAULTS_PG_PORT:-$((22000 + $$ % 900))}
export PG_OPTS="-c max_connections=60"
export FAULTS_APP_PORT=${FAULTS_APP_PORT:-$((29000 + $$ % 900))}
export SMTP_HOST=127.0.0.1 SMTP_PORT=${FAULTS_SMTP_PORT:-$((27000 + $$ % 900))}
export MAIL_OUTBOX_DIR=$RUN_DIR/outbox CRAQUELURE_DEMO_MAIL=1 MAIL_FROM="Craquelure faults <faults@craquelure.local>"
export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/craquelure_faults
export APP_URL=http://127.0.0.1:$FAULTS_APP_PORT FAULTS_APP_LOG=$RUN_DIR/app.log
# Studies are not under test here; the queued-mail sender looks every second.
export STUDY_WORKER=off MAIL_OUTBOX_INTERVAL_MS=1000

cleanup() {
  trap - INT TERM EXIT
  [ -n "${PGBIN:-}" ] && pg_cluster_discard "$PG_DIR"
  rm -rf "$RUN_DIR"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
ensure_postgres_installed
mkdir -p "$RUN_DIR" "$MAIL_OUTBOX_DIR"
pg_cluster_start "$PG_DIR" "$PGPORT" "$PG_OPTS"
pg_create_db "$PGPORT" craquelure_faults
npm run --silent db:migrate

build_if_stale "$RUN_DIR/build.log"

npx tsx scripts/load/faults.ts || { log "app log tail:"; tail -n 30 "$FAULTS_APP_LOG" >&2; exit 1; }
