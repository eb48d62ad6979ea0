#!/usr/bin/env bash
# Creates a Layerbook database (owned by the owner role) if missing: ops/pg-createdb.sh NAME [--fresh]
set -euo pipefail
source "$(dirname "$0")/env.sh"
db="$1"; fresh="${2:-}"
psql_admin() { as_pg psql -h "$PGDATA_DIR" -p "$LB_PG_PORT" -U postgres -v ON_ERROR_STOP=1 -qAt "$@"; }
if [ "$fresh" = "--fresh" ]; then
  psql_admin -c "DROP DATABASE IF EXISTS \"$db\" WITH (FORCE)"
fi
if [ -z "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname = '$db'")" ]; then
  psql_admin -c "CREATE DATABASE \"$db\" OWNER layerbook_owner"
fi
psql_admin -d "$db" <<SQL
REVOKE ALL ON DATABASE "$db" FROM PUBLIC;
GRANT CONNECT ON DATABASE "$db" TO layerbook_app, layerbook_jobs;
-- pg-boss always runs CREATE SCHEMA IF NOT EXISTS, so its role needs CREATE on the database.
GRANT CREATE ON DATABASE "$db" TO layerbook_jobs;
ALTER SCHEMA public OWNER TO layerbook_owner;
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
SQL
