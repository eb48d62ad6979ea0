# Settings of the several-nodes run (ops/cluster/up.sh, down.sh, standby.sh). Sourced, never run.
# Everything lives in .data/cluster/ (git-ignored), apart from npm start's own state, on ports 55420–55459.
source "$(dirname "${BASH_SOURCE[0]}")/../env.sh"

export CL_DIR="${LB_CLUSTER_DIR:-$LB_ROOT/.data/cluster}"
export CL_RUN="$CL_DIR/run"   # PID files
export CL_LOGS="$CL_DIR/logs" # one log per process
export CL_BIN="$CL_DIR/bin"   # this run's bundle of the server (server/dist is left to npm start)
export CL_DB=layerbook_cluster

export CL_PG_PORT=55420       # the primary: one PostgreSQL for every node
export CL_STANDBY_PORT=55421  # the streaming standby (--replica)
export CL_SMTP_PORT=55425 CL_MAIL_WEB_PORT=55426 CL_S3_PORT=55427
export CL_WEB_PORTS="55431 55432"
export CL_HTTPS_PORT=55440    # nginx: the one entry, TLS, round robin over the web nodes
export CL_WORKERS=2

export CL_PRIMARY_DIR="$CL_DIR/db/primary"
export CL_STANDBY_DIR="$CL_DIR/db/standby"
export LB_REPLICA_PASSWORD="${LB_REPLICA_PASSWORD:-layerbook-replica-local}"

export CL_PUBLIC_URL="https://localhost:$CL_HTTPS_PORT"

# The repo's PostgreSQL scripts, pointed at this run's own cluster (port, data folder) instead of npm start's.
primary() { LB_DATA="$CL_DIR/db" PGDATA_DIR="$CL_PRIMARY_DIR" LB_PG_PORT="$CL_PG_PORT" "$@"; }
psql_primary() { as_pg psql -h "$CL_PRIMARY_DIR" -p "$CL_PG_PORT" -U postgres -v ON_ERROR_STOP=1 -qAt "$@"; }
psql_standby() { as_pg psql -h "$CL_STANDBY_DIR" -p "$CL_STANDBY_PORT" -U postgres -v ON_ERROR_STOP=1 -qAt "$@"; }

cl_url() { # $1 = role, $2 = password, $3 = port
  echo "postgres://$1:$2@127.0.0.1:$3/$CL_DB"
}

# Is the process in PID file $1 running?
running() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

# Waits up to $2 seconds (default 60) for command $1 to succeed.
wait_for() {
  local tries=$((${2:-60} * 5))
  for _ in $(seq 1 "$tries"); do
    if eval "$1" >/dev/null 2>&1; then return 0; fi
    sleep 0.2
  done
  return 1
}
