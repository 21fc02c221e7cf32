#!/usr/bin/env bash
# Runs every test: lint, typecheck, unit (calc, web), integration (API against
# the real PostgreSQL) and the browser journeys (Playwright in Debian's
# Chromium). Exits non-zero on the first failure. Safe to run again.
#
#   ./scripts/test.sh
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$HOOPLINE_ROOT"

started=$SECONDS
step() {
  local name="$1"
  shift
  log "── $name"
  local t=$SECONDS
  "$@"
  log "   $name passed in $((SECONDS - t)) s"
}

step "dependencies" ensure_dependencies
step "system packages" bash -c "source scripts/lib.sh && ensure_debian_package /usr/bin/chromium chromium && ensure_debian_package /usr/bin/pdftoppm poppler-utils"
step "database" bash scripts/pg.sh start test
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url test)}"
export CI="${CI:-}"

step "lint" pnpm lint
step "typecheck" pnpm -r --workspace-concurrency=1 typecheck
step "unit: calc" pnpm --filter @hoopline/calc test
step "unit: present" pnpm --filter @hoopline/present test
step "unit: web" pnpm --filter @hoopline/web test
step "integration: api" pnpm --filter @hoopline/api test
step "build: web" pnpm --filter @hoopline/web build
step "budget: sign-in script" pnpm --filter @hoopline/web check:bundle
step "browser: e2e" pnpm --filter @hoopline/e2e test
bash scripts/mail-fake.sh stop test >/dev/null 2>&1 || true

log "all tests passed in $((SECONDS - started)) s"
