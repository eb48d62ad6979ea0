#!/usr/bin/env bash
# Stops what ops/cluster/up.sh started, by PID (nginx first, so no request reaches a node going away;
# then the web nodes, the workers, the mail catcher and the S3 fake), then the standby and the primary.
#   bash ops/cluster/down.sh [--wipe]     --wipe also deletes .data/cluster (databases, mail, files, certificate)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
source "$here/env.sh"

wipe=0
for arg in "$@"; do
  case "$arg" in
    --wipe) wipe=1 ;;
    *) echo "usage: ops/cluster/down.sh [--wipe]" >&2; exit 2 ;;
  esac
done

# stop NAME SIGNAL: signals the PID in run/NAME.pid and waits up to 20 s for it to end (the app's own
# shutdown finishes in-flight requests and jobs within 15 s).
stop() {
  local pidfile="$CL_RUN/$1.pid"
  if running "$pidfile"; then
    local pid
    pid="$(cat "$pidfile")"
    kill "-$2" "$pid"
    for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
    if kill -0 "$pid" 2>/dev/null; then echo "$1 (PID $pid) is still running after 20 s." >&2; else echo "Stopped $1."; fi
  fi
  rm -f "$pidfile"
}

stop nginx QUIT
for pidfile in "$CL_RUN"/web-*.pid "$CL_RUN"/worker-*.pid; do
  if [ -e "$pidfile" ]; then stop "$(basename "$pidfile" .pid)" TERM; fi
done
stop maildev TERM
stop s3 TERM

for dir in "$CL_STANDBY_DIR" "$CL_PRIMARY_DIR"; do
  if [ -s "$dir/PG_VERSION" ] && as_pg "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    as_pg "$PG_BIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null
    echo "Stopped PostgreSQL ($(basename "$dir"))."
  fi
done

if [ "$wipe" = 1 ]; then
  rm -rf "$CL_DIR"
  echo "Deleted $CL_DIR."
fi
