#!/usr/bin/env bash
# Makes sure Debian's Chromium is there for the browser tests. Playwright's
# own browser download cannot work on these machines.
set -euo pipefail
CHROMIUM="${CHROMIUM_PATH:-/usr/bin/chromium}"
if [ -x "$CHROMIUM" ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing Debian's chromium for the browser tests…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get install -y chromium >/dev/null 2>&1 || { apt-get update >/dev/null && apt-get install -y chromium >/dev/null; }
  exit 0
fi
echo "The browser tests need Chromium at $CHROMIUM." >&2
echo "Install it (on Debian or Ubuntu: sudo apt-get install chromium) or set CHROMIUM_PATH, then run the tests again." >&2
exit 1
