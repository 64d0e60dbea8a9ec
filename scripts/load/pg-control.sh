#!/usr/bin/env bash
# Stop or start the throwaway cluster of a fault run (PG_DIR, PGPORT, PG_OPTS from the caller).
# Usage: scripts/load/pg-control.sh stop|start
set -euo pipefail
cd "$(dirname "$0")/../.."
source scripts/lib/common.sh
ensure_postgres_installed
case "${1:-}" in
  stop) pg_cluster_stop "$PG_DIR" ;;
  start) pg_cluster_start "$PG_DIR" "$PGPORT" "${PG_OPTS:-}" ;;
  *) die "usage: pg-control.sh stop|start" ;;
esac
