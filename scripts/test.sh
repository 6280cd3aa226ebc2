#!/usr/bin/env bash
# `npm test`: the same setup as `npm start` on separate test databases, then type check and lint (side by
# side), unit and integration tests (vitest, against the real PostgreSQL, one database per worker) while the
# app is built for the end-to-end tests, then the end-to-end tests (Playwright in Debian's Chromium).
# Exits non-zero on the first failing stage.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"

ensure_node_modules
command -v chromium >/dev/null 2>&1 || apt_install chromium
command -v pdftoppm >/dev/null 2>&1 || apt_install poppler-utils

export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-blockwright-test-secret-not-for-production}"
if [ -z "${DATABASE_URL:-}" ]; then
  ensure_local_postgres
  create_database blockwright_it
  create_database blockwright_e2e --fresh
  export INTEGRATION_DATABASE_URL="$(local_database_url blockwright_it)"
  export E2E_DATABASE_URL="$(local_database_url blockwright_e2e)"
else
  # One configured server: both suites share it, each on a clean schema.
  export INTEGRATION_DATABASE_URL="${INTEGRATION_DATABASE_URL:-$DATABASE_URL}"
  export E2E_DATABASE_URL="${E2E_DATABASE_URL:-$DATABASE_URL}"
fi

mkdir -p .data
# The background preparation runs in a process group of its own, so a failed stage ends all of it.
background_pid=""
trap '[ -n "$background_pid" ] && kill -- "-$background_pid" 2>/dev/null || true' EXIT INT TERM

# Runs each command in the background and waits for all of them; fails if any failed, after all ended.
side_by_side() {
  local pids=() failed=0 pid
  for command in "$@"; do bash -c "$command" & pids+=("$!"); done
  for pid in "${pids[@]}"; do wait "$pid" || failed=1; done
  return "$failed"
}

log "type check and lint"
# The route types next build would check (.next-test/types, in tsconfig's include) come from next typegen,
# so tsc checks everything the build's own type check did and the build below can skip it.
NEXT_DIST_DIR=.next-test npx next typegen >/dev/null
side_by_side "npx tsc --noEmit" "npx eslint . --max-warnings 0"

# The end-to-end database and build do not depend on vitest: they are prepared while it runs.
log "preparing the end-to-end app in the background (log: .data/e2e-prepare.log)"
setsid bash -c '
  set -euo pipefail
  source scripts/common.sh
  DATABASE_URL="$E2E_DATABASE_URL" npx tsx db/migrate.ts
  DATABASE_URL="$E2E_DATABASE_URL" npx tsx --conditions=react-server lib/demo/seed.ts
  NEXT_DIST_DIR=.next-test BLOCKWRIGHT_TYPES_CHECKED=1 ensure_build
' > .data/e2e-prepare.log 2>&1 &
background_pid=$!

log "unit and integration tests"
DATABASE_URL="$INTEGRATION_DATABASE_URL" npx vitest run

if ! wait "$background_pid"; then
  background_pid=""
  cat .data/e2e-prepare.log
  log "preparing the end-to-end app failed"
  exit 1
fi
background_pid=""
cat .data/e2e-prepare.log
log "end-to-end tests"
DATABASE_URL="$E2E_DATABASE_URL" npx playwright test
