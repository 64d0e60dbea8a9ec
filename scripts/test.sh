#!/usr/bin/env bash
# The one test command: lint, format, types, unit tests, integration tests on a throwaway
# PostgreSQL cluster, and browser tests in Debian's Chromium against a production build.
# Ends with one plain line "N passed, N failed" summed over every suite.
# Usage: scripts/test.sh [checks] [unit] [integration] [e2e] [faults] [fresh]   (default: all)
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

SUITES=${*:-checks unit integration e2e faults fresh}
want() { [[ " $SUITES " == *" $1 "* ]]; }

export NEXT_TELEMETRY_DISABLED=1 NO_COLOR=1 FORCE_COLOR=0
RUN_DIR=$(pwd)/.test-data/run-$$
PGPORT=${TEST_PG_PORT:-$((24000 + $$ % 900))}
SMTP_PORT=${TEST_SMTP_PORT:-$((26000 + $$ % 900))}
APP_PORT=${TEST_APP_PORT:-$((31000 + $$ % 900))}
REPORTS=$RUN_DIR/reports
# A build of our own (see next.config.ts); the name is fixed because Next rewrites tsconfig.json
# for any build folder it does not list yet.
export CRAQUELURE_DIST_DIR=.next-test
mkdir -p "$REPORTS" artifacts/screenshots

