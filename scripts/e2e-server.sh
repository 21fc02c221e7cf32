#!/usr/bin/env bash
# The server the Playwright journeys run against: a fresh e2e database on the
# test cluster (or on DATABASE_URL's server), migrated and seeded, the fake
# SMTP server (test instance) for its mail, and the built web app served by
# the API on 127.0.0.1:<port>.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
port="${1:-8090}"
if [[ -z "${DATABASE_URL:-}" ]]; then
  bash "$ROOT/scripts/pg.sh" start test
  server_url="$(bash "$ROOT/scripts/pg.sh" url test)"
else
  server_url="$DATABASE_URL"
fi
admin_url="${server_url%/*}/postgres"
e2e_url="${server_url%/*}/hoopline_e2e"
psql_bin="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)/psql"
[[ -x "$psql_bin" ]] || psql_bin=psql
"$psql_bin" "$admin_url" -qc "drop database if exists hoopline_e2e with (force)" >/dev/null
"$psql_bin" "$admin_url" -qc "create database hoopline_e2e" >/dev/null
bash "$ROOT/scripts/mail-fake.sh" start test >&2
rm -f "$(bash "$ROOT/scripts/mail-fake.sh" folder test)"/*.eml "$(bash "$ROOT/scripts/mail-fake.sh" folder test)/index.jsonl"
uploads="$ROOT/.data/uploads-e2e"
rm -rf "$uploads"
cd "$ROOT/apps/api"
export HOOPLINE_SMTP_HOST=127.0.0.1 HOOPLINE_SMTP_PORT="${HOOPLINE_SMTP_TEST_PORT:-2535}" \
  HOOPLINE_MAIL_POLL_MS=200 HOOPLINE_UPLOAD_DIR="$uploads"
export DATABASE_URL="$e2e_url" NODE_ENV=test HOOPLINE_PORT="$port" HOOPLINE_HOST=127.0.0.1 \
  HOOPLINE_WEB_DIST="$ROOT/apps/web/dist" HOOPLINE_LOG_LEVEL="${HOOPLINE_LOG_LEVEL:-warn}"
node --import tsx src/db/migrate.ts >&2
if [[ -f src/seed/seed.ts ]]; then node --import tsx src/seed/seed.ts >&2; fi
if [[ ! -f "$ROOT/apps/web/dist/index.html" ]]; then
  (cd "$ROOT/apps/web" && pnpm build >&2)
fi
exec node --import tsx src/main.ts
