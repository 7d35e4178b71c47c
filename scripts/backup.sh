#!/usr/bin/env bash
# npm run backup: a consistent dump of the database (one transaction, InnoDB) plus the upload folder,
# as .data/backups/<profile>/tallyforge-<UTC time>.tar.gz; keeps the newest TF_BACKUP_KEEP (14).
source "$(dirname "$0")/lib.sh"
export PATH="$PATH:/usr/sbin"
profile="${TF_PROFILE:-dev}"
db="${DB_NAME:-$([ "$profile" = test ] && echo tallyforge_test || echo tallyforge)}"
sock="$ROOT/.data/$profile/run/mariadb.sock"
mariadb-admin --no-defaults -S "$sock" -u root ping >/dev/null 2>&1 || { log "the $profile database is not running (npm start starts it)"; exit 1; }
out="$ROOT/.data/backups/$profile"; mkdir -p "$out"
stamp="$(date -u +%Y%m%dT%H%M%SZ)"
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
mariadb-dump --no-defaults -S "$sock" -u root --single-transaction --quick --routines --triggers "$db" >"$work/database.sql"
uploads="${UPLOAD_DIR:-$ROOT/.data/$profile/uploads}"
[ -d "$uploads" ] && cp -a "$uploads" "$work/uploads"
printf 'database=%s\nprofile=%s\ntaken=%s\n' "$db" "$profile" "$stamp" >"$work/BACKUP-INFO"
file="$out/tallyforge-$stamp.tar.gz"
tar -czf "$file" -C "$work" .
ls -1t "$out"/tallyforge-*.tar.gz | tail -n +"$(( ${TF_BACKUP_KEEP:-14} + 1 ))" | xargs -r rm -f
log "backup written: ${file#$ROOT/}"
echo "$file"