passed=0
failed=0
children=()
cleanup() {
  for pid in "${children[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  [ -n "${PGBIN:-}" ] && pg_cluster_discard "$RUN_DIR/pg"
  rm -rf "$RUN_DIR"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

# count_check NAME COMMAND...: a whole tool run counts as one test.
count_check() {
  local name=$1
  shift
  log "check: $name"
  if "$@"; then passed=$((passed + 1)); else failed=$((failed + 1)); log "FAILED: $name"; fi
}

# run_vitest NAME CONFIG: run a vitest project and add its test counts.
run_vitest() {
  local name=$1 config=$2 report="$REPORTS/$1.json"
  log "suite: $name"
  # TEST_FILES (optional, space-separated paths or name filters) narrows a run while working on a
  # few files; CI leaves it unset and runs everything.
  # shellcheck disable=SC2086
  npx vitest run --config "$config" --passWithNoTests --reporter=default --reporter=json \
    --outputFile.json="$report" ${TEST_FILES:-}
  local rc=$?
  if [ -f "$report" ]; then
    read -r p f < <(node -e 'const r=require(process.argv[1]);console.log(r.numPassedTests,r.numFailedTests+(r.numRuntimeErrorTests||0))' "$report")
    passed=$((passed + p))
    failed=$((failed + f))
    if [ "$rc" -ne 0 ] && [ "$f" -eq 0 ]; then failed=$((failed + 1)); log "FAILED: $name exited $rc"; fi
  else
    failed=$((failed + 1))
    log "FAILED: $name produced no report"
  fi
}

ensure_node_modules

if want checks; then
  count_check "eslint" npx eslint . --max-warnings 0
  count_check "prettier" npx prettier --check . --log-level warn
  count_check "typescript" npx tsc --noEmit
fi

if want unit; then
  run_vitest unit vitest.config.ts
fi

if want integration || want e2e; then
  ensure_postgres_installed
  pg_cluster_start "$RUN_DIR/pg" "$PGPORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off"
  pg_create_db "$PGPORT" craquelure_test
  export DATABASE_URL=postgres://app@127.0.0.1:$PGPORT/craquelure_test
  export SMTP_HOST=127.0.0.1 SMTP_PORT
  export MAIL_FROM="Craquelure tests <tests@craquelure.local>"
  export MAIL_OUTBOX_DIR=$RUN_DIR/outbox CRAQUELURE_DEMO_MAIL=1
  export APP_URL=http://127.0.0.1:$APP_PORT
  mkdir -p "$MAIL_OUTBOX_DIR"
  count_check "migrations apply" npm run --silent db:migrate
  node --import tsx scripts/fake-smtp.ts >"$RUN_DIR/smtp.log" 2>&1 &
  children+=($!)
  wait_for_port "$SMTP_PORT" 20 || log "fake mail server did not start"
fi

if want integration; then
  run_vitest integration vitest.integration.config.ts
fi

if want e2e; then
  ensure_chromium_installed
  log "building the app for browser tests"
  if NODE_ENV=production npx next build >"$RUN_DIR/build.log" 2>&1; then
    passed=$((passed + 1))
    npm run --silent db:seed >/dev/null
    # The server scripts/start.sh runs: cluster balancer, one app process per core, a study worker.
    PORT=$APP_PORT HOST=127.0.0.1 node --import tsx scripts/serve.ts >"$RUN_DIR/app.log" 2>&1 &
    children+=($!)
    NODE_ENV=production node --conditions=react-server --import tsx scripts/worker.ts >>"$RUN_DIR/app.log" 2>&1 &
    children+=($!)
    if wait_for_http "http://127.0.0.1:$APP_PORT/" 60; then
      failed_before=$failed
      E2E_BASE_URL=http://127.0.0.1:$APP_PORT run_vitest e2e vitest.e2e.config.ts
      # The server's side of a failure is otherwise lost with the run folder.
      if [ "$failed" -gt "$failed_before" ]; then
        log "app log (last 60 lines):"
        tail -n 60 "$RUN_DIR/app.log" >&2
      fi
    else
      failed=$((failed + 1))
      log "FAILED: the app did not start"
      tail -n 40 "$RUN_DIR/app.log" >&2
    fi
  else
    failed=$((failed + 1))
    log "FAILED: next build"
    tail -n 60 "$RUN_DIR/build.log" >&2
  fi
fi

# Faults under load, short form: its own cluster, mail server and build (.next-load); each
# check it prints counts as one test.
if want faults; then
  log "suite: faults (short)"
  # Reuse the browser tests' fresh build when there is one, rather than building again.
  dist=.next-load
  want e2e && [ -f .next-test/BUILD_ID ] && dist=.next-test
  FAULTS_MODE=short FAULTS_DIST_DIR=$dist bash scripts/test-faults.sh >"$RUN_DIR/faults.log" 2>&1
  rc=$?
  grep -E '^(ok|FAIL) ' "$RUN_DIR/faults.log" >&2 || true
  read -r p f < <(sed -nE 's/^test:faults: passed=([0-9]+) failed=([0-9]+)$/\1 \2/p' "$RUN_DIR/faults.log" | tail -n 1)
  passed=$((passed + ${p:-0}))
  failed=$((failed + ${f:-1}))
  if [ "$rc" -ne 0 ] && [ "${f:-1}" -eq 0 ]; then failed=$((failed + 1)); fi
  [ "$rc" -ne 0 ] && tail -n 30 "$RUN_DIR/faults.log" >&2
fi

# Fresh start: the README's start command in two fresh clones of HEAD (see the script).
if want fresh; then
  log "suite: fresh start"
  bash scripts/test-fresh-start.sh >"$RUN_DIR/fresh.log" 2>&1
  rc=$?
  grep -E '^(ok|FAIL) ' "$RUN_DIR/fresh.log" >&2 || true
  read -r p f < <(sed -nE 's/^test:fresh-start: passed=([0-9]+) failed=([0-9]+)$/\1 \2/p' "$RUN_DIR/fresh.log" | tail -n 1)
  passed=$((passed + ${p:-0}))
  failed=$((failed + ${f:-1}))
  if [ "$rc" -ne 0 ] && [ "${f:-1}" -eq 0 ]; then failed=$((failed + 1)); fi
  [ "$rc" -ne 0 ] && tail -n 40 "$RUN_DIR/fresh.log" >&2
fi

echo "$passed passed, $failed failed"
[ "$failed" -eq 0 ]
