#!/usr/bin/env bash
# Takes a fresh machine (Node 20 and npm) to a running Hoopline with demo data:
# pinned pnpm, dependencies from the lockfile, the project-local PostgreSQL,
# migrations, the demo scenario, the web build, and web + API served on
# 127.0.0.1. Safe to run again: the cluster and the demo data are reused.
#
#   ./scripts/start.sh            (HOOPLINE_PORT=8080 by default)
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$HOOPLINE_ROOT"

ensure_dependencies
bash scripts/pg.sh start main
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url main)}"

# Mail goes to the local fake SMTP server unless HOOPLINE_SMTP_HOST names a real one.
if [[ -z "${HOOPLINE_SMTP_HOST:-}" ]]; then
  bash scripts/mail-fake.sh start main
  export HOOPLINE_SMTP_HOST=127.0.0.1 HOOPLINE_SMTP_PORT="${HOOPLINE_SMTP_PORT:-2525}"
  mail_note="mail Hoopline sends is stored in $(bash scripts/mail-fake.sh folder main) (one .eml per message)"
else
  mail_note="mail goes through $HOOPLINE_SMTP_HOST:${HOOPLINE_SMTP_PORT:-587}"
fi

# A signing secret for this installation, made once and kept in .data/.
secret_file="$HOOPLINE_ROOT/.data/jwt-secret"
if [[ ! -s "$secret_file" ]]; then
  (umask 077 && node -e "process.stdout.write(require('crypto').randomBytes(48).toString('base64url'))" >"$secret_file")
fi
export HOOPLINE_JWT_SECRET="${HOOPLINE_JWT_SECRET:-$(cat "$secret_file")}"

export HOOPLINE_HOST="${HOOPLINE_HOST:-127.0.0.1}"
export HOOPLINE_PORT="${HOOPLINE_PORT:-8080}"
export HOOPLINE_PUBLIC_URL="${HOOPLINE_PUBLIC_URL:-http://$HOOPLINE_HOST:$HOOPLINE_PORT}"
export HOOPLINE_WEB_DIST="$HOOPLINE_ROOT/apps/web/dist"
export NODE_ENV=production

log "migrating the database"
(cd apps/api && node --import tsx src/db/migrate.ts)
demo_file="$HOOPLINE_ROOT/.data/demo-sign-in.txt"
if [[ -f apps/api/src/seed/seed.ts ]]; then
  log "loading the demo scenario"
  (cd apps/api && node --import tsx src/seed/seed.ts --write-sign-in "$demo_file")
fi

log "building the web app"
pnpm --filter @hoopline/web build >/dev/null

echo
log "Hoopline is starting on $HOOPLINE_PUBLIC_URL"
if [[ -f "$demo_file" ]]; then
  cat "$demo_file"
else
  log "(no demo scenario yet)"
fi
log "$mail_note"
log "stop with Ctrl-C; the database and the mail fake keep running (scripts/pg.sh stop main, scripts/mail-fake.sh stop main)"
echo
cd apps/api
exec node --import tsx src/main.ts
