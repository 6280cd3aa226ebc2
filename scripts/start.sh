#!/usr/bin/env bash
# `npm start`: installs what is missing, starts PostgreSQL and the local mail and file fakes,
# migrates, seeds the demo, builds when the sources changed, then serves the app.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"

export HOST="${HOST:-127.0.0.1}"
export PORT="${PORT:-3000}"
export APP_BASE_URL="${APP_BASE_URL:-http://$HOST:$PORT}"
export NEXTAUTH_URL="${NEXTAUTH_URL:-$APP_BASE_URL}"
export SMTP_PORT="${SMTP_PORT:-2525}"
export S3_PORT="${S3_PORT:-4569}"
export MAIL_OUTBOX_DIR="${MAIL_OUTBOX_DIR:-$ROOT/.data/outbox}"
export S3_DATA_DIR="${S3_DATA_DIR:-$ROOT/.data/s3}"

ensure_node_modules
ensure_auth_secret
if [ -z "${DATABASE_URL:-}" ]; then
  ensure_local_postgres
  create_database blockwright
  export DATABASE_URL="$(local_database_url blockwright)"
fi
npx tsx db/migrate.ts
npx tsx --conditions=react-server lib/demo/seed.ts

fakes_pid=""
if [ -z "${SMTP_HOST:-}" ] || [ -z "${S3_ENDPOINT:-}" ]; then
  npx tsx scripts/fakes.ts &
  fakes_pid=$!
  trap '[ -n "$fakes_pid" ] && kill "$fakes_pid" 2>/dev/null || true' EXIT INT TERM
  wait_for_port "$SMTP_PORT"
  wait_for_port "$S3_PORT"
fi

ensure_build
log "serving on $APP_BASE_URL (demo accounts in README.md)"
npx next start -H "$HOST" -p "$PORT"
