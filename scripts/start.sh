#!/usr/bin/env bash
# The one start command: installs what is missing, starts PostgreSQL and the fake mail server on
# loopback, migrates, seeds the invented demo team, builds and serves Craquelure on $PORT with one
# app process per core (scripts/serve.ts) and a study worker (scripts/worker.ts).
# Ctrl-C (or SIGTERM) stops everything it started; data stays in .data/ for the next start.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

# --demo-mail serves /dev/outbox (every e-mail sent, reset links included) to loopback clients.
for arg in "$@"; do
  case $arg in
    --demo-mail) export CRAQUELURE_DEMO_MAIL=1 ;;
    *) die "unknown option $arg (known: --demo-mail)" ;;
  esac
done

PORT=${PORT:-3000}
PGPORT=${CRAQUELURE_PG_PORT:-25432}
SMTP_PORT=${SMTP_PORT:-2525}
DATA_DIR=$(pwd)/.data

export NEXT_TELEMETRY_DISABLED=1
export NODE_ENV=production
export DATABASE_URL=${DATABASE_URL:-postgres://app@127.0.0.1:$PGPORT/craquelure}
export APP_URL=${APP_URL:-http://127.0.0.1:$PORT}
export SMTP_HOST=127.0.0.1 SMTP_PORT
export MAIL_FROM=${MAIL_FROM:-"Craquelure <no-reply@craquelure.local>"}
export MAIL_OUTBOX_DIR=$DATA_DIR/outbox

# Refuse early when the port is taken: otherwise the health check would greet someone else's server.
if node -e "require('net').connect(+process.argv[1],'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))" "$PORT"; then
  die "port $PORT is already in use; stop that program or choose another port: PORT=3100 scripts/start.sh"
fi

ensure_node_modules
ensure_postgres_installed

children=()
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  for pid in "${children[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  pg_cluster_stop "$DATA_DIR/pg"
  log "stopped; data kept in .data/"
}
trap cleanup INT TERM EXIT

pg_cluster_start "$DATA_DIR/pg" "$PGPORT"
pg_create_db "$PGPORT" craquelure
log "applying migrations"
npm run --silent db:migrate
npm run --silent db:seed

mkdir -p "$MAIL_OUTBOX_DIR"
node --import tsx scripts/fake-smtp.ts &
children+=($!)
wait_for_port "$SMTP_PORT" 20 || die "fake mail server did not start"

build_if_stale "$DATA_DIR/build.log"

# One app process per core behind Node's cluster balancer (scripts/serve.ts), and one study worker.
PORT=$PORT HOST=127.0.0.1 node --import tsx scripts/serve.ts &
children+=($!)
node --conditions=react-server --import tsx scripts/worker.ts &
children+=($!)
wait_for_http "http://127.0.0.1:$PORT/" 60 || die "the app did not answer on port $PORT"
if [ "${CRAQUELURE_DEMO_MAIL:-}" = 1 ]; then
  log "Craquelure is running at http://127.0.0.1:$PORT  (demo mail outbox: http://127.0.0.1:$PORT/dev/outbox)"
else
  log "Craquelure is running at http://127.0.0.1:$PORT"
fi
log "press Ctrl-C to stop"
wait -n "${children[@]}" || true
