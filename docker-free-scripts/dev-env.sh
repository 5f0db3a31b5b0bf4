#!/usr/bin/env bash
# Loopback ports and settings of the development instance (the test command uses its own, see test-env.sh).
export PORT="${PORT:-8081}"
export PG_PORT="${PG_PORT:-55432}"
export S3_PORT="${S3_PORT:-55480}"
export SMTP_PORT="${SMTP_PORT:-55425}"
export MAIL_CATCHER_PORT="${MAIL_CATCHER_PORT:-55481}"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/spanrelay}"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
export S3_BUCKET="${S3_BUCKET:-spanrelay-files}"
export SMTP_HOST=127.0.0.1
export MAIL_CATCHER_URL="http://127.0.0.1:$MAIL_CATCHER_PORT"
export PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}"
export BETTER_AUTH_SECRET="${BETTER_AUTH_SECRET:-spanrelay-development-secret-not-for-production-use}"
export NODE_ENV="${NODE_ENV:-development}"
