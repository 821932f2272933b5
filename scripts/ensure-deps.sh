#!/usr/bin/env bash
# Installs what is missing: npm packages, and (as root) Debian's postgresql and chromium.
# Usage: ensure-deps.sh [--with-browser]
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

need_apt=()
if [ -z "$PG_BIN" ] || [ ! -x "$PG_BIN/initdb" ]; then need_apt+=(postgresql); fi
if [ "${1:-}" = "--with-browser" ] && [ ! -x /usr/bin/chromium ]; then need_apt+=(chromium); fi
if [ ${#need_apt[@]} -gt 0 ]; then
  if [ "$(id -u)" = 0 ]; then
    log "installing Debian packages: ${need_apt[*]}"
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq >/dev/null || true
    apt-get install -y -qq --no-install-recommends "${need_apt[@]}" >/dev/null
  else
    fail "missing Debian packages: ${need_apt[*]}. Install them with: sudo apt-get install ${need_apt[*]}"
  fi
fi

if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  log "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi
