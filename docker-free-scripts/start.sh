#!/usr/bin/env bash
# The start command: installs what is missing, starts PostgreSQL, the S3 and SMTP fakes and the
# server (which also serves the exported web app), loads the demo data, and stays in the foreground.
# `--reset` (npm start -- --reset) drops the development database and the fakes' files first, so
# the demo starts over.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/docker-free-scripts/dev-env.sh"
cd "$ROOT"

reset=0
for arg in "$@"; do
  case "$arg" in
    --reset) reset=1 ;;
    *) log "unknown option: $arg (the start command takes only --reset)"; exit 2 ;;
  esac
done

ensure_node_modules
pg_up pg-dev "$PG_PORT"
if [ "$reset" = 1 ]; then
  log "--reset: dropping the development database, stored files and caught mail"
  pg_recreate_db "$PG_PORT" spanrelay
  if wait_for_http "$MAIL_CATCHER_URL/messages" 1; then
    # Fakes left running by another start: empty what can be emptied over their protocols.
    node -e "fetch('$MAIL_CATCHER_URL/messages', { method: 'DELETE' }).catch(() => process.exit(1))"
    log "the S3 fake of another start is running; its old files stay but nothing refers to them"
  else
    rm -rf "$DATA/fakes-dev"
  fi
else
  pg_ensure_db "$PG_PORT" spanrelay
fi

TSX="$ROOT/node_modules/.bin/tsx"
FAKES_PID=""
SERVER_PID=""
cleanup() {
  for pid in $SERVER_PID $FAKES_PID; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in $SERVER_PID $FAKES_PID; do wait "$pid" 2>/dev/null || true; done
  pg_down pg-dev
}
trap cleanup EXIT
trap 'exit 130' INT TERM

if ! wait_for_http "$MAIL_CATCHER_URL/messages" 1; then
  FAKES_DIR="$DATA/fakes-dev" "$TSX" docker-free-scripts/fakes/run-fakes.ts >"$DATA/fakes-dev.log" 2>&1 &
  FAKES_PID=$!
  wait_for_http "$MAIL_CATCHER_URL/messages" || { cat "$DATA/fakes-dev.log" >&2; exit 1; }
fi

"$TSX" docker-free-scripts/migrate-and-seed.ts
ensure_web_export
export WEB_DIST="$ROOT/dist"
# In the background and waited for, so Ctrl-C or a TERM reaches the trap at once.
"$TSX" server/index.ts &
SERVER_PID=$!
wait "$SERVER_PID"
