#!/usr/bin/env bash
# Shared set-up for `npm start`, `npm test` and `npm run bench`: Debian packages, node modules
# and the project's own PostgreSQL. Safe to run again and again. Source it, then call the steps.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
PG_PORT="${RIBBONRY_PG_PORT:-54329}"

log() { printf '\033[1;35m[ribbonry]\033[0m %s\n' "$*"; }

as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
    log "need root to run: $*"; return 1
  fi
}

# ensure_debian_packages PKG... — install whichever of them are missing.
APT_UPDATED=0
ensure_debian_packages() {
  local missing=()
  for pkg in "$@"; do
    dpkg-query -W -f='${Status}' "$pkg" 2>/dev/null | grep -q "install ok installed" || missing+=("$pkg")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  log "installing Debian packages: ${missing[*]}"
  if [ "$APT_UPDATED" -eq 0 ]; then as_root apt-get update -qq; APT_UPDATED=1; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

# ensure_node_modules — `npm ci` when node_modules is missing or older than the lockfile.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.ribbonry-lock"
  local want; want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
  if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then return 0; fi
  log "npm ci"
  (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  echo "$want" > "$stamp"
}

pg_bindir() {
  local d
  if command -v pg_config >/dev/null && d="$(pg_config --bindir 2>/dev/null)" && [ -x "$d/initdb" ]; then
    echo "$d"; return
  fi
  d="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)"
  [ -n "$d" ] && [ -x "$d/initdb" ] && echo "$d"
}

# The data folder lives in the project (git-ignored) when the postgres user can reach it;
# otherwise (a clone under a 700 home folder, say) in a folder of this project's under /var/tmp.
pg_datadir() {
  local inside="$ROOT/.data/pg"
  mkdir -p "$ROOT/.data"
  if [ "$(id -u)" -ne 0 ] || runuser -u postgres -- test -x "$ROOT/.data" 2>/dev/null; then
    echo "$inside"
  else
    echo "/var/tmp/ribbonry-$(echo -n "$ROOT" | sha256sum | cut -c1-12)/pg"
  fi
}

pg_run() { # run a PostgreSQL binary as the postgres user when we are root
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pg_start — install, initialise and start PostgreSQL on 127.0.0.1:$PG_PORT unless DATABASE_URL
# points elsewhere. Exports DATABASE_URL_ADMIN for creating databases.
pg_start() {
  if [ -n "${DATABASE_URL:-}" ] && [ "${RIBBONRY_OWN_PG:-}" != "1" ]; then
    log "using DATABASE_URL from the environment"; return 0
  fi
  local bindir; bindir="$(pg_bindir || true)"
  if [ -z "$bindir" ]; then ensure_debian_packages postgresql; bindir="$(pg_bindir)"; fi
  local data; data="$(pg_datadir)"
  local sock="$(dirname "$data")/socket"
  if [ "$(id -u)" -eq 0 ]; then
    id postgres >/dev/null 2>&1 || ensure_debian_packages postgresql
    mkdir -p "$(dirname "$data")" "$sock"
    chown postgres "$(dirname "$data")" "$sock"
  else
    mkdir -p "$(dirname "$data")" "$sock"
  fi
  if [ ! -f "$data/PG_VERSION" ]; then
    log "initialising PostgreSQL in $data"
    pg_run "$bindir/initdb" -D "$data" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if ! pg_run "$bindir/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    log "starting PostgreSQL on 127.0.0.1:$PG_PORT"
    if ! pg_run "$bindir/pg_ctl" -D "$data" -l "$data/server.log" -w -t 60 \
        -o "-h 127.0.0.1 -p $PG_PORT -k $sock" start >/dev/null; then
      log "PostgreSQL did not start; the end of $data/server.log says:"
      tail -n 5 "$data/server.log" >&2 || true
      log "(another server on port $PG_PORT? set RIBBONRY_PG_PORT to use another port)"
      return 1
    fi
  fi
  export RIBBONRY_PG_DATA="$data" RIBBONRY_PG_BIN="$bindir"
}

pg_stop() {
  local bindir data; bindir="$(pg_bindir || true)"; data="$(pg_datadir)"
  [ -n "$bindir" ] && [ -f "$data/PG_VERSION" ] || return 0
  pg_run "$bindir/pg_ctl" -D "$data" -m fast -w stop >/dev/null 2>&1 || true
}

# pg_ensure_database NAME — create the database on our server when it is missing.
pg_ensure_database() {
  local name="$1"
  [ -n "${RIBBONRY_PG_BIN:-}" ] || return 0
  if ! "$RIBBONRY_PG_BIN/psql" -h 127.0.0.1 -p "$PG_PORT" -U postgres -tAc \
      "select 1 from pg_database where datname = '$name'" postgres | grep -q 1; then
    "$RIBBONRY_PG_BIN/createdb" -h 127.0.0.1 -p "$PG_PORT" -U postgres "$name"
  fi
}
