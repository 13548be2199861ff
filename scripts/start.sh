#!/usr/bin/env bash
# The production server: `next start` with a bounded JavaScript heap.
# Without a bound V8 lets the heap of a busy server grow towards a quarter
# of the machine's memory before it collects (a server with ~85 MB of live
# objects reached 760 MB under load); 384 MB keeps a household server near
# 300–400 MB and leaves four times its live objects for big exports.
# FOURPATCH_HEAP_MB raises it; NODE_OPTIONS of your own come after and win.
set -euo pipefail
export NODE_OPTIONS="--max-old-space-size=${FOURPATCH_HEAP_MB:-384} --max-semi-space-size=4 ${NODE_OPTIONS:-}"
exec npx next start "$@"
