#!/usr/bin/env bash
# Fault tests stop and start the private MariaDB under them: db-ctl.sh PROFILE crash|start.
# "crash" is a SIGKILL, as a power cut or an OOM kill would do; "start" brings it back on DB_PORT.
source "$(dirname "$0")/lib.sh"
profile="$1" action="$2"
ensure_mariadb
case "$action" in
  crash)
    pid_file="$ROOT/.data/$profile/run/mariadb.pid"
    [ -f "$pid_file" ] || { log "no MariaDB pid file for $profile"; exit 1; }
    pid="$(cat "$pid_file")"
    kill -KILL "$pid"
    while kill -0 "$pid" 2>/dev/null; do sleep 0.05; done
    rm -f "$pid_file" "$ROOT/.data/$profile/run/mariadb.sock"
    ;;
  start) db_start "$profile" "${DB_PORT:?DB_PORT is required}" >/dev/null ;;
  *) log "usage: db-ctl.sh PROFILE crash|start"; exit 2 ;;
esac
