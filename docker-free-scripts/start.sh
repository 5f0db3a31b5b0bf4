#!/usr/bin/env bash
# The start command: installs what is missing, starts PostgreSQL, the S3 and SMTP fakes and the
# server (which also serves the exported web app), loads the demo data, and stays in the foreground.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/docker-free-scripts/dev-env.sh"
cd "$ROOT"

ensure_node_modules
pg_up pg-dev "$PG_PORT"
pg_ensure_db "$PG_PORT" spanrelay

FAKES_PID=""
cleanup() {
  [ -n "$FAKES_PID" ] && kill "$FAKES_PID" 2>/dev/null || true
  pg_down pg-dev
}
trap cleanup EXIT
trap 'exit 130' INT TERM

if ! wait_for_http "$MAIL_CATCHER_URL/messages" 1; then
  FAKES_DIR="$DATA/fakes-dev" npx tsx docker-free-scripts/fakes/run-fakes.ts >"$DATA/fakes-dev.log" 2>&1 &
  FAKES_PID=$!
  wait_for_http "$MAIL_CATCHER_URL/messages" || { cat "$DATA/fakes-dev.log" >&2; exit 1; }
fi

npx tsx docker-free-scripts/migrate-and-seed.ts
ensure_web_export
export WEB_DIST="$ROOT/dist"
npx tsx server/index.ts
