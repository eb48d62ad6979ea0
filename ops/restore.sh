#!/usr/bin/env bash
# Restores a backup made by ops/backup.sh into a fresh database and a fresh (or empty) bucket, after
# checking every file against the manifest; then checks every table's row count against it.
set -euo pipefail
source "$(dirname "$0")/backup/common.sh"

usage() {
  cat <<USAGE
usage: ops/restore.sh [--db NAME] [--force] BACKUP
       ops/restore.sh --verify-only BACKUP

BACKUP is a folder written by ops/backup.sh (layerbook-YYYYMMDDTHHMMSSZ).
  1. checks the size and sha256 of database.dump and of every object against manifest.json;
  2. creates the database (owner layerbook_owner, connect grants as ops/pg-createdb.sh gives) and fills
     it with pg_restore: tables, row-level security, policies and every role's grants come back as dumped;
  3. checks every table's row count against the manifest, then writes every object into the bucket.
Nothing is overwritten: a database that holds any table, or a bucket that holds any object, stops
the restore before anything changes.

  --db NAME       the database to create (default: the one DATABASE_URL names, else layerbook_dev)
  --force         drop and replace a non-empty database, and write over objects already in the bucket
                  (objects not in the backup are left where they are)
  --verify-only   step 1 only

Settings, as the app reads them:
  DATABASE_URL          names the database to restore into (when --db is not given)
  DATABASE_ADMIN_URL    how to connect: a superuser, or a role that may create databases and set owners
                        (default: postgres on the local cluster, ops/env.sh). The roles layerbook_owner,
                        layerbook_app and layerbook_jobs must exist (ops/pg-start.sh creates them).
  S3_ENDPOINT, S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE
                        the store to fill (defaults: the local S3 fake, bucket layerbook; created if missing)
USAGE
}

db=""
force=0
verify_only=0
backup=""
while [ $# -gt 0 ]; do
  case "$1" in
    --db) db="${2:?--db needs a name}"; shift 2 ;;
    --force) force=1; shift ;;
    --verify-only) verify_only=1; shift ;;
    -h | --help) usage; exit 0 ;;
    -*) usage >&2; exit 2 ;;
    *) [ -z "$backup" ] || { usage >&2; exit 2; }; backup="$1"; shift ;;
  esac
done
[ -n "$backup" ] || { usage >&2; exit 2; }
[ -d "$backup" ] || die "$backup is not a folder"
backup="$(cd "$backup" && pwd)"

echo "Checking $backup"
tsx_run verify "$backup"
[ "$verify_only" = 1 ] && exit 0

db="${db:-$(url_db "${DATABASE_URL:-}")}"
db="${db:-layerbook_dev}"
check_db_name "$db"

# Everything is checked before anything changes.
roles="$(admin_psql postgres -c "select count(*) from pg_roles where rolname in ('layerbook_owner', 'layerbook_app', 'layerbook_jobs')")"
[ "$roles" = 3 ] || die "the roles layerbook_owner, layerbook_app and layerbook_jobs must exist first (ops/pg-start.sh creates them)"
relations=0
exists="$(admin_psql postgres -c "select 1 from pg_database where datname = '$db'")"
if [ -n "$exists" ]; then
  relations="$(admin_psql "$db" -c "select count(*) from pg_class c join pg_namespace n on n.oid = c.relnamespace
    where n.nspname not in ('pg_catalog', 'information_schema') and n.nspname not like 'pg\\_toast%' and n.nspname not like 'pg\\_temp%'")"
  if [ "$relations" != 0 ] && [ "$force" != 1 ]; then
    die "database $db is not empty ($relations relations): restore into a new one with --db NAME, or replace it with --force"
  fi
fi
store_rc=0
tsx_run store-empty || store_rc=$?
case "$store_rc" in
  0) ;;
  3) [ "$force" = 1 ] || die "bucket ${S3_BUCKET:-layerbook} at ${S3_ENDPOINT:-http://127.0.0.1:4569} holds objects: use a fresh bucket, or write over it with --force" ;;
  *) die "could not read the bucket ${S3_BUCKET:-layerbook} at ${S3_ENDPOINT:-http://127.0.0.1:4569}" ;;
esac

if [ -n "$exists" ] && [ "$relations" != 0 ]; then
  echo "Dropping the database $db (--force)"
  admin_psql postgres -c "DROP DATABASE \"$db\" WITH (FORCE)"
  exists=""
fi
if [ -z "$exists" ]; then
  admin_psql postgres -c "CREATE DATABASE \"$db\" OWNER layerbook_owner"
else
  admin_psql postgres -c "ALTER DATABASE \"$db\" OWNER TO layerbook_owner"
fi
# The database-level grants pg_dump leaves out (ops/pg-createdb.sh gives the same).
admin_psql "$db" <<SQL
REVOKE ALL ON DATABASE "$db" FROM PUBLIC;
GRANT CONNECT ON DATABASE "$db" TO layerbook_app, layerbook_jobs;
GRANT CREATE ON DATABASE "$db" TO layerbook_jobs;
ALTER SCHEMA public OWNER TO layerbook_owner;
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
SQL

echo "Restoring the database $db"
admin_cmd pg_restore "$db"
"${CMD[@]}" --exit-on-error --single-transaction "$backup/database.dump"
admin_psql "$db" -c "ANALYZE"
tsx_run after-restore "$backup" "$db"
echo "Restored $(basename "$backup") into database $db and bucket ${S3_BUCKET:-layerbook} at ${S3_ENDPOINT:-http://127.0.0.1:4569}"
