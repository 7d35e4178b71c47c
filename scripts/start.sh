#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB and the local fakes, migrate, load the demo, build, serve.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
run="$ROOT/.data/dev/run"; mkdir -p "$run"

ensure_node_modules
ensure_mariadb
db_start dev "${TF_DB_PORT:-3307}"

export NODE_ENV=production
export PORT="${PORT:-3000}"
export APP_URL="${APP_URL:-http://localhost:$PORT}"
export SESSION_SECRET="${SESSION_SECRET:-$(secret_file dev session-secret)}"
export SMTP_HOST="${SMTP_HOST:-127.0.0.1}" SMTP_PORT="${SMTP_PORT:-2525}"
export MAIL_SINK_DIR="$ROOT/.data/dev/mail"
export UPLOAD_DIR="${UPLOAD_DIR:-$ROOT/.data/dev/uploads}"
TSX="$ROOT/node_modules/.bin/tsx --conditions=react-server"

if [ "$SMTP_HOST" = "127.0.0.1" ] && ! { [ -f "$run/fakes.pid" ] && kill -0 "$(cat "$run/fakes.pid")" 2>/dev/null; }; then
  nohup $TSX scripts/fakes/run-fakes.ts >"$ROOT/.data/dev/fakes.log" 2>&1 &
  echo $! >"$run/fakes.pid"
fi

export HOST="${HOST:-127.0.0.1}"
# The demo's sign-ins have a documented password: it loads by itself only when served on this machine.
case "$HOST" in 127.*|localhost|::1) DEMO="${DEMO:-1}" ;; *) DEMO="${DEMO:-0}" ;; esac

log "migrating"
$TSX scripts/migrate.ts
if [ "$DEMO" = 1 ]; then $TSX scripts/seed-demo.ts; else log "demo not loaded (DEMO=0)"; fi

log "building (next build)"
"$ROOT/node_modules/.bin/next" build >"$ROOT/.data/dev/build.log" 2>&1 || { tail -40 "$ROOT/.data/dev/build.log"; exit 1; }

kill_pidfile "$run/app.pid"
cleanup() { kill_pidfile "$run/app.pid"; kill_pidfile "$run/fakes.pid"; db_stop dev; }
trap cleanup INT TERM

node --import tsx scripts/serve.ts &
echo $! >"$run/app.pid"
for _ in $(seq 1 100); do
  curl -fsS "http://127.0.0.1:$PORT/api/v1/health" >/dev/null 2>&1 && break
  # It refused to serve (it said why above) or crashed.
  kill -0 "$(cat "$run/app.pid")" 2>/dev/null || { cleanup; exit 1; }
  sleep 0.3
done

if [ "$DEMO" = 1 ]; then
  signins="  Demo sign-ins (password: ${DEMO_PASSWORD:-tallyforge-demo}):
    admin@tallyforge.test     operator@tallyforge.test   planner@tallyforge.test
    clerk@tallyforge.test     quality@tallyforge.test"
else
  signins="  No demo. First administrator: npm run create-admin -- --email you@example.com --name \"Your Name\""
fi
cat <<MSG

  Tallyforge is running at $APP_URL
$signins
  E-mail goes to the local sink: .data/dev/mail (admins also see it under Outbox).
  Stop everything with: npm run stop

MSG
wait "$(cat "$run/app.pid")" || true
