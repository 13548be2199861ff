#!/usr/bin/env bash
# The server the browser tests run against: a production build in its own
# folder, a fresh data folder with the demo loaded, on the given port.
set -euo pipefail
cd "$(dirname "$0")/.."
PORT="${1:-3210}"
export PORT
export NEXT_DIST_DIR=".next-e2e"
export BETTER_AUTH_URL="http://localhost:$PORT"
export BETTER_AUTH_SECRET="e2e-only-secret-5f1c0b8e9d7a4c3b2a190817"
export FOURPATCH_DATA_DIR="tests/e2e/.data-$PORT"
export FOURPATCH_SCHEDULER="off"
# One browser signs in dozens of times a minute from one address; the limit itself is covered by an integration test.
export FOURPATCH_AUTH_RATE_LIMIT="off"
export CRON_SECRET="e2e-cron-secret"
export FOURPATCH_DEV_FAKES="on"
# Answers served from memory are computed again and compared (db/revision.ts).
export FOURPATCH_CACHE_CHECK="1"
unset DATABASE_URL RESEND_API_KEY STRIPE_SECRET_KEY

if [ "${E2E_SKIP_BUILD:-0}" != "1" ] || [ ! -f "$NEXT_DIST_DIR/BUILD_ID" ]; then
  npx next build >/dev/null
fi
# `npm test` builds ahead, beside the integration runs, with this switch.
if [ "${E2E_BUILD_ONLY:-0}" = "1" ]; then exit 0; fi
rm -rf "$FOURPATCH_DATA_DIR"
npm run --silent db:seed
exec bash scripts/start.sh -p "$PORT"
