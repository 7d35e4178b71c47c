#!/usr/bin/env bash
# Stops what `npm start` started: the app, the local fakes, then the private MariaDB.
source "$(dirname "$0")/lib.sh"
run="$ROOT/.data/dev/run"
kill_pidfile "$run/app.pid"
kill_pidfile "$run/fakes.pid"
export PATH="$PATH:/usr/sbin"
db_stop dev
log "stopped"
