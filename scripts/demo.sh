#!/usr/bin/env bash
# `npm run demo`: builds the app, loads the demo into the embedded database
# (./data) the first time, and starts it on http://localhost:${PORT:-3000}.
set -euo pipefail
cd "$(dirname "$0")/.."

export PORT="${PORT:-3000}"
export BETTER_AUTH_URL="${BETTER_AUTH_URL:-http://localhost:$PORT}"
export FOURPATCH_DATA_DIR="${FOURPATCH_DATA_DIR:-./data}"
# The local e-mail outbox (and other fakes) for this local trial; loopback clients only.
export FOURPATCH_DEV_FAKES="${FOURPATCH_DEV_FAKES:-on}"

# A local secret, made once and kept out of git, so sessions survive restarts.
if [ -z "${BETTER_AUTH_SECRET:-}" ]; then
  [ -f .fourpatch-secret ] || node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("hex"))' > .fourpatch-secret
  BETTER_AUTH_SECRET="$(cat .fourpatch-secret)"
  export BETTER_AUTH_SECRET
fi

if [ ! -d .next ] || [ "${FOURPATCH_REBUILD:-0}" = "1" ] || [ -n "$(find app components lib db emails -newer .next/BUILD_ID -print -quit 2>/dev/null)" ]; then
  npx next build
fi

if [ ! -f "$FOURPATCH_DATA_DIR/.demo-loaded" ]; then
  npm run --silent db:seed
  date -u +%FT%TZ > "$FOURPATCH_DATA_DIR/.demo-loaded"
fi

echo "Fourpatch runs on $BETTER_AUTH_URL (stop it with Ctrl-C)."
exec bash scripts/start.sh -p "$PORT"
