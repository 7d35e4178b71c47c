#!/usr/bin/env bash
# npm run restore -- FILE: puts a backup from npm run backup back: every table of the database
# and the upload folder. Stop the app first (npm run stop, then start only the database) unless
# you pass --force; what was written after the backup is lost.
source "$(dirname "$0")/lib.sh"
export PATH="$PATH:/usr/sbin"
file="${1:-}"; force="${2:-}"
[ -f "$file" ] || { log "usage: npm run restore -- .data/backups/dev/tallyforge-<time>.tar.gz [--force]"; exit 1; }
profile="${TF_PROFILE:-dev}"
db="${DB_NAME:-$([ "$profile" = test ] && echo tallyforge_test || echo tallyforge)}"
sock="$ROOT/.data/$profile/run/mariadb.sock"
if [ "$force" != "--force" ] && [ -f "$ROOT/.data/$profile/run/app.pid" ] && kill -0 "$(cat "$ROOT/.data/$profile/run/app.pid")" 2>/dev/null; then
  log "the app is running; stop it first (npm run stop) or pass --force"; exit 1
fi
mariadb-admin --no-defaults -S "$sock" -u root ping >/dev/null 2>&1 || { log "the $profile database is not running"; exit 1; }
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
tar -xzf "$file" -C "$work"
[ -f "$work/database.sql" ] || { log "$file is not a Tallyforge backup"; exit 1; }
# The dump drops and re-creates each table, so the database itself (and its grants) stays.
mariadb --no-defaults -S "$sock" -u root "$db" <"$work/database.sql"
uploads="${UPLOAD_DIR:-$ROOT/.data/$profile/uploads}"
if [ -d "$work/uploads" ]; then rm -rf "$uploads"; mkdir -p "$(dirname "$uploads")"; cp -a "$work/uploads" "$uploads"; fi
log "restored ${file#$ROOT/} into $db"
