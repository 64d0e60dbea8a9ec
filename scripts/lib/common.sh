# Shared helpers for scripts/start.sh and scripts/test.sh (sourced, not run).
# Why shell: the set-up must work on a machine that has nothing but Node and apt.

# Port choice: every script picks its listening ports below 32768, outside Linux's ephemeral range
# (32768–60999), where an outgoing connection of another test can hold the port at bind time.
log() { printf '[craquelure] %s\n' "$*" >&2; }
die() { log "error: $*"; exit 1; }

is_root() { [ "$(id -u)" -eq 0 ]; }

# Run a privileged command: directly as root, else through sudo when available.
as_admin() {
  if is_root; then "$@"; elif command -v sudo >/dev/null 2>&1; then sudo "$@"; else
    die "need root (or sudo) to run: $*"; fi
}

# Lock::Timeout: another apt run on the machine (a second checkout's tests, unattended upgrades)
# holds the dpkg lock for a while; waiting for it beats failing the whole set-up.
apt_install() {
  log "installing Debian packages: $*"
  as_admin env DEBIAN_FRONTEND=noninteractive apt-get -o DPkg::Lock::Timeout=600 update -qq >/dev/null
  as_admin env DEBIAN_FRONTEND=noninteractive apt-get -o DPkg::Lock::Timeout=600 install -y -qq "$@" >/dev/null
}

# npm ci when node_modules is missing or older than the lock file. --include=dev because the
# start script exports NODE_ENV=production, under which npm would leave out the devDependencies
# that migrating, seeding and building need (tsx, drizzle-kit, the Tailwind compiler).
ensure_node_modules() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm packages (npm ci)"
    npm ci --include=dev --no-audit --no-fund >/dev/null || die "npm ci failed"
  fi
}

pg_bindir() {
  local initdb_path
  initdb_path=$(dpkg -L postgresql-15 2>/dev/null | grep '/bin/initdb$' | head -n 1)
  [ -z "$initdb_path" ] && initdb_path=$(ls /usr/lib/postgresql/*/bin/initdb 2>/dev/null | sort -V | tail -n 1)
  [ -n "$initdb_path" ] && dirname "$initdb_path"
}

ensure_postgres_installed() {
  if [ -z "$(pg_bindir)" ]; then apt_install postgresql; fi
  PGBIN=$(pg_bindir)
  [ -n "$PGBIN" ] || die "PostgreSQL server binaries not found after install"
  export PGBIN
}

ensure_chromium_installed() {
  command -v chromium >/dev/null 2>&1 || apt_install chromium
  command -v chromium >/dev/null 2>&1 || die "chromium is not installed and apt could not install it"
}

# Run a PostgreSQL server binary: as the postgres user when we are root (initdb refuses root).
pg_run() {
  if is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pg_cluster_dir DIR: where the cluster meant for DIR really lives. As root the server runs as
# the postgres user, which cannot enter a checkout under a folder private to root (/root/...);
# then the cluster lives in /var/lib/craquelure/pg-<hash of DIR>, and DIR/WHERE says so.
# Every return names its status: called from a trap handler, a bare `return` would give back the
# status from before the trap (143 after SIGTERM), and `set -e` would end the cleanup there.
pg_cluster_dir() {
  local dir=$1 key
  if ! is_root; then echo "$dir"; return 0; fi
  mkdir -p "$dir"
  # access(2) as postgres: fails unless every folder above DIR may be entered.
  if runuser -u postgres -- test -x "$(dirname "$dir")" 2>/dev/null; then echo "$dir"; return 0; fi
  key=$(realpath -m "$dir" | sha1sum | cut -c1-12)
  echo "/var/lib/craquelure/pg-$key"
}

# pg_cluster_start DIR PORT [extra server options]: init when new, start when not running.
pg_cluster_start() {
  local dir extra=${3:-} port=$2
  dir=$(pg_cluster_dir "$1")
  if [ "$dir" != "$1" ]; then
    mkdir -p /var/lib/craquelure
    chmod 755 /var/lib/craquelure
    log "the postgres user cannot reach $1; keeping this cluster in $dir"
    echo "$dir" >"$1/WHERE"
  fi
  mkdir -p "$dir"
  if is_root; then chown postgres:postgres "$dir"; fi
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    log "creating PostgreSQL cluster in $dir"
    pg_run "$PGBIN/initdb" -D "$dir/data" -U app --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null ||
      die "initdb failed"
  fi
  mkdir -p "$dir/sock"
  if is_root; then chown postgres:postgres "$dir/sock"; fi
  if pg_run "$PGBIN/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then
    log "PostgreSQL already running on port $port"
  else
    pg_run "$PGBIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 30 \
      -o "-c listen_addresses=127.0.0.1 -c port=$port -c unix_socket_directories=$dir/sock $extra" \
      start >/dev/null || { tail -n 20 "$dir/server.log" >&2; die "PostgreSQL did not start"; }
  fi
}

pg_cluster_stop() {
  local dir
  dir=$(pg_cluster_dir "$1")
  [ -f "$dir/data/postmaster.pid" ] && pg_run "$PGBIN/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1
  return 0
}

# pg_cluster_discard DIR: stop a throwaway cluster and remove it, wherever it lives.
pg_cluster_discard() {
  local dir
  dir=$(pg_cluster_dir "$1")
  pg_cluster_stop "$1"
  rm -rf "$dir" "$1"
}

# pg_create_db PORT NAME: create the database when it does not exist yet.
pg_create_db() {
  local port=$1 name=$2
  if ! psql -h 127.0.0.1 -p "$port" -U app -d postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    psql -h 127.0.0.1 -p "$port" -U app -d postgres -qc "create database \"$name\"" >/dev/null ||
      die "could not create database $name"
  fi
}

# wait_for_http URL SECONDS
wait_for_http() {
  local url=$1 secs=$2 i
  for ((i = 0; i < secs * 5; i++)); do
    if node -e "fetch(process.argv[1]).then(r=>process.exit(r.status<500?0:1),()=>process.exit(1))" "$url"; then
      return 0
    fi
    sleep 0.2
  done
  return 1
}

# wait_for_port PORT SECONDS: a TCP listener on loopback.
wait_for_port() {
  local port=$1 secs=$2 i
  for ((i = 0; i < secs * 5; i++)); do
    if node -e "require('net').connect(+process.argv[1],'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))" "$port"; then
      return 0
    fi
    sleep 0.2
  done
  return 1
}

# build_if_stale LOGFILE: `next build` into ${CRAQUELURE_DIST_DIR:-.next} when there is no build
# there yet or any input of the build changed since it was made.
build_if_stale() {
  local log_file=$1 dist=${CRAQUELURE_DIST_DIR:-.next}
  local inputs=(app components lib workers db public proxy.ts instrumentation.ts next.config.ts
    tailwind.config.ts postcss.config.js package-lock.json)
  if [ -f "$dist/BUILD_ID" ] && [ -z "$(find "${inputs[@]}" -newer "$dist/BUILD_ID" -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  log "building the app into $dist (about a minute)"
  NODE_ENV=production npx next build >"$log_file" 2>&1 || {
    tail -n 40 "$log_file" >&2
    die "build failed (log: $log_file)"
  }
}
