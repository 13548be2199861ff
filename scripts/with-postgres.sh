#!/usr/bin/env bash
# Runs a command with a throw-away PostgreSQL server: installs the server with
# apt-get when it is missing (as root), starts a fresh cluster on a private
# port and socket, exports FOURPATCH_TEST_PG_URL, and removes it all after.
set -euo pipefail
PORT="${FOURPATCH_TEST_PG_PORT:-55432}"

find_bin() {
  local name=$1
  command -v "$name" 2>/dev/null && return
  ls /usr/lib/postgresql/*/bin/"$name" 2>/dev/null | sort -V | tail -n 1
}

if [ -z "$(find_bin initdb)" ]; then
  if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
    echo "Installing Debian's postgresql for the integration tests on a real server…"
    export DEBIAN_FRONTEND=noninteractive
    apt-get install -y postgresql >/dev/null 2>&1 || { apt-get update >/dev/null && apt-get install -y postgresql >/dev/null; }
  else
    echo "The PostgreSQL integration run needs a PostgreSQL server (initdb, pg_ctl). Install postgresql and try again." >&2
    exit 1
  fi
fi
INITDB=$(find_bin initdb)
PG_CTL=$(find_bin pg_ctl)

WORK=$(mktemp -d /tmp/fourpatch-pg.XXXXXX)
RUN_AS=()
if [ "$(id -u)" = "0" ]; then
  # PostgreSQL refuses to run as root.
  id postgres >/dev/null 2>&1 || useradd --system --no-create-home postgres
  chown postgres "$WORK"
  RUN_AS=(runuser -u postgres --)
fi

cleanup() {
  "${RUN_AS[@]}" "$PG_CTL" -D "$WORK/data" -m immediate stop >/dev/null 2>&1 || true
  rm -rf "$WORK"
}
trap cleanup EXIT

"${RUN_AS[@]}" "$INITDB" -D "$WORK/data" -U fourpatch --auth=trust >/dev/null
"${RUN_AS[@]}" "$PG_CTL" -D "$WORK/data" -l "$WORK/server.log" -w \
  -o "-p $PORT -k $WORK -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off" start >/dev/null

export FOURPATCH_TEST_PG_URL="postgres://fourpatch@127.0.0.1:$PORT/postgres"
"$@"
