# Shared by ops/backup.sh and ops/restore.sh. Sourced, never run.
# shellcheck source=../env.sh
source "$(dirname "${BASH_SOURCE[0]}")/../env.sh"
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

die() {
  echo "error: $*" >&2
  exit 1
}

# The database named in a postgres:// URL ("" when it names none).
url_db() {
  local rest="${1%%\?*}"
  rest="${rest#*://}"
  if [[ "$rest" == */* ]]; then echo "${rest#*/}"; else echo ""; fi
}

# The same URL pointing at database $2.
url_with_db() {
  [[ "$1" =~ ^([a-z]+://[^/?]*)(/[^?]*)?(\?.*)?$ ]] || die "not a postgres:// URL: DATABASE_ADMIN_URL"
  echo "${BASH_REMATCH[1]}/$2${BASH_REMATCH[3]}"
}

# Database names are plain identifiers here, so they are safe inside SQL and shell words.
check_db_name() {
  [[ "$1" =~ ^[A-Za-z_][A-Za-z0-9_]{0,62}$ ]] || die "database name '$1': use letters, digits and _ only"
}

# Sets CMD to PostgreSQL's program $1 connected to database $2 as an administrator: DATABASE_ADMIN_URL
# (a superuser, or a role that bypasses row-level security and may create databases and set owners)
# when it is set, otherwise the local cluster of ops/pg-start.sh as `postgres` over its socket.
admin_cmd() {
  local program="$PG_BIN/$1"
  [ -x "$program" ] || die "$program is missing: run ops/pg-install.sh (Debian's PostgreSQL 15) or set PG_BIN"
  if [ -n "${DATABASE_ADMIN_URL:-}" ]; then
    CMD=("$program" -d "$(url_with_db "$DATABASE_ADMIN_URL" "$2")")
  else
    CMD=("$program" -h "$PGDATA_DIR" -p "$LB_PG_PORT" -U postgres -d "$2")
  fi
}

# psql as the administrator on database $1, stopping at the first error; SQL on stdin or in the rest.
admin_psql() {
  local db=$1
  shift
  admin_cmd psql "$db"
  "${CMD[@]}" -X -q -A -t -v ON_ERROR_STOP=1 "$@"
}

tsx_run() {
  "$LB_ROOT/node_modules/.bin/tsx" "$LB_ROOT/ops/backup/cli.ts" "$@"
}
