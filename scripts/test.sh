#!/usr/bin/env bash
# npm test: setup (Debian packages, npm packages, private MariaDB), then every test:
# Vitest (unit + reference + API against touchproof_test), vite build, Playwright e2e in Debian's
# Chromium against the built app on its own port + database + fake inbox.
# Ends with one line "N passed, N failed" and exits non-zero on any failure.
set -euo pipefail
source "$(dirname "$0")/setup.sh"
cd "$TP_ROOT"

# liblouis-bin: Debian's liblouis 3.24, an independent cross-check of the braille tests (tests/reference/braille)
tp_ensure_debs mariadb-server chromium poppler-utils liblouis-bin
tp_ensure_node_modules
tp_db_start

RESULTS="$TP_DATA/test-results/npm-test"
rm -rf "$RESULTS"; mkdir -p "$RESULTS"
export TEST_DATABASE_URL="$(tp_db_url touchproof_test)"
export E2E_DATABASE_URL="$(tp_db_url touchproof_e2e)"

tp_log "migrating the API test database"
DATABASE_URL="$TEST_DATABASE_URL" node --import tsx scripts/migrate.ts
tp_log "resetting the e2e database (migrate + demo seed)"
tp_sql "DROP DATABASE IF EXISTS touchproof_e2e; CREATE DATABASE touchproof_e2e CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
DATABASE_URL="$E2E_DATABASE_URL" node --import tsx scripts/migrate.ts
DATABASE_URL="$E2E_DATABASE_URL" node --import tsx scripts/seed.ts >/dev/null

status=0
tp_log "Vitest: unit, reference and API tests"
npx vitest run --reporter=default --reporter=json --outputFile.json="$RESULTS/vitest.json" </dev/null || status=1

build_failed=0
tp_log "building the client"
if ! npx vite build --logLevel warn </dev/null; then build_failed=1; status=1; fi

tp_log "Playwright: end-to-end tests in Debian's Chromium"
if [ "$build_failed" -eq 0 ]; then
  E2E_OUTPUT_DIR="$RESULTS/e2e" PLAYWRIGHT_JSON_OUTPUT_NAME="$RESULTS/playwright.json" \
    npx playwright test -c tests/e2e/playwright.config.ts --reporter=list,json </dev/null || status=1
fi

# One closing line for CI: the sum of both runners' counts (a build failure counts as one failure).
summary="$(node --import tsx scripts/test-summary.ts "$RESULTS" "$build_failed")"
echo "$summary"
case "$summary" in *" 0 failed") [ "$status" -eq 0 ] || exit 1 ;; *) exit 1 ;; esac
