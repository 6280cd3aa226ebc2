#!/usr/bin/env bash
# Started by Playwright: builds into its own folder when the sources changed, then serves the app
# for the end-to-end tests. The database is prepared by scripts/test.sh before Playwright starts.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"
export NEXT_DIST_DIR=.next-test
ensure_build
exec npx next start -H 127.0.0.1 -p "${PORT:-3100}"
