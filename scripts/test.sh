#!/usr/bin/env bash
# `npm test`: the same bootstrap into a fresh test database, then every check.
# Runs all steps, prints a summary, exits non-zero if any step failed.
set -euo pipefail
source "$(dirname "$0")/bootstrap.sh"

ensure_node_modules
ensure_env_file
ensure_chromium
bootstrap_database "${AIRPROOF_TEST_DB_NAME:-airproof_test}" fresh
source "$ROOT/scripts/local-env.sh" test
rm -rf "$LOCAL_SERVICES_DIR" && mkdir -p "$LOCAL_SERVICES_DIR"
trap stop_postgres_if_started EXIT

declare -a RESULTS=()
FAILED=0
step() {
  local name="$1"; shift
  local started=$SECONDS
  log "── $name"
  if "$@"; then
    RESULTS+=("ok    $name ($((SECONDS - started)) s)")
  else
    RESULTS+=("FAIL  $name ($((SECONDS - started)) s)")
    FAILED=1
  fi
}

# The seed stores the demo field log's bytes, so the stand-ins run while it does; they stop
# after it (one process, no npx in between), and Playwright starts its own on the same folder.
seed_with_stand_ins() {
  node --import tsx scripts/local-services.ts &
  local services=$! rc=0
  node scripts/wait-for.mjs "$MAILBOX_URL/health" "$S3_ENDPOINT" && npx tsx scripts/db-migrate.ts up && npx tsx --conditions=react-server scripts/db-seed.ts || rc=$?
  kill "$services" && wait "$services" || true
  return "$rc"
}

step "typecheck (tsc --noEmit)" npx tsc --noEmit
step "lint (eslint)" npx eslint --max-warnings=0 .
step "unit and reference tests (vitest)" npx vitest run --project unit --project reference
step "integration tests (vitest, PostgreSQL)" npx vitest run --project integration
step "migrate and seed the test database" seed_with_stand_ins
step "production build (next build)" npx next build
step "browser tests (Playwright, Debian chromium)" npx playwright test

log "summary"
for line in "${RESULTS[@]}"; do printf '  %s\n' "$line"; done
exit "$FAILED"
