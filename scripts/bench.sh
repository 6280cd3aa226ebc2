#!/usr/bin/env bash
# `npm run bench`: the computation budgets, then the production app under load. Prepares what the load
# section needs first: a freshly seeded bench database (blockwright_bench on the local cluster, or the
# database BENCH_DATABASE_URL names, emptied) and a production build (the end-to-end tests' .next-test,
# rebuilt only when the sources changed). When that preparation fails the figures of the computations
# are still printed, and the load section says it was skipped.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"

ensure_node_modules
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-blockwright-bench-secret-not-for-production}"
export NEXT_DIST_DIR=.next-test

prepare_load=1
if [ -z "${BENCH_DATABASE_URL:-}" ]; then
  if [ -n "${DATABASE_URL:-}" ]; then
    log "DATABASE_URL names a server of your own: set BENCH_DATABASE_URL to a database the bench may empty (load section skipped)"
    prepare_load=0
  else
    ensure_local_postgres
    create_database blockwright_bench --fresh
    BENCH_DATABASE_URL="$(local_database_url blockwright_bench)"
  fi
else
  # The database is named by its URL: recreated through the server's maintenance database.
  name="${BENCH_DATABASE_URL##*/}"
  psql "${BENCH_DATABASE_URL%/*}/postgres" -qtA -v ON_ERROR_STOP=1 \
    -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)" -c "CREATE DATABASE \"$name\"" >/dev/null
fi

if [ "$prepare_load" = 1 ]; then
  mkdir -p .data
  (
    DATABASE_URL="$BENCH_DATABASE_URL" npx tsx db/migrate.ts
    DATABASE_URL="$BENCH_DATABASE_URL" npx tsx --conditions=react-server lib/demo/seed.ts
    ensure_build
  ) > .data/bench-prepare.log 2>&1 &
  if wait $!; then
    export BENCH_DATABASE_URL
  else
    cat .data/bench-prepare.log
    log "preparing the load section failed (above): it is skipped"
    unset BENCH_DATABASE_URL
  fi
fi

NODE_ENV=production npx tsx scripts/bench.ts
