# Shared settings for the ops scripts. Sourced, never run.
# Everything local lives in .data/ (git-ignored). Override any of these in the environment.
LB_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export LB_ROOT
export PG_BIN="${PG_BIN:-/usr/lib/postgresql/15/bin}"
export LB_DATA="${LB_DATA:-$LB_ROOT/.data}"
export PGDATA_DIR="${PGDATA_DIR:-$LB_DATA/pg}"
export LB_PG_PORT="${LB_PG_PORT:-54329}"
export LB_PG_HOST=127.0.0.1
# Local-only passwords for loopback roles; production supplies its own through the environment.
export LB_OWNER_PASSWORD="${LB_OWNER_PASSWORD:-layerbook-owner-local}"
export LB_APP_PASSWORD="${LB_APP_PASSWORD:-layerbook-app-local}"
export LB_JOBS_PASSWORD="${LB_JOBS_PASSWORD:-layerbook-jobs-local}"

# Run a command as the postgres OS user when we are root (Debian's server refuses to run as root).
as_pg() {
  if [ "$(id -u)" = "0" ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

db_urls() {
  local db="$1"
  export DATABASE_URL="postgres://layerbook_app:${LB_APP_PASSWORD}@${LB_PG_HOST}:${LB_PG_PORT}/${db}"
  export DATABASE_OWNER_URL="postgres://layerbook_owner:${LB_OWNER_PASSWORD}@${LB_PG_HOST}:${LB_PG_PORT}/${db}"
  export DATABASE_JOBS_URL="postgres://layerbook_jobs:${LB_JOBS_PASSWORD}@${LB_PG_HOST}:${LB_PG_PORT}/${db}"
}
