#!/usr/bin/env bash
# npm test: the static checks, then the whole suite against its own MariaDB (port 3308, fresh database each run),
# a fresh production build, and Debian's Chromium for the browser tests.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

ensure_node_modules
# The whole suite starts with the static checks (npm run check): lint with the import boundaries, the
# format, and the types. A run of chosen tests (npm test -- <files>) skips them.
if [ $# -eq 0 ]; then
  log "checking lint, format and types (npm run check)"
  bash "$ROOT/scripts/check.sh" || exit 1
fi
ensure_mariadb
missing=()
[ -x /usr/bin/chromium ] || missing+=(chromium)
command -v pdftoppm >/dev/null 2>&1 || missing+=(poppler-utils)
if [ ${#missing[@]} -gt 0 ]; then log "installing ${missing[*]}"; apt_install "${missing[@]}"; fi

export DB_NAME=tallyforge_test
db_start test "${TF_TEST_DB_PORT:-3308}"
trap 'db_stop test' EXIT
db_reset_database test

export NODE_ENV=production
export SESSION_SECRET="test-secret-$(head -c 24 /dev/urandom | base64 | tr -d '/+=')"
export DEMO_PASSWORD="${DEMO_PASSWORD:-tallyforge-demo}"
export UPLOAD_DIR="$ROOT/.data/test/uploads"
TSX="$ROOT/node_modules/.bin/tsx --conditions=react-server"

log "migrating the test database"
$TSX scripts/migrate.ts

log "building (next build)"
mkdir -p test-results
"$ROOT/node_modules/.bin/next" build >test-results/build.log 2>&1 || { tail -60 test-results/build.log; exit 1; }

log "running the suite"
"$ROOT/node_modules/.bin/vitest" run "$@"
