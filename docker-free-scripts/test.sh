#!/usr/bin/env bash
# The test command: installs what is missing, starts a private PostgreSQL cluster for the tests,
# runs the unit and API suites (vitest + supertest against real PostgreSQL and the fakes) and the
# end-to-end suite (Playwright in Debian's Chromium), then prints one total line.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/docker-free-scripts/test-env.sh"
cd "$ROOT"

ensure_node_modules
ensure_chromium
pg_up pg-test "$TEST_PG_PORT"
trap 'pg_down pg-test' EXIT
pg_recreate_db "$TEST_PG_PORT" spanrelay_api_test
pg_recreate_db "$TEST_PG_PORT" spanrelay_e2e_test
rm -rf "$TEST_ARTIFACTS" "$DATA/fakes-test"
mkdir -p "$TEST_ARTIFACTS"

status=0
log "type-checking"
typecheck_failed=0
npm run --silent typecheck || { status=1; typecheck_failed=1; }

log "unit and API tests"
npx vitest run --project unit --project api \
  --reporter=default --reporter=json --outputFile.json="$TEST_ARTIFACTS/vitest-unit-api.json" || status=1

log "end-to-end tests"
ensure_web_export
export WEB_DIST="$ROOT/dist"
npx vitest run --project e2e \
  --reporter=default --reporter=json --outputFile.json="$TEST_ARTIFACTS/vitest-e2e.json" || status=1

node docker-free-scripts/reliability-report.mjs "$TEST_ARTIFACTS"
TYPECHECK_FAILED="$typecheck_failed" node docker-free-scripts/test-summary.mjs "$TEST_ARTIFACTS/vitest-unit-api.json" "$TEST_ARTIFACTS/vitest-e2e.json" || status=1
exit "$status"
