#!/usr/bin/env bash
# npm run bench:api — the workspace API under load, on its own throwaway PostgreSQL cluster and
# its own production build (.next-bench), so it never touches .data/ or a running app.
# Stops everything it started, also on Ctrl-C. Last line:
# bench:api: list_p95=… save_p95=… floor_p95=… list_ratio=… save_ratio=… list_cpu=… save_cpu=… errors=…
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh
source scripts/lib/bench-stack.sh

# Production-like durability (fsync on); more memory than the tiny default for 100k revisions.
bench_stack_up bench-api .next-bench craquelure_bench 23000 30000 \
  "-c shared_buffers=256MB -c max_connections=100"

# The load script seeds, starts scripts/serve.ts (every core) as its own child and stops it before it returns.
npx tsx scripts/bench-api.ts
