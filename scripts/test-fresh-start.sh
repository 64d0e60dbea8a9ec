#!/usr/bin/env bash
# Fresh start, as a new user would: clone HEAD into an empty folder (once in a folder anyone may
# enter, once under a parent with mode 700, like a root user's home), run the README's start
# command there on free ports, wait for / and /sandbox to answer 200, stop it with SIGTERM and
# check that nothing it started is still running. Prints "ok NAME" / "FAIL NAME" lines and ends
# with "test:fresh-start: passed=N failed=N".
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh
REPO=$(pwd)
# A plain start, as a new user runs it: nothing from the calling test run (which serves the demo
# mail page to its own servers) may leak into it.
unset CRAQUELURE_DEMO_MAIL
BASE_PORT=${FRESH_BASE_PORT:-$((20000 + $$ % 500 * 2))}
START_SECONDS=${FRESH_START_SECONDS:-900}

passed=0
failed=0
check() {
  local name=$1
  shift
  if "$@"; then echo "ok $name"; passed=$((passed + 1)); else echo "FAIL $name"; failed=$((failed + 1)); fi
}

port_free() { ! node -e "require('net').connect(+process.argv[1],'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))" "$1"; }

# Processes whose working folder or command line lies inside the clone.
leftovers() {
  local dir=$1 pid
  for pid in $(ls /proc | grep -E '^[0-9]+$'); do
    [ "$pid" = "$$" ] && continue
    # A process may end between the listing and the read: the braces keep the redirect's error quiet.
    if { readlink "/proc/$pid/cwd" | grep -q "^$dir" ||
      tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q "$dir/"; } 2>/dev/null; then
      echo "$pid $({ tr '\0' ' ' <"/proc/$pid/cmdline" | cut -c1-120; } 2>/dev/null)"
    fi
  done
}

http_status() { node -e "fetch(process.argv[1]).then(r=>console.log(r.status),()=>console.log(0))" "$1"; }
status_is_200() { [ "$(http_status "$1")" = 200 ]; }

# fresh_start NAME PARENT_MODE PORT_OFFSET
fresh_start() {
  local name=$1 mode=$2 offset=$3
  local parent clone app_port pg_port smtp_port pid i up=no
  parent=$(mktemp -d /tmp/craquelure-fresh-XXXXXX)
  chmod "$mode" "$parent"
  clone=$parent/craquelure
  git clone --quiet "$REPO" "$clone" || { check "$name: clone" false; return; }
  app_port=$((BASE_PORT + offset)) pg_port=$((BASE_PORT + offset + 100)) smtp_port=$((BASE_PORT + offset + 200))
  log "fresh start ($name) in $clone on port $app_port"
  (cd "$clone" && PORT=$app_port CRAQUELURE_PG_PORT=$pg_port SMTP_PORT=$smtp_port \
    exec bash scripts/start.sh) >"$parent.log" 2>&1 &
  pid=$!
  for ((i = 0; i < START_SECONDS; i++)); do
    if status_is_200 "http://127.0.0.1:$app_port/" && status_is_200 "http://127.0.0.1:$app_port/sandbox"; then
      up=yes
      break
    fi
    kill -0 "$pid" 2>/dev/null || break
    sleep 1
  done
  check "$name: / and /sandbox answer 200" [ "$up" = yes ]
  [ "$up" = yes ] || tail -n 30 "$parent.log" >&2
  # A plain start must not serve the local mail page (only --demo-mail does).
  check "$name: /dev/outbox answers 404" [ "$(http_status "http://127.0.0.1:$app_port/dev/outbox")" = 404 ]
  kill -TERM "$pid" 2>/dev/null
  for ((i = 0; i < 60; i++)); do kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
  check "$name: start.sh ends on SIGTERM" bash -c "! kill -0 $pid 2>/dev/null"
  check "$name: ports released" bash -c "$(declare -f port_free); port_free $app_port && port_free $pg_port && port_free $smtp_port"
  local left
  left=$(leftovers "$clone")
  [ -n "$left" ] && { echo "--- end of start.sh's output:"; tail -n 15 "$parent.log"; } >&2
  check "$name: nothing left running" [ -z "$left" ]
  [ -n "$left" ] && echo "$left" >&2 && echo "$left" | cut -d' ' -f1 | xargs -r kill -9
  [ -f "$clone/.data/pg/WHERE" ] && rm -rf "$(cat "$clone/.data/pg/WHERE")"
  rm -rf "$parent" "$parent.log"
}

fresh_start "open folder" 755 0
fresh_start "folder private to its owner (mode 700)" 700 1

echo "test:fresh-start: passed=$passed failed=$failed"
[ "$failed" -eq 0 ]
