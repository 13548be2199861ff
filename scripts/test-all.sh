#!/usr/bin/env bash
# `npm test`: everything — lint, types, unit tests with coverage of the tire
# computation, integration tests on PGlite and on a real PostgreSQL server,
# and the browser tests in Chromium.
set -euo pipefail
cd "$(dirname "$0")/.."
export PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1

step() { printf '\n\033[1m== %s ==\033[0m\n' "$1"; }
started=$(date +%s)

step "lint"
npx eslint .
step "typecheck"
npx tsc --noEmit
step "unit tests (with coverage of lib/tires)"
npx vitest run --project unit --coverage
step "integration tests on PGlite"
npx vitest run --project integration
step "integration tests on a real PostgreSQL server"
bash scripts/with-postgres.sh npx vitest run --project integration
step "browser tests in Chromium"
bash scripts/e2e.sh

echo
echo "All tests passed in $(( $(date +%s) - started )) s."
