#!/usr/bin/env bash
# `npm start`: install what is missing, bring up PostgreSQL and the local
# stand-ins, migrate, seed, build when sources changed, then serve.
set -euo pipefail
source "$(dirname "$0")/bootstrap.sh"

ensure_node_modules
ensure_env_file
bootstrap_database "${AIRPROOF_DB_NAME:-airproof}"
source "$ROOT/scripts/local-env.sh" dev

CHILDREN=()
cleanup() {
  trap - INT TERM EXIT
  log "shutting down"
  for pid in "${CHILDREN[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${CHILDREN[@]}"; do wait "$pid" 2>/dev/null || true; done
  stop_postgres_if_started
}
trap cleanup INT TERM EXIT

# The stand-ins first: the seed stores the demo field log's bytes.
log "starting local mail catcher and storage stand-in"
npx tsx scripts/local-services.ts &
CHILDREN+=($!)
node scripts/wait-for.mjs "$MAILBOX_URL/health" "$S3_ENDPOINT"

log "migrating"
npx tsx scripts/db-migrate.ts up
log "seeding the demo workspace"
npx tsx --conditions=react-server scripts/db-seed.ts

if bash scripts/needs-build.sh; then
  log "building"
  npx next build
fi

log "starting the proof worker"
npx tsx --conditions=react-server scripts/worker.ts &
CHILDREN+=($!)
node scripts/wait-for.mjs "$WORKER_HEALTH_URL/health"

log "serving on http://localhost:$PORT"
node node_modules/next/dist/bin/next start -p "$PORT" &
CHILDREN+=($!)
wait -n "${CHILDREN[@]}"
