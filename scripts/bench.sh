#!/usr/bin/env bash
# npm run bench [scripts/bench-x.ts ...]: runs every scripts/bench-*.ts (or the ones named) against a
# throwaway database on its own MariaDB instance (.data/bench, port TF_BENCH_DB_PORT or 3329).
# Each bench appends its figures to bench-results/<name>.json.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

ensure_node_modules
ensure_mariadb
export DB_NAME="tallyforge_bench_$$"
db_start bench "${TF_BENCH_DB_PORT:-3329}"
drop_bench_db() { mariadb --no-defaults -S "$ROOT/.data/bench/run/mariadb.sock" -u root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`" || true; db_stop bench; }
trap drop_bench_db EXIT

export NODE_ENV=production
export SESSION_SECRET="bench-secret-$(head -c 24 /dev/urandom | base64 | tr -d '/+=')"
TSX="$ROOT/node_modules/.bin/tsx --conditions=react-server"
$TSX scripts/migrate.ts
mkdir -p bench-results

benches=("$@")
[ ${#benches[@]} -gt 0 ] || benches=(scripts/bench-*.ts)
for bench in "${benches[@]}"; do
  log "bench: $bench"
  $TSX "$bench"
done
