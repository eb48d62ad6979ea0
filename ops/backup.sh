#!/usr/bin/env bash
# Backs up Layerbook: the database (pg_dump, custom format) and every object of the object store,
# into a folder named by the UTC time, with a manifest of sizes, sha256 sums and row counts.
set -euo pipefail
source "$(dirname "$0")/backup/common.sh"
# A backup holds every firm's data (password hashes too): readable by this user only.
umask 077

usage() {
  cat <<USAGE
usage: ops/backup.sh [--out DIR] [--db NAME]

Writes DIR/layerbook-YYYYMMDDTHHMMSSZ/ (UTC) holding
  database.dump   pg_dump --format=custom of the database
  objects/        every object of the bucket, one file per distinct content, named by its sha256
  manifest.json   each object's key, size, sha256 and content type; the dump's size and sha256;
                  every table's row count (same snapshot as the dump); app version and migration level
The folder appears only once it is complete (it is written as DIR/.NAME.partial first).

  --out DIR   where backups go (default: \$LB_BACKUP_DIR, else .data/backups)
  --db NAME   the database (default: the one DATABASE_URL names, else layerbook_dev)

Settings, as the app reads them:
  DATABASE_URL          the app's database (only its name is used)
  DATABASE_ADMIN_URL    how to connect for the dump: a superuser, or a role that bypasses row-level
                        security and reads every schema (default: postgres on the local cluster, ops/env.sh)
  S3_ENDPOINT, S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE
                        the object store (defaults: the local S3 fake, bucket layerbook)
Check a backup with: ops/restore.sh --verify-only DIR/layerbook-…
USAGE
}

out="${LB_BACKUP_DIR:-$LB_DATA/backups}"
db=""
while [ $# -gt 0 ]; do
  case "$1" in
    --out) out="${2:?--out needs a folder}"; shift 2 ;;
    --db) db="${2:?--db needs a name}"; shift 2 ;;
    -h | --help) usage; exit 0 ;;
    *) usage >&2; exit 2 ;;
  esac
done
db="${db:-$(url_db "${DATABASE_URL:-}")}"
db="${db:-layerbook_dev}"
check_db_name "$db"

name="layerbook-$(date -u +%Y%m%dT%H%M%SZ)"
mkdir -p "$out"
out="$(cd "$out" && pwd)"
[ -e "$out/$name" ] && die "$out/$name already exists (one backup a second at most)"
work="$out/.$name.partial"
mkdir "$work"
trap 'rm -rf "$work"' EXIT

echo "Backing up database $db and bucket ${S3_BUCKET:-layerbook} into $out/$name"
admin_cmd pg_dump "$db"
tsx_run backup "$work" "$name" "$db" -- "${CMD[@]}"
mv "$work" "$out/$name"
echo "Backup written: $out/$name ($(du -sh "$out/$name" | cut -f1))"
