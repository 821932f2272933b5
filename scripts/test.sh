#!/usr/bin/env bash
# npm test: everything CI runs. Type checks, Jest (unit + integration against a fresh database),
# then Playwright journeys in Debian's Chromium against the built server-rendered app.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

# Test services use their own ports so they can run beside `npm start`.
export SMTP_PORT="${TEST_SMTP_PORT:-1026}" MAILDEV_WEB_PORT="${TEST_MAILDEV_WEB_PORT:-1081}" STRIPE_FAKE_PORT="${TEST_STRIPE_FAKE_PORT:-12112}"
export E2E_PORT="${E2E_PORT:-4100}"
source "$(dirname "$0")/services.sh"

bash scripts/ensure-deps.sh --with-browser

STARTED_PG=0
cleanup() {
  stop_services
  [ "$STARTED_PG" = 1 ] && [ "${KEEP_DB:-}" != 1 ] && bash scripts/db.sh stop
  return 0
}
trap cleanup EXIT

if [ -z "${TEST_DATABASE_URL:-}" ]; then
  # Stop the cluster at the end only if this script started it.
  bash scripts/db.sh status >/dev/null 2>&1 || STARTED_PG=1
  bash scripts/db.sh start
  bash scripts/db.sh recreate "baleproof_test${DB_SUFFIX:-}"
  bash scripts/db.sh recreate "baleproof_e2e${DB_SUFFIX:-}"
  export TEST_DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_LOCAL/baleproof_test${DB_SUFFIX:-}"
  export E2E_DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_LOCAL/baleproof_e2e${DB_SUFFIX:-}"
fi

log "type-checking"
node_modules/.bin/tsc -p tsconfig.server.json

log "checking for import loops (madge)"
node_modules/.bin/madge --circular --no-spinner --extensions ts --ts-config tsconfig.json server shared src

DATABASE_URL="$TEST_DATABASE_URL" node --import tsx server/db/migrate-cli.ts
# The fakes start before Jest: integration tests send real mail through SMTP and read it back from the catcher.
# Fresh mail folders per run, so no test can find a message an earlier run left: the app copies' catchers
# (start_stack_fakes) keep theirs in MAIL_DIR-s<i>, and maildev reloads what a folder holds when it starts.
export MAIL_DIR="$ROOT/.data/test-mail"
rm -rf "$MAIL_DIR" "$MAIL_DIR"-s*
APP_PORT="$E2E_PORT" # The Stripe fake signs webhooks with the secret the production-mode e2e server expects.
export STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_e2e_only_secret}"
start_fakes

log "unit and integration tests (Jest)"
NODE_ENV=test node_modules/.bin/jest --ci

log "building the app for end-to-end tests"
npm run --silent build:production

log "preparing the end-to-end database"
DATABASE_URL="${E2E_DATABASE_URL:?E2E_DATABASE_URL is required}" node --import tsx server/db/migrate-cli.ts
DATABASE_URL="$E2E_DATABASE_URL" UPLOAD_DIR="$ROOT/.data/e2e-uploads" node --import tsx scripts/seed/seed-cli.ts

# The journeys run on E2E_STACKS copies of the app side by side, one per Playwright worker (e2e/support/stack.ts):
# copy i gets a clone of the seeded database and uploads, and fakes of its own on the base ports moved by
# STACK_PORT_STEP·i (start_stack_fakes).
export E2E_STACKS="${E2E_STACKS:-2}"
for i in $(seq 1 $((E2E_STACKS - 1))); do
  bash scripts/db.sh clone "${E2E_DATABASE_URL##*/}" "${E2E_DATABASE_URL##*/}_s$i"
  rm -rf "$ROOT/.data/e2e-uploads-s$i" && cp -a "$ROOT/.data/e2e-uploads" "$ROOT/.data/e2e-uploads-s$i"
  read -ra stack_pids <<<"$(start_stack_fakes "$i")"
  SERVICE_PIDS+=("${stack_pids[@]}")
done

log "end-to-end tests (Playwright, Chromium, $E2E_STACKS workers)"
DATABASE_URL="$E2E_DATABASE_URL" UPLOAD_DIR="$ROOT/.data/e2e-uploads" node_modules/.bin/playwright test
