#!/usr/bin/env bash
# `npm test`: everything — lint, types, unit tests with coverage of the tire
# computation, integration tests on PGlite and on a real PostgreSQL server,
# and the browser tests in Chromium.
set -euo pipefail
cd "$(dirname "$0")/.."
export PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1

started=$(date +%s)
LOG=$(mktemp)
trap 'rm -f "$LOG"' EXIT
step() { printf '\n\033[1m== %s ==\033[0m (at %d s)\n' "$1" "$(( $(date +%s) - started ))"; }
# Runs a step, keeping its output for the count at the end.
run() { "$@" 2>&1 | tee -a "$LOG"; }

step "lint"
npx eslint .
step "typecheck"
npx tsc --noEmit
step "unit tests (with coverage of lib/tires)"
run npx vitest run --project unit --coverage
# The two integration runs side by side: each is one test file at a time,
# and PGlite's runs and the PostgreSQL server's seldom want a core at once
# (about 6.5 min together against about 9 one after the other, on 2 cores).
# The browser tests' production build goes alongside too: the PostgreSQL run
# ends minutes before the PGlite one and leaves a core free for it.
step "integration tests on PGlite and on a real PostgreSQL server, and the browser tests' build (side by side)"
INT_PGLITE=$(mktemp) INT_PG=$(mktemp) E2E_BUILD=$(mktemp)
trap 'rm -f "$LOG" "$INT_PGLITE" "$INT_PG" "$E2E_BUILD"' EXIT
E2E_BUILD_ONLY=1 bash scripts/e2e-server.sh "${E2E_PORT:-3210}" >"$E2E_BUILD" 2>&1 &
build_pid=$!
npx vitest run --project integration >"$INT_PGLITE" 2>&1 &
pglite_pid=$!
bash scripts/with-postgres.sh npx vitest run --project integration >"$INT_PG" 2>&1 &
pg_pid=$!
pglite_rc=0 pg_rc=0
wait "$pglite_pid" || pglite_rc=$?
wait "$pg_pid" || pg_rc=$?
step "… on PGlite"
cat "$INT_PGLITE" | tee -a "$LOG"
step "… on a real PostgreSQL server"
cat "$INT_PG" | tee -a "$LOG"
if [ "$pglite_rc" != 0 ] || [ "$pg_rc" != 0 ]; then
  echo "Integration tests failed (PGlite: exit $pglite_rc, PostgreSQL: exit $pg_rc)." >&2
  exit 1
fi
build_rc=0
wait "$build_pid" || build_rc=$?
if [ "$build_rc" != 0 ]; then
  cat "$E2E_BUILD" >&2
  echo "The production build for the browser tests failed (exit $build_rc)." >&2
  exit 1
fi
step "browser tests in Chromium (on the build made above)"
run env E2E_SKIP_BUILD=1 bash scripts/e2e.sh

# Every step passed (set -e), so the count of failures is zero by construction;
# the passed count adds up vitest's "Tests N passed" and Playwright's "N passed".
plain=$(sed 's/\x1b\[[0-9;]*m//g' "$LOG")
vitest=$(printf '%s\n' "$plain" | grep -E '^\s*Tests\s+[0-9]+ passed' | awk '{s += $2} END {print s + 0}')
browser=$(printf '%s\n' "$plain" | grep -E '^\s*[0-9]+ passed \(' | awk '{s += $1} END {print s + 0}')
echo
echo "All tests passed in $(( $(date +%s) - started )) s (unit and integration: $vitest, browser: $browser)."
echo "$(( vitest + browser )) passed, 0 failed"
