#!/usr/bin/env bash
# npm run bench: the figures behind the speed goals, written to bench-results/ (git-ignored).
#   1. the bench page's per-reading pipeline and first-load JavaScript, label rendering, and the
#      counting grid against an independent simulator (no database; builds if needed);
#   2. every scripts/bench/db-*.ts against a throwaway database on its own MariaDB (.data/bench,
#      port TF_BENCH_DB_PORT or 3329); each appends to bench-results/<name>.json. db-load.ts starts
#      its own app server on the build.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
TSX="$ROOT/node_modules/.bin/tsx --conditions=react-server"

if [ "${1:-}" = "--build" ] || [ ! -f .next/build-manifest.json ]; then
  log "building (next build)"
  "$ROOT/node_modules/.bin/next" build >/dev/null
fi
mkdir -p bench-results
log "bench: scale pipeline and page weight"
"$ROOT/node_modules/.bin/tsx" scripts/bench/run-bench.ts
log "bench: 1 000 bin labels against the encode-only and text-only floors"
$TSX scripts/bench/labels.ts
log "bench: the counting grid (24 000 regimes against an independent simulator)"
"$ROOT/node_modules/.bin/tsx" scripts/bench/counting-grid.ts

ensure_mariadb
export DB_NAME="tallyforge_bench_$$"
db_start bench "${TF_BENCH_DB_PORT:-3329}"
# The release bench sends its mails to a local sink, as npm start does, so they cost what they would.
export SMTP_HOST=127.0.0.1 SMTP_PORT="${TF_BENCH_SMTP_PORT:-2535}" PRINTER_PORT="${TF_BENCH_PRINTER_PORT:-8641}"
MAIL_SINK_DIR="$ROOT/.data/bench/mail" PRINT_SINK_DIR="$ROOT/.data/bench/printed" $TSX scripts/fakes/run-fakes.ts >"$ROOT/.data/bench/fakes.log" 2>&1 &
fakes_pid=$!
drop_bench_db() { kill "$fakes_pid" 2>/dev/null || true; mariadb --no-defaults -S "$ROOT/.data/bench/run/mariadb.sock" -u root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`" || true; db_stop bench; }
trap drop_bench_db EXIT
export NODE_ENV=production
export SESSION_SECRET="bench-secret-$(head -c 24 /dev/urandom | base64 | tr -d '/+=')"
$TSX scripts/migrate.ts >/dev/null
for bench in scripts/bench/db-*.ts; do
  log "bench: $bench"
  $TSX "$bench"
done
