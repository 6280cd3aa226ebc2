#!/usr/bin/env bash
# `npm test`: the same setup as `npm start` on separate test databases, then type check, lint,
# unit and integration tests (vitest, against the real PostgreSQL) and end-to-end tests (Playwright in
# Debian's Chromium). Exits non-zero on the first failing stage.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"

ensure_node_modules
command -v chromium >/dev/null 2>&1 || apt_install chromium
command -v pdftoppm >/dev/null 2>&1 || apt_install poppler-utils

export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-blockwright-test-secret-not-for-production}"
if [ -z "${DATABASE_URL:-}" ]; then
  ensure_local_postgres
  create_database blockwright_it --fresh
  create_database blockwright_e2e --fresh
  export INTEGRATION_DATABASE_URL="$(local_database_url blockwright_it)"
  export E2E_DATABASE_URL="$(local_database_url blockwright_e2e)"
else
  # One configured server: both suites share it, each on a clean schema.
  export INTEGRATION_DATABASE_URL="${INTEGRATION_DATABASE_URL:-$DATABASE_URL}"
  export E2E_DATABASE_URL="${E2E_DATABASE_URL:-$DATABASE_URL}"
fi
DATABASE_URL="$INTEGRATION_DATABASE_URL" npx tsx db/migrate.ts

log "type check"
npx tsc --noEmit
log "lint"
npx eslint . --max-warnings 0
log "unit and integration tests"
DATABASE_URL="$INTEGRATION_DATABASE_URL" npx vitest run
log "end-to-end tests"
DATABASE_URL="$E2E_DATABASE_URL" npx tsx db/migrate.ts
DATABASE_URL="$E2E_DATABASE_URL" npx tsx --conditions=react-server db/seed.ts
DATABASE_URL="$E2E_DATABASE_URL" npx playwright test
