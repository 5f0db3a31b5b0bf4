#!/usr/bin/env bash
# Ports and databases of the test run; apart from the development instance so both can run at once.
export TEST_PG_PORT="${TEST_PG_PORT:-56432}"
export TEST_API_DATABASE_URL="postgres://postgres@127.0.0.1:$TEST_PG_PORT/spanrelay_api_test"
export TEST_E2E_DATABASE_URL="postgres://postgres@127.0.0.1:$TEST_PG_PORT/spanrelay_e2e_test"
export TEST_API_S3_PORT="${TEST_API_S3_PORT:-56480}"
export TEST_API_SMTP_PORT="${TEST_API_SMTP_PORT:-56425}"
export TEST_API_CATCHER_PORT="${TEST_API_CATCHER_PORT:-56481}"
export TEST_E2E_S3_PORT="${TEST_E2E_S3_PORT:-57480}"
export TEST_E2E_SMTP_PORT="${TEST_E2E_SMTP_PORT:-57425}"
export TEST_E2E_CATCHER_PORT="${TEST_E2E_CATCHER_PORT:-57481}"
export TEST_E2E_APP_PORT="${TEST_E2E_APP_PORT:-57081}"
export TEST_ARTIFACTS="${TEST_ARTIFACTS:-$ROOT/tests/.artifacts}"
