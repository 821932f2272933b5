#!/usr/bin/env bash
# A project-local PostgreSQL cluster on 127.0.0.1:$PGPORT_LOCAL.
# Usage: db.sh start | stop | status | dir
# PostgreSQL refuses to run as root, so as root the cluster belongs to the `postgres` user;
# when that user cannot reach the checkout (e.g. under a private /root), the data lives under /tmp.
set -euo pipefail
source "$(dirname "$0")/env.sh"

as_pg() { if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi; }

data_dir() {
  if [ -n "${BALEPROOF_PG_DIR:-}" ]; then echo "$BALEPROOF_PG_DIR"; return; fi
  local local_dir="$ROOT/.data/pg"
  if [ "$(id -u)" != 0 ] || runuser -u postgres -- test -w "$ROOT/.data" 2>/dev/null; then
    echo "$local_dir"
  else
    echo "/tmp/baleproof-pg-$(echo "$ROOT" | md5sum | cut -c1-8)"
  fi
}

DATA="$(data_dir)"

start() {
  mkdir -p "$ROOT/.data"
  if [ "$(id -u)" = 0 ]; then
    # let the postgres user reach a local data folder where the path allows it
    chown postgres: "$ROOT/.data" 2>/dev/null || true
    DATA="$(data_dir)"
  fi
  if [ ! -f "$DATA/PG_VERSION" ]; then
    log "initialising PostgreSQL cluster in $DATA"
    mkdir -p "$DATA"
    [ "$(id -u)" = 0 ] && chown postgres: "$DATA"
    chmod 700 "$DATA"
    as_pg "$PG_BIN/initdb" -D "$DATA" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if as_pg "$PG_BIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; then
    log "PostgreSQL already running on 127.0.0.1:$PGPORT_LOCAL"
  else
    log "starting PostgreSQL on 127.0.0.1:$PGPORT_LOCAL"
    as_pg "$PG_BIN/pg_ctl" -D "$DATA" -w -l "$DATA/server.log" \
      -o "-p $PGPORT_LOCAL -k $DATA -c listen_addresses=127.0.0.1 ${PG_EXTRA_OPTS:-}" start >/dev/null
  fi
}

stop() {
  if as_pg "$PG_BIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; then
    as_pg "$PG_BIN/pg_ctl" -D "$DATA" -m fast -w stop >/dev/null && log "PostgreSQL stopped"
  fi
}

# Creates a database if missing: db.sh create NAME
create() {
  local name="$1"
  if ! "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT_LOCAL" -U postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT_LOCAL" -U postgres -qc "create database \"$name\"" >/dev/null
    log "created database $name"
  fi
}

# Drops and recreates a database: db.sh recreate NAME
recreate() {
  "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT_LOCAL" -U postgres -qc "drop database if exists \"$1\" with (force)" >/dev/null
  create "$1"
}

# Replaces database COPY with a copy of SOURCE (which must have no open connections): db.sh clone SOURCE COPY
clone() {
  "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT_LOCAL" -U postgres -qc "drop database if exists \"$2\" with (force)" >/dev/null
  "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT_LOCAL" -U postgres -qc "create database \"$2\" template \"$1\"" >/dev/null
  log "copied database $1 to $2"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) as_pg "$PG_BIN/pg_ctl" -D "$DATA" status ;;
  dir) echo "$DATA" ;;
  create) create "$2" ;;
  recreate) recreate "$2" ;;
  clone) clone "$2" "$3" ;;
  *) echo "usage: db.sh start|stop|status|dir|create NAME|recreate NAME|clone SOURCE COPY" >&2; exit 2 ;;
esac
