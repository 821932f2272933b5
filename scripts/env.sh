# Shared settings for the project's scripts. Sourced, not run.
# Every value can be overridden from the environment.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export ROOT
export PGPORT_LOCAL="${PGPORT_LOCAL:-54329}"
export PORT="${PORT:-4000}"
export SMTP_PORT="${SMTP_PORT:-1025}"
export MAILDEV_WEB_PORT="${MAILDEV_WEB_PORT:-1080}"
export STRIPE_FAKE_PORT="${STRIPE_FAKE_PORT:-12111}"
PG_BIN="$(dirname "$(readlink -f "$(command -v pg_ctl 2>/dev/null || ls /usr/lib/postgresql/*/bin/pg_ctl 2>/dev/null | sort -V | tail -1)")" 2>/dev/null || true)"
export PG_BIN

log() { printf '\033[1;32m[baleproof]\033[0m %s\n' "$*"; }
fail() { printf '\033[1;31m[baleproof]\033[0m %s\n' "$*" >&2; exit 1; }
