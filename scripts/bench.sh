#!/usr/bin/env bash
# npm run bench: builds when there is no build (or with --build), then measures; no database needed.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
if [ "${1:-}" = "--build" ] || [ ! -f .next/build-manifest.json ]; then
  echo "[bench] building (next build)"
  ./node_modules/.bin/next build >/dev/null
fi
./node_modules/.bin/tsx scripts/bench/run-bench.ts
