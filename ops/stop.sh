#!/usr/bin/env bash
# `npm stop`: stops what `npm start` started, by PID, then PostgreSQL.
set -euo pipefail
source "$(dirname "$0")/env.sh"
for name in server maildev s3 stripe; do
  pidfile="$LB_DATA/run/$name.pid"
  if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then
    kill "$(cat "$pidfile")" && echo "Stopped $name."
  fi
  rm -f "$pidfile"
done
bash "$(dirname "$0")/pg-stop.sh"
