#!/usr/bin/env bash
# `npm run test:e2e`: the browser tests in Chromium. Extra arguments go to Playwright.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-chromium.sh
exec npx playwright test "$@"
