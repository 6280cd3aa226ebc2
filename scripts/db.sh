#!/usr/bin/env bash
# Starts (or reuses) the project-local PostgreSQL and creates the app database when missing.
set -euo pipefail
source "$(dirname "$0")/common.sh"
ensure_local_postgres
create_database blockwright
log "PostgreSQL ready: $(local_database_url blockwright)"
