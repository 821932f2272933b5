#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the fakes, migrate, seed, build and serve.
set -euo pipefail
source "$(dirname "$0")/env.sh"
source "$(dirname "$0")/services.sh"
cd "$ROOT"

bash scripts/ensure-deps.sh

STARTED_PG=0
cleanup() {
  trap - EXIT INT TERM
  log "stopping"
  stop_services
  [ "$STARTED_PG" = 1 ] && bash scripts/db.sh stop
  exit 0
}
trap cleanup EXIT INT TERM

if [ -z "${DATABASE_URL:-}" ]; then
  # Stop the cluster at the end only if this script started it.
  bash scripts/db.sh status >/dev/null 2>&1 || STARTED_PG=1
  bash scripts/db.sh start
  bash scripts/db.sh create baleproof
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_LOCAL/baleproof"
else
  log "using DATABASE_URL from the environment"
fi

node --import tsx server/db/migrate-cli.ts
node --import tsx scripts/seed/seed-cli.ts
start_fakes

log "building the app"
npm run --silent build:production >"$ROOT/.data/logs/build.log" 2>&1 || { cat "$ROOT/.data/logs/build.log"; fail "build failed"; }

log "Baleproof: http://127.0.0.1:$PORT  (Ctrl-C stops everything)"
PORT="$PORT" node dist/baleproof/server/server.mjs &
SERVICE_PIDS+=($!)
wait "${SERVICE_PIDS[-1]}"
