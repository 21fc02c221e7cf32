#!/usr/bin/env bash
# The long fuzz run (issue 13.1): the API fuzzer of apps/api/src/routes/fuzz.test.ts
# with many payloads against the test PostgreSQL. Prints the figures (payloads,
# answers 5xx, refused requests that changed rows) and fails on any of them.
#
#   scripts/fuzz.sh [RUNS] [SEED]     (RUNS default 10000; SEED default: a random one, printed)
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$HOOPLINE_ROOT"
runs="${1:-${HOOPLINE_FUZZ_RUNS:-10000}}"
seed="${2:-${HOOPLINE_FUZZ_SEED:-$(node -e 'console.log(Math.floor(Math.random() * 2 ** 31))')}}"
ensure_pnpm
bash scripts/pg.sh start test
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url test)}"
log "fuzzing every route that takes input: $runs payloads, seed $seed (repeat with: scripts/fuzz.sh $runs $seed)"
cd apps/api
HOOPLINE_FUZZ_RUNS="$runs" HOOPLINE_FUZZ_SEED="$seed" \
  pnpm exec vitest run src/routes/fuzz.test.ts --testTimeout=0
