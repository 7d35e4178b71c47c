#!/usr/bin/env bash
# npm run create-admin -- --email you@example.com --name "Your Name": the first administrator (or a fresh
# password link for an existing one) in the database `npm start` uses. Prints a one-time link.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
ensure_mariadb
db_start dev "${TF_DB_PORT:-3307}" >/dev/null
export APP_URL="${APP_URL:-http://localhost:${PORT:-3000}}"
export SESSION_SECRET="${SESSION_SECRET:-$(secret_file dev session-secret)}"
"$ROOT/node_modules/.bin/tsx" --conditions=react-server scripts/migrate.ts >/dev/null
exec "$ROOT/node_modules/.bin/tsx" --conditions=react-server scripts/create-admin.ts "$@"
