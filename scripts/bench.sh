#!/usr/bin/env bash
# Speed figures, printed, never asserted: the engine's benches (packages/calc),
# the sheet render bench and the HTTP bench (apps/api/bench/http-bench.ts:
# /api/screen against a bare Express echo, list p95 against raw SQL, /api/screen
# p99 while sheets render, two API processes against one). The HTTP bench keeps
# its database (hoopline_bench, 100 000 revisions) on the test cluster between
# runs; results also go to .data/bench/.
#
#   ./scripts/bench.sh        (pnpm bench)
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$HOOPLINE_ROOT"

ensure_dependencies
bash scripts/pg.sh start test
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url test)}"
pnpm -r --workspace-concurrency=1 bench
