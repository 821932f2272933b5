# Starts the local fakes in the background and records their PIDs in SERVICE_PIDS. Sourced, not run.
# Needs env.sh; uses SMTP_PORT, MAILDEV_WEB_PORT, STRIPE_FAKE_PORT.
SERVICE_PIDS=()

wait_for_url() {
  local url="$1" name="$2"
  for _ in $(seq 1 150); do
    if curl -fsS -o /dev/null "$url" 2>/dev/null; then return 0; fi
    sleep 0.2
  done
  fail "$name did not start (no answer at $url)"
}

start_fakes() {
  local logdir="$ROOT/.data/logs"
  mkdir -p "$logdir" "$ROOT/.data/mail"
  if curl -fsS -o /dev/null "http://127.0.0.1:$MAILDEV_WEB_PORT/api/healthz" 2>/dev/null; then
    log "mail catcher already running on :$MAILDEV_WEB_PORT"
  else
    node "$ROOT/node_modules/.bin/maildev" --smtp "$SMTP_PORT" --web "$MAILDEV_WEB_PORT" \
      --ip 127.0.0.1 --web-ip 127.0.0.1 --mail-directory "$ROOT/.data/mail" >"$logdir/maildev.log" 2>&1 &
    SERVICE_PIDS+=($!)
    wait_for_url "http://127.0.0.1:$MAILDEV_WEB_PORT/api/healthz" "maildev"
    log "mail catcher: smtp 127.0.0.1:$SMTP_PORT, inbox http://127.0.0.1:$MAILDEV_WEB_PORT"
  fi
  if curl -fsS -o /dev/null "http://127.0.0.1:$STRIPE_FAKE_PORT/health" 2>/dev/null; then
    log "Stripe fake already running on :$STRIPE_FAKE_PORT"
  else
    # Payment events go to the app that the fakes serve (npm start: PORT; npm test: E2E_PORT).
    STRIPE_FAKE_PORT="$STRIPE_FAKE_PORT" STRIPE_WEBHOOK_URL="${STRIPE_WEBHOOK_URL:-http://127.0.0.1:${APP_PORT:-${PORT:-4000}}/api/payments/webhook}" node --import tsx "$ROOT/docker-local-fakes/stripe/stripe-fake-cli.ts" >"$logdir/stripe-fake.log" 2>&1 &
    SERVICE_PIDS+=($!)
    wait_for_url "http://127.0.0.1:$STRIPE_FAKE_PORT/health" "Stripe fake"
    log "Stripe fake: http://127.0.0.1:$STRIPE_FAKE_PORT"
  fi
  export SMTP_URL="smtp://127.0.0.1:$SMTP_PORT"
  export STRIPE_FAKE_PORT
}

stop_services() {
  for pid in "${SERVICE_PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null || true
  done
  for pid in "${SERVICE_PIDS[@]:-}"; do
    [ -n "$pid" ] && wait "$pid" 2>/dev/null || true
  done
}
