# The set-up the API benches share (bench:api, bench:isolation, bench:load): a throwaway
# PostgreSQL cluster on a port of their own, the migrations, and their own production build, so
# no bench touches .data/ or a running app; everything it started is stopped on exit or Ctrl-C.
# Source after scripts/lib/common.sh.

# bench_stack_up NAME DIST_DIR DB_NAME PG_PORT_BASE APP_PORT_BASE "POSTGRES OPTIONS"
# Sets RUN_DIR, PGPORT, BENCH_APP_PORT, DATABASE_URL, APP_URL; mail goes to a closed port.
bench_stack_up() {
  local name=$1 dist=$2 db=$3 pg_base=$4 app_base=$5 pg_options=$6
  export NEXT_TELEMETRY_DISABLED=1 NODE_ENV=production
  export CRAQUELURE_DIST_DIR=$dist
  RUN_DIR=$(pwd)/.test-data/$name-$$
  PGPORT=${BENCH_PG_PORT:-$((pg_base + $$ % 900))}
  export BENCH_APP_PORT=${BENCH_APP_PORT:-$((app_base + $$ % 900))}
  export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/$db
  export APP_URL=http://127.0.0.1:$BENCH_APP_PORT
  # Mail is not part of any bench; point SMTP at a closed port on loopback.
  export SMTP_HOST=127.0.0.1 SMTP_PORT=9
  trap bench_stack_down EXIT
  trap 'exit 130' INT TERM

  ensure_node_modules
  ensure_postgres_installed
  mkdir -p "$RUN_DIR"
  pg_cluster_start "$RUN_DIR/pg" "$PGPORT" "$pg_options"
  pg_create_db "$PGPORT" "$db"
  npm run --silent db:migrate
  build_if_stale "$RUN_DIR/build.log"
}

bench_stack_down() {
  trap - INT TERM EXIT
  [ -n "${PGBIN:-}" ] && pg_cluster_discard "$RUN_DIR/pg"
  rm -rf "$RUN_DIR"
}
