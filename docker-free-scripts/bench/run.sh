#!/usr/bin/env bash
# npm run bench: a PostgreSQL cluster of its own (.data/pg-bench on 56632) with a fresh
# spanrelay_bench database seeded at agency scale, the S3 and SMTP fakes and the server on ports
# of their own (56633-56636, clear of the dev and test instances), then the measurements
# (main.ts). Everything it started is stopped at the end, whatever happens.
# BENCH_SCALE=0.01 for a quick try; BENCH_SECONDS and BENCH_CONNECTIONS change the load runs.
# BENCH_PORT_BASE moves all five ports (and gives the cluster and the files their own names), so a
# second run can be held beside the first.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/../lib.sh"
cd "$ROOT"

PG_PORT="${BENCH_PORT_BASE:-56632}"
S3_PORT=$((PG_PORT + 1))
SMTP_PORT=$((PG_PORT + 2))
MAIL_CATCHER_PORT=$((PG_PORT + 3))
APP_PORT=$((PG_PORT + 4))
CLUSTER=pg-bench
export BENCH_DIR="$DATA/bench"
if [ "$PG_PORT" != 56632 ]; then CLUSTER="pg-bench-$PG_PORT" BENCH_DIR="$DATA/bench-$PG_PORT"; fi
mkdir -p "$BENCH_DIR"

# Over the cluster's Unix socket, as a server beside its database would connect: a round trip
# costs about half what loopback TCP does on this machine, for the server and PostgreSQL alike.
export DATABASE_URL="postgres://postgres@localhost/spanrelay_bench?host=/tmp/spanrelay-pg-$PG_PORT&port=$PG_PORT"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_BUCKET=spanrelay-bench SMTP_HOST=127.0.0.1 SMTP_PORT S3_PORT MAIL_CATCHER_PORT
export PORT="$APP_PORT" PUBLIC_URL="http://127.0.0.1:$APP_PORT"
export BETTER_AUTH_SECRET="spanrelay-benchmark-secret-not-for-production-use"
# Development, as in npm start: production asks the browser to upgrade every load to HTTPS.
export NODE_ENV=development
export BENCH_URL="$PUBLIC_URL"

TSX="$ROOT/node_modules/.bin/tsx"
FAKES_PID=""
SERVER_PID=""
cleanup() {
  for pid in $SERVER_PID $FAKES_PID; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in $SERVER_PID $FAKES_PID; do wait "$pid" 2>/dev/null || true; done
  pg_down "$CLUSTER"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
ensure_chromium
# BENCH_WEB_EXPORT=0 measures dist as it is (another export may be in use on this checkout).
if [ "${BENCH_WEB_EXPORT:-1}" = 1 ]; then ensure_web_export; fi
export WEB_DIST="$ROOT/dist"

# Buffers sized for the data (about 0.6 GB seeded), as a production server's would be; the default
# 128 MB left a detail read fetching pages from the operating system's cache.
pg_up "$CLUSTER" "$PG_PORT" "-c shared_buffers=1GB"
# The trail refuses TRUNCATE and DELETE, so each run starts from a new database.
pg_recreate_db "$PG_PORT" spanrelay_bench

rm -rf "$BENCH_DIR/fakes"
FAKES_DIR="$BENCH_DIR/fakes" "$TSX" docker-free-scripts/fakes/run-fakes.ts >"$BENCH_DIR/fakes.log" 2>&1 &
FAKES_PID=$!
wait_for_http "http://127.0.0.1:$MAIL_CATCHER_PORT/messages" || { cat "$BENCH_DIR/fakes.log" >&2; exit 1; }

log "seeding the benchmark database"
"$TSX" docker-free-scripts/bench/seed.ts

SPANRELAY_BENCH=1 "$TSX" server/index.ts >"$BENCH_DIR/server.log" 2>&1 &
SERVER_PID=$!
wait_for_http "$PUBLIC_URL/api/health" || { cat "$BENCH_DIR/server.log" >&2; exit 1; }

# BENCH_HOLD=1 keeps the seeded database and the server up for a closer look (EXPLAIN, a
# profiler) until interrupted, instead of measuring.
if [ "${BENCH_HOLD:-0}" = 1 ]; then
  log "holding: server on $PUBLIC_URL, database $DATABASE_URL (Ctrl-C stops everything)"
  wait "$SERVER_PID"
  exit 0
fi
"$TSX" docker-free-scripts/bench/main.ts
