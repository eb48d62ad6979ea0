#!/usr/bin/env bash
# A streaming standby of the cluster's primary on loopback ($CL_STANDBY_PORT), for reports that only
# read (DATABASE_READ_URL). Made afresh each time: pg_basebackup -R copies the primary (tens of MB for
# the demo) and writes the connection back to it, so the standby starts replaying at once. The
# primary must be running (ops/cluster/up.sh --replica calls this).
set -euo pipefail
source "$(dirname "$0")/env.sh"

# Replication connects over TCP on loopback as a role of its own (initdb's pg_hba.conf already lets
# `replication` connections from 127.0.0.1 in with a password). The primary keeps some WAL for a
# standby that falls behind (no slot: a standby removed for good holds nothing back).
psql_primary >/dev/null <<SQL
DO \$\$ BEGIN
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'layerbook_replica') THEN
    CREATE ROLE layerbook_replica LOGIN REPLICATION NOSUPERUSER NOBYPASSRLS;
  END IF;
END \$\$;
ALTER ROLE layerbook_replica PASSWORD '$LB_REPLICA_PASSWORD';
ALTER SYSTEM SET wal_keep_size = '256MB';
SELECT pg_reload_conf();
SQL

if [ -s "$CL_STANDBY_DIR/PG_VERSION" ] && as_pg "$PG_BIN/pg_ctl" -D "$CL_STANDBY_DIR" status >/dev/null 2>&1; then
  as_pg "$PG_BIN/pg_ctl" -D "$CL_STANDBY_DIR" -m fast -w stop >/dev/null
fi
rm -rf "$CL_STANDBY_DIR"
mkdir -p "$CL_STANDBY_DIR"
chmod 700 "$CL_STANDBY_DIR"
[ "$(id -u)" = "0" ] && chown postgres:postgres "$CL_STANDBY_DIR"
as_pg env PGPASSWORD="$LB_REPLICA_PASSWORD" "$PG_BIN/pg_basebackup" -h 127.0.0.1 -p "$CL_PG_PORT" -U layerbook_replica \
  -D "$CL_STANDBY_DIR" -R -X stream --checkpoint=fast 2>"$CL_LOGS/basebackup.log" || { cat "$CL_LOGS/basebackup.log" >&2; exit 1; }
# The copy carries the primary's settings; the standby listens on its own port and socket folder,
# and tells the primary which rows its queries still read, so a long export is not cancelled by replay.
cat >>"$CL_STANDBY_DIR/postgresql.conf" <<CONF
# standby (ops/cluster/standby.sh)
port = $CL_STANDBY_PORT
unix_socket_directories = '$CL_STANDBY_DIR'
hot_standby = on
hot_standby_feedback = on
CONF
as_pg "$PG_BIN/pg_ctl" -D "$CL_STANDBY_DIR" -l "$CL_STANDBY_DIR/server.log" -w -t 60 start >/dev/null
wait_for "[ \"\$(psql_standby -d $CL_DB -c 'select pg_is_in_recovery()')\" = t ]" 30
echo "Standby streaming on 127.0.0.1:$CL_STANDBY_PORT ($(psql_primary -c "select count(*) from pg_stat_replication where state = 'streaming'") streaming to the primary's WAL)."
