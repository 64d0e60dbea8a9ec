#!/usr/bin/env bash
# Restore a dump made by scripts/backup.sh into a database that does not exist yet: it is created
# here, filled in one transaction, and left alone on any error (never a half-restored database
# under the real name). Point the app at it afterwards (DATABASE_URL) once you have checked it.
# Usage: scripts/restore.sh FILE postgres://user@host:port/NEW_DATABASE
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

file=${1:-}
target=${2:-}
[ -f "$file" ] || die "usage: scripts/restore.sh FILE TARGET_DATABASE_URL (no such file: $file)"
[[ "$target" =~ ^(postgres(ql)?://[^/]+)/([A-Za-z0-9_-]+)(\?.*)?$ ]] ||
  die "TARGET_DATABASE_URL must end in a plain database name"
server=${BASH_REMATCH[1]}
name=${BASH_REMATCH[3]}

# A fresh database only: restoring over live data would mix two histories.
exists=$(psql "$server/postgres" -tAc "select 1 from pg_database where datname = '$name'")
[ -z "$exists" ] || die "database $name already exists; restore into a new name"
psql "$server/postgres" -qc "create database \"$name\"" >/dev/null
if ! pg_restore --no-owner --no-privileges --single-transaction --exit-on-error \
  --dbname="$target" "$file"; then
  psql "$server/postgres" -qc "drop database \"$name\"" >/dev/null || true
  die "pg_restore failed; nothing was kept"
fi
log "restored $file into $name"
