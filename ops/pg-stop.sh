#!/usr/bin/env bash
# Stops Layerbook's PostgreSQL cluster if it is running.
set -euo pipefail
source "$(dirname "$0")/env.sh"
if [ -s "$PGDATA_DIR/PG_VERSION" ] && as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" status >/dev/null 2>&1; then
  as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null
  echo "PostgreSQL stopped."
fi
