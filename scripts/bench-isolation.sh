#!/usr/bin/env bash
# npm run bench:isolation — is /api/health still quick while the compute pool is full? Own
# throwaway PostgreSQL cluster, own port, the bench build (.next-bench, shared with bench:api);
# stops everything it started, also on Ctrl-C. Last line:
# bench:isolation: health_p95=… health_max=… runs_ok=…
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh
source scripts/lib/bench-stack.sh

bench_stack_up bench-isolation .next-bench craquelure_bench 24000 31000 "-c max_connections=100"

# The driver seeds, starts scripts/serve.ts (every core) as its own child and stops it before it returns.
npx tsx scripts/bench-isolation.ts
