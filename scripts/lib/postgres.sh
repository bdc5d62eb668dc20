#!/usr/bin/env bash
# Provisions a private PostgreSQL cluster on 127.0.0.1 for `npm start` and `npm test`.
# Sourced, not run. Skipped entirely when DATABASE_URL is set (any PostgreSQL will do).
# Sets DATABASE_URL and exports PG_STARTED_DATA (the cluster this shell must stop).

pg_log() { echo "[postgres] $*" >&2; }

pg_install_if_missing() {
  if ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then return 0; fi
  if [ "$(id -u)" != 0 ]; then
    pg_log "PostgreSQL is not installed; run: sudo apt-get install -y postgresql (or set DATABASE_URL)"
    return 1
  fi
  pg_log "installing PostgreSQL from Debian's packages (one time)…"
  export DEBIAN_FRONTEND=noninteractive
  mkdir -p /etc/postgresql-common
  grep -q '^create_main_cluster = false' /etc/postgresql-common/createcluster.conf 2>/dev/null ||
    echo 'create_main_cluster = false' >>/etc/postgresql-common/createcluster.conf
  apt-get update -qq && apt-get install -y -qq --no-install-recommends postgresql >/dev/null
}

pg_bin() { ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1; }

# Runs a PostgreSQL binary as the `postgres` user when we are root (initdb refuses root).
pg_as_owner() {
  if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

# True when every parent of $1 can be entered by the postgres user.
pg_path_reachable() {
  [ "$(id -u)" != 0 ] && return 0
  local dir
  dir=$(dirname "$1")
  runuser -u postgres -- test -x "$dir" 2>/dev/null
}

# pg_start DATA_DIR PORT [extra postgres -o options]
pg_start() {
  local data=$1 port=$2 extra=${3:-}
  local bin
  bin=$(pg_bin)
  mkdir -p "$data"
  if [ "$(id -u)" = 0 ]; then chown postgres: "$data"; fi
  chmod 700 "$data"
  if [ ! -f "$data/PG_VERSION" ]; then
    pg_as_owner "$bin/initdb" -D "$data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if pg_as_owner "$bin/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    # Someone else started it (another `npm start`, a developer): use it, leave it running.
    pg_log "already running in $data; leaving it running on exit"
    return 0
  elif ! pg_as_owner "$bin/pg_ctl" -D "$data" -l "$data/server.log" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $port -k '' $extra" start >/dev/null; then
    pg_log "could not start; last lines of $data/server.log:"
    tail -n 20 "$data/server.log" >&2
    return 1
  fi
  export PG_STARTED_DATA=$data
}

pg_stop() {
  local data=${1:-${PG_STARTED_DATA:-}}
  [ -n "$data" ] || return 0
  pg_as_owner "$(pg_bin)/pg_ctl" -D "$data" -m fast -w stop >/dev/null 2>&1 || true
}

# Chooses a data folder the postgres user can reach: the project's .data/, else /tmp.
pg_data_dir() {
  local wanted=$1 fallback=$2
  mkdir -p "$(dirname "$wanted")"
  if pg_path_reachable "$wanted"; then echo "$wanted"; else echo "$fallback"; fi
}

pg_create_database() {
  local port=$1 name=$2
  "$(pg_bin)/psql" -h 127.0.0.1 -p "$port" -U postgres -d postgres -qtAc \
    "SELECT 1 FROM pg_database WHERE datname = '$name'" | grep -q 1 ||
    "$(pg_bin)/psql" -h 127.0.0.1 -p "$port" -U postgres -d postgres -qc "CREATE DATABASE \"$name\"" >/dev/null
}

# The private cluster `npm start` and `npm run dev` share, unless DATABASE_URL names another.
provision_app_database() {
  [ -n "${DATABASE_URL:-}" ] && return 0
  pg_install_if_missing
  export PGPORT=${PGPORT:-54329}
  local data
  data=$(pg_data_dir "$PWD/.data/postgres-$PGPORT" "/tmp/duskhaul-$(basename "$PWD")-postgres-$PGPORT")
  pg_start "$data" "$PGPORT"
  pg_create_database "$PGPORT" duskhaul
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT/duskhaul"
}
