#!/usr/bin/env bash
# npm run bench: a scratch database with synthetic lots, the production build, then the measurements
# (scripts/bench/catalogue-bench.ts), with the bare Angular app Lighthouse scores beside /hay (scripts/bench/bare-angular).
# BENCH_SKIP_BUILD=1 reuses dist/; BENCH_KEEP_DB=1 reuses a filled database.
# The database (baleproof_bench plus DB_SUFFIX) and the ports (BENCH_PORT, default PORT + 8, the one after it and the one before)
# follow the worktree's .wtenv, so benches in two checkouts never drop each other's database or share a port.
set -euo pipefail
source "$(dirname "$0")/../env.sh"
cd "$ROOT"

bash scripts/db.sh start
BENCH_DB="baleproof_bench${DB_SUFFIX:-}"
export BENCH_DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_LOCAL/$BENCH_DB"
export BENCH_PORT="${BENCH_PORT:-$((PORT + 8))}"
if [ "${BENCH_KEEP_DB:-}" != 1 ]; then
  bash scripts/db.sh recreate "$BENCH_DB"
  DATABASE_URL="$BENCH_DATABASE_URL" node --import tsx server/db/migrate-cli.ts
fi
if [ "${BENCH_SKIP_BUILD:-}" != 1 ] || [ ! -f dist/baleproof/server/server.mjs ]; then
  log "building the production app"
  npm run --silent build:production
fi
if [ "${BENCH_SKIP_BUILD:-}" != 1 ] || [ ! -f dist/bench-bare-angular/server/server.mjs ]; then
  log "building the bare Angular baseline (scripts/bench/bare-angular)"
  (cd scripts/bench/bare-angular && ../../../node_modules/.bin/ng build >/dev/null)
fi
node --import tsx scripts/bench/catalogue-bench.ts
