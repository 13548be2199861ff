#!/usr/bin/env bash
# `npm test`: everything — lint, types, unit tests with coverage of the tire
# computation, integration tests on PGlite and on a real PostgreSQL server,
# and the browser tests in Chromium.
set -euo pipefail
cd "$(dirname "$0")/.."
export PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1

LOG=$(mktemp)
trap 'rm -f "$LOG"' EXIT
step() { printf '\n\033[1m== %s ==\033[0m\n' "$1"; }
# Runs a step, keeping its output for the count at the end.
run() { "$@" 2>&1 | tee -a "$LOG"; }
started=$(date +%s)

step "lint"
npx eslint .
step "typecheck"
npx tsc --noEmit
step "unit tests (with coverage of lib/tires)"
run npx vitest run --project unit --coverage
step "integration tests on PGlite"
run npx vitest run --project integration
step "integration tests on a real PostgreSQL server"
run bash scripts/with-postgres.sh npx vitest run --project integration
step "browser tests in Chromium"
run bash scripts/e2e.sh

# Every step passed (set -e), so the count of failures is zero by construction;
# the passed count adds up vitest's "Tests N passed" and Playwright's "N passed".
plain=$(sed 's/\x1b\[[0-9;]*m//g' "$LOG")
vitest=$(printf '%s\n' "$plain" | grep -E '^\s*Tests\s+[0-9]+ passed' | awk '{s += $2} END {print s + 0}')
browser=$(printf '%s\n' "$plain" | grep -E '^\s*[0-9]+ passed \(' | awk '{s += $1} END {print s + 0}')
echo
echo "All tests passed in $(( $(date +%s) - started )) s (unit and integration: $vitest, browser: $browser)."
echo "$(( vitest + browser )) passed, 0 failed"
