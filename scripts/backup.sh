#!/usr/bin/env bash
# Dump the database of DATABASE_URL to one file in pg_dump's custom format (compressed, restorable
# table by table, independent of the server's data directory).
# Usage: DATABASE_URL=postgres://… scripts/backup.sh [FILE]   (default: backups/craquelure-<UTC time>.dump)
# Prints the file's path on its last line.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

[ -n "${DATABASE_URL:-}" ] || die "set DATABASE_URL to the database to dump"
out=${1:-backups/craquelure-$(date -u +%Y%m%dT%H%M%SZ).dump}
mkdir -p "$(dirname "$out")"
# Write beside the target and rename, so a failed dump never leaves a truncated file behind
# under the name a restore would pick up.
pg_dump --format=custom --no-owner --no-privileges --file="$out.partial" --dbname="$DATABASE_URL" ||
  { rm -f "$out.partial"; die "pg_dump failed"; }
mv "$out.partial" "$out"
log "backup written: $out ($(du -h "$out" | cut -f1))"
echo "$out"
