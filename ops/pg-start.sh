#!/usr/bin/env bash
# Initialises (first time) and starts Layerbook's own PostgreSQL cluster on 127.0.0.1:$LB_PG_PORT,
# with its unix socket inside the data folder, then creates the three roles. Safe to run twice.
set -euo pipefail
source "$(dirname "$0")/env.sh"
bash "$(dirname "$0")/pg-install.sh"

mkdir -p "$LB_DATA"
if [ ! -s "$PGDATA_DIR/PG_VERSION" ]; then
  mkdir -p "$PGDATA_DIR"
  [ "$(id -u)" = "0" ] && chown -R postgres:postgres "$LB_DATA"
  as_pg "$PG_BIN/initdb" -D "$PGDATA_DIR" -U postgres --auth-local=trust --auth-host=scram-sha-256 \
    --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  cat >> "$PGDATA_DIR/postgresql.conf" <<CONF
listen_addresses = '127.0.0.1'
port = $LB_PG_PORT
unix_socket_directories = '$PGDATA_DIR'
max_connections = 200
shared_buffers = 256MB
fsync = on
CONF
fi
[ "$(id -u)" = "0" ] && chown -R postgres:postgres "$PGDATA_DIR"

if ! as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" status >/dev/null 2>&1; then
  as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -l "$PGDATA_DIR/server.log" -w -t 30 start >/dev/null
fi

psql_admin() { as_pg psql -h "$PGDATA_DIR" -p "$LB_PG_PORT" -U postgres -v ON_ERROR_STOP=1 -qAt "$@"; }
# Three roles (QUALITY.md): owner (owns tables, migrates), app (login role for web requests:
# not owner, not superuser, no BYPASSRLS, DML only), jobs (pg-boss needs CREATE on the database).
psql_admin <<SQL
DO \$\$ BEGIN
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'layerbook_owner') THEN
    CREATE ROLE layerbook_owner LOGIN NOSUPERUSER NOBYPASSRLS CREATEDB;
  END IF;
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'layerbook_app') THEN
    CREATE ROLE layerbook_app LOGIN NOSUPERUSER NOBYPASSRLS NOCREATEDB NOCREATEROLE;
  END IF;
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'layerbook_jobs') THEN
    CREATE ROLE layerbook_jobs LOGIN NOSUPERUSER NOBYPASSRLS NOCREATEDB NOCREATEROLE;
  END IF;
END \$\$;
ALTER ROLE layerbook_owner PASSWORD '$LB_OWNER_PASSWORD';
ALTER ROLE layerbook_app PASSWORD '$LB_APP_PASSWORD';
ALTER ROLE layerbook_jobs PASSWORD '$LB_JOBS_PASSWORD';
SQL
