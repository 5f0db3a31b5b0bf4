#!/usr/bin/env bash
# Shared helpers for the start and test commands: everything runs on loopback, nothing in Docker.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA="$ROOT/.data"
mkdir -p "$DATA"
# The AWS SDK version is pinned in the lock file; its notice about future Node versions is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

log() { printf '[spanrelay] %s\n' "$*" >&2; }

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"; else sudo "$@"; fi
}

apt_install() {
  log "installing Debian packages: $*"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

# npm ci only when the lock file changed since the last install, so repeated starts stay quick.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.spanrelay-lock.sha256"
  local want
  want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
  if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$want" ]; then
    log "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$stamp"
  fi
}

pg_bin_dir() {
  local d
  d="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  printf '%s' "$d"
}

ensure_postgres_binaries() {
  if [ -z "$(pg_bin_dir)" ] || [ ! -x "$(pg_bin_dir)/initdb" ]; then
    apt_install postgresql
  fi
  PG_BIN="$(pg_bin_dir)"
  export PG_BIN
}

ensure_chromium() {
  if ! command -v chromium >/dev/null 2>&1; then
    apt_install chromium
  fi
}

# initdb refuses to run as root, so as root the cluster belongs to the postgres OS user.
pg_as_owner() {
  if [ "$(id -u)" = 0 ]; then
    id postgres >/dev/null 2>&1 || as_root useradd --system --home-dir /var/lib/postgresql --shell /bin/false postgres
    # From /, which the postgres user can always enter, whatever the checkout's folder allows.
    (cd / && runuser -u postgres -- "$@")
  else
    "$@"
  fi
}

# The cluster lives in .data/NAME; as root, where the postgres user cannot reach the checkout
# (a clone under a private home folder), it lives in a folder of its own for this checkout.
pg_data_dir() {
  local name="$1"
  if [ "$(id -u)" = 0 ] && id postgres >/dev/null 2>&1 && ! runuser -u postgres -- test -x "$DATA" 2>/dev/null; then
    printf '%s' "/var/lib/spanrelay/$(printf '%s' "$ROOT" | sha256sum | cut -c1-12)/$name"
  else
    printf '%s' "$DATA/$name"
  fi
}

# pg_up NAME PORT [SERVER_OPTIONS]: a private cluster listening on 127.0.0.1:PORT only; options
# such as "-c shared_buffers=1GB" apply when it starts.
pg_up() {
  local name="$1" port="$2" extra="${3:-}"
  ensure_postgres_binaries
  local dir sock="/tmp/spanrelay-pg-$port"
  dir="$(pg_data_dir "$name")"
  mkdir -p "$dir" "$sock"
  if [ "$(id -u)" = 0 ]; then chown postgres "$dir" "$sock"; chmod 700 "$dir"; fi
  if [ ! -f "$dir/PG_VERSION" ]; then
    log "creating PostgreSQL cluster $name"
    pg_as_owner "$PG_BIN/initdb" -D "$dir" -U postgres -A trust -E UTF8 --no-locale >/dev/null
  fi
  if ! pg_as_owner "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    log "starting PostgreSQL $name on 127.0.0.1:$port"
    pg_as_owner "$PG_BIN/pg_ctl" -D "$dir" -l "$sock/postgres.log" -w -t 60 \
      -o "-c listen_addresses=127.0.0.1 -p $port -k $sock $extra" start >/dev/null
  fi
}

pg_down() {
  local name="$1"
  local dir
  dir="$(pg_data_dir "$name")"
  [ -f "$dir/PG_VERSION" ] || return 0
  ensure_postgres_binaries
  pg_as_owner "$PG_BIN/pg_ctl" -D "$dir" -m fast stop >/dev/null 2>&1 || true
}

pg_psql() {
  local port="$1"; shift
  PGOPTIONS="-c client_min_messages=warning" "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U postgres -v ON_ERROR_STOP=1 -qtA "$@"
}

pg_ensure_db() {
  local port="$1" db="$2"
  if [ "$(pg_psql "$port" -d postgres -c "select 1 from pg_database where datname = '$db'")" != 1 ]; then
    pg_psql "$port" -d postgres -c "create database \"$db\""
  fi
}

pg_recreate_db() {
  local port="$1" db="$2"
  pg_psql "$port" -d postgres -c "drop database if exists \"$db\" with (force)"
  pg_psql "$port" -d postgres -c "create database \"$db\""
}

wait_for_http() {
  local url="$1" tries="${2:-120}"
  for _ in $(seq "$tries"); do
    if node -e "fetch('$url').then(r=>process.exit(r.status<500?0:1)).catch(()=>process.exit(1))"; then return 0; fi
    sleep 0.5
  done
  return 1
}

# The web build is redone only when a client source file is newer than the last export.
ensure_web_export() {
  local stamp="$ROOT/dist/index.html"
  if [ -f "$stamp" ] && [ -z "$(cd "$ROOT" && find app features shared assets app.json package-lock.json -newer "$stamp" -type f 2>/dev/null | head -n 1)" ]; then
    return 0
  fi
  log "exporting the web app (expo export --platform web)"
  (cd "$ROOT" && CI=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir dist >"$DATA/expo-export.log" 2>&1) || {
    tail -n 40 "$DATA/expo-export.log" >&2; return 1; }
}
