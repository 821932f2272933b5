# Starts the local fakes in the background and records their PIDs in SERVICE_PIDS. Sourced, not run.
# Needs env.sh; uses SMTP_PORT, MAILDEV_WEB_PORT, STRIPE_FAKE_PORT and MAIL_DIR (where caught mail is kept).
#
# A fake is never reused silently: whatever already listens on one of these ports is either a fake this
# checkout started earlier on that port (its PID file names a live process whose command line is ours), which is
# stopped and started afresh so no state leaks between runs, or something else, and then we refuse to start.
SERVICE_PIDS=()
RUN_DIR="$ROOT/.data/run"

port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

wait_for_url() {
  local url="$1" name="$2" pid="$3"
  for _ in $(seq 1 150); do
    kill -0 "$pid" 2>/dev/null || fail "$name exited while starting (see .data/logs)"
    if curl -fsS -o /dev/null "$url" 2>/dev/null; then return 0; fi
    sleep 0.2
  done
  fail "$name did not start (no answer at $url)"
}

# The PID recorded for a fake, if that process is alive and still runs our command ($2 must appear in its command line).
our_live_pid() {
  local pidfile="$RUN_DIR/$1.pid" pid
  [ -f "$pidfile" ] || return 1
  pid="$(cat "$pidfile")"
  [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" 2>/dev/null | grep -qF -- "$2" || return 1
  echo "$pid"
}

# Makes the ports free for a fake: stops a leftover of ours, refuses anything else.
claim_ports() {
  local name="$1" signature="$2" pid port
  shift 2
  if pid="$(our_live_pid "$name" "$signature")"; then
    log "stopping the $name left running by an earlier run (pid $pid)"
    kill "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  fi
  rm -f "$RUN_DIR/$name.pid"
  for port in "$@"; do
    if port_in_use "$port"; then
      fail "port $port (for $name) is taken by a process this checkout did not start; stop it or choose other ports (SMTP_PORT, MAILDEV_WEB_PORT, STRIPE_FAKE_PORT; for npm test TEST_SMTP_PORT, TEST_MAILDEV_WEB_PORT, TEST_STRIPE_FAKE_PORT)"
    fi
  done
}

start_fakes() {
  local logdir="$ROOT/.data/logs" pid
  MAIL_DIR="${MAIL_DIR:-$ROOT/.data/mail}"
  mkdir -p "$logdir" "$MAIL_DIR" "$RUN_DIR"
  claim_ports "maildev-$MAILDEV_WEB_PORT" "$ROOT/node_modules/.bin/maildev --smtp $SMTP_PORT --web $MAILDEV_WEB_PORT" "$SMTP_PORT" "$MAILDEV_WEB_PORT"
  claim_ports "stripe-fake-$STRIPE_FAKE_PORT" "$ROOT/docker-local-fakes/stripe/stripe-fake-cli.ts" "$STRIPE_FAKE_PORT"

  node "$ROOT/node_modules/.bin/maildev" --smtp "$SMTP_PORT" --web "$MAILDEV_WEB_PORT" \
    --ip 127.0.0.1 --web-ip 127.0.0.1 --mail-directory "$MAIL_DIR" >"$logdir/maildev${FAKE_LOG_SUFFIX:-}.log" 2>&1 &
  pid=$!
  SERVICE_PIDS+=("$pid")
  echo "$pid" >"$RUN_DIR/maildev-$MAILDEV_WEB_PORT.pid"
  wait_for_url "http://127.0.0.1:$MAILDEV_WEB_PORT/api/healthz" "maildev" "$pid"
  log "mail catcher: smtp 127.0.0.1:$SMTP_PORT, inbox http://127.0.0.1:$MAILDEV_WEB_PORT"

  # Payment events go to the app that the fakes serve (npm start: PORT; npm test: E2E_PORT).
  STRIPE_FAKE_PORT="$STRIPE_FAKE_PORT" STRIPE_WEBHOOK_URL="${STRIPE_WEBHOOK_URL:-http://127.0.0.1:${APP_PORT:-${PORT:-4000}}/api/payments/webhook}" \
    node --import tsx "$ROOT/docker-local-fakes/stripe/stripe-fake-cli.ts" >"$logdir/stripe-fake${FAKE_LOG_SUFFIX:-}.log" 2>&1 &
  pid=$!
  SERVICE_PIDS+=("$pid")
  echo "$pid" >"$RUN_DIR/stripe-fake-$STRIPE_FAKE_PORT.pid"
  wait_for_url "http://127.0.0.1:$STRIPE_FAKE_PORT/health" "Stripe fake" "$pid"
  log "Stripe fake: http://127.0.0.1:$STRIPE_FAKE_PORT"

  export SMTP_URL="smtp://127.0.0.1:$SMTP_PORT"
  export MAIL_CATCHER_URL="http://127.0.0.1:$MAILDEV_WEB_PORT"
  export STRIPE_FAKE_PORT
}

# Fakes for copy i of the app that the journeys run on side by side (e2e/support/stack.ts): the same
# services on the base ports + STACK_PORT_STEP·i (the step read from that file, its one home), webhooks to
# that copy's app, mail kept in MAIL_DIR-s<i>. Leaves the exported addresses of copy 0 as they were.
start_stack_fakes() {
  local i="$1" step
  step=$(cd "$ROOT" && node --import tsx -p "require('./e2e/support/stack.ts').STACK_PORT_STEP")
  (
    SMTP_PORT=$((SMTP_PORT + step * i)) MAILDEV_WEB_PORT=$((MAILDEV_WEB_PORT + step * i))
    STRIPE_FAKE_PORT=$((STRIPE_FAKE_PORT + step * i)) APP_PORT=$((${APP_PORT:-$PORT} + step * i))
    MAIL_DIR="${MAIL_DIR:-$ROOT/.data/mail}-s$i" FAKE_LOG_SUFFIX="-s$i"
    unset STRIPE_WEBHOOK_URL
    SERVICE_PIDS=()
    start_fakes >&2
    echo "${SERVICE_PIDS[@]}"
  )
}

stop_services() {
  for pid in "${SERVICE_PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null || true
  done
  for pid in "${SERVICE_PIDS[@]:-}"; do
    [ -n "$pid" ] && wait "$pid" 2>/dev/null || true
  done
  rm -f "$RUN_DIR/maildev-$MAILDEV_WEB_PORT.pid" "$RUN_DIR/stripe-fake-$STRIPE_FAKE_PORT.pid"
}
