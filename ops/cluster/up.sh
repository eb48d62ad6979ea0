#!/usr/bin/env bash
# Several nodes on one machine: two web processes and two worker processes on one PostgreSQL primary,
# behind nginx (TLS, round robin), with the demo firm, a mail catcher and the S3 fake. With --replica,
# a streaming standby too, which the web nodes read the cash reports from (DATABASE_READ_URL).
#   bash ops/cluster/up.sh [--replica] [--build]     then   npx tsx ops/bench/cluster/cluster-check.ts
#   bash ops/cluster/down.sh [--wipe]
# Ports 55420–55459, state in .data/cluster/; every process started by PID and stopped by PID.
# --build rebuilds the apps (ops/build.sh); without it they are built only when missing.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
source "$here/env.sh"
cd "$LB_ROOT"

replica=0 build=0
for arg in "$@"; do
  case "$arg" in
    --replica) replica=1 ;;
    --build) build=1 ;;
    *) echo "usage: ops/cluster/up.sh [--replica] [--build]" >&2; exit 2 ;;
  esac
done

# A second run restarts everything (the data stays).
if compgen -G "$CL_RUN/*.pid" >/dev/null; then bash "$here/down.sh"; fi

# Whatever fails on the way, what was started is stopped again (by PID).
started_ok=0
trap 'if [ "$started_ok" = 0 ]; then echo "ops/cluster/up.sh failed; stopping what it started." >&2; bash "$here/down.sh" >&2; fi' EXIT

bash ops/deps.sh
bash ops/pg-install.sh
bash "$here/nginx-install.sh"
mkdir -p "$CL_RUN" "$CL_LOGS" "$CL_DIR/nginx/tmp" "$CL_DIR/tls" "$CL_DIR/s3" "$CL_DIR/mail"

# One PostgreSQL for every node: the repo's own scripts, on this run's port and folder.
primary bash ops/pg-start.sh
primary bash ops/pg-createdb.sh "$CL_DB"
export DATABASE_URL DATABASE_OWNER_URL DATABASE_JOBS_URL
DATABASE_URL="$(cl_url layerbook_app "$LB_APP_PASSWORD" "$CL_PG_PORT")"
DATABASE_OWNER_URL="$(cl_url layerbook_owner "$LB_OWNER_PASSWORD" "$CL_PG_PORT")"
DATABASE_JOBS_URL="$(cl_url layerbook_jobs "$LB_JOBS_PASSWORD" "$CL_PG_PORT")"

# The apps (server-rendered by every web node) as npm start builds them; the server bundled for this
# run into .data/cluster/bin, so a running npm start keeps its own server/dist.
if [ "$build" = 1 ] || [ ! -f dist/admin/server/server.mjs ] || [ ! -f dist/portal/server/server.mjs ]; then bash ops/build.sh; fi
externals=$(node -e "const p=require('./package.json');console.log(Object.keys({...p.dependencies,...p.devDependencies}).map(n=>'--external:'+n).join(' '))")
# shellcheck disable=SC2086
npx esbuild server/src/main.ts server/src/seed/run.ts server/src/files/s3-fake-cli.ts --bundle --platform=node --target=node20 \
  --format=cjs $externals --outdir="$CL_BIN" --log-level=warning

# A self-signed certificate for localhost: nginx terminates TLS, so the app's production cookies (Secure, __Host-) work.
if [ ! -s "$CL_DIR/tls/cert.pem" ]; then
  openssl req -x509 -newkey rsa:2048 -nodes -days 825 -subj "/CN=localhost" -addext "subjectAltName=DNS:localhost,IP:127.0.0.1" \
    -keyout "$CL_DIR/tls/key.pem" -out "$CL_DIR/tls/cert.pem" 2>/dev/null
fi
if [ ! -s "$CL_DIR/session-secret" ]; then head -c 48 /dev/urandom | base64 | tr -d '\n/+=' >"$CL_DIR/session-secret"; fi

# Every node reads the same settings: same database, same session secret, same mail and file services.
export NODE_ENV=production ROOT_DIR="$LB_ROOT" PUBLIC_URL="$CL_PUBLIC_URL" RUN_MIGRATIONS=false LOG_LEVEL=info
export SESSION_SECRET="$(cat "$CL_DIR/session-secret")"
export SMTP_HOST=127.0.0.1 SMTP_PORT="$CL_SMTP_PORT" S3_ENDPOINT="http://127.0.0.1:$CL_S3_PORT"
unset STRIPE_SECRET_KEY STRIPE_WEBHOOK_SECRET STRIPE_API_BASE DATABASE_READ_URL

# start NAME LOG COMMAND…: in the background, its PID recorded.
start() {
  local name="$1"
  shift
  nohup "$@" >"$CL_LOGS/$name.log" 2>&1 &
  echo $! >"$CL_RUN/$name.pid"
}

start maildev "$LB_ROOT/node_modules/.bin/maildev" --smtp "$CL_SMTP_PORT" --web "$CL_MAIL_WEB_PORT" --ip 127.0.0.1 --web-ip 127.0.0.1 --mail-directory "$CL_DIR/mail"
start s3 node "$CL_BIN/files/s3-fake-cli.js" "$CL_DIR/s3" "$CL_S3_PORT"
wait_for "curl -s -o /dev/null $S3_ENDPOINT" 30 || { echo "The S3 fake did not start: $CL_LOGS/s3.log" >&2; exit 1; }

# Migrations and the demo firm, once, before any node starts (the nodes run with RUN_MIGRATIONS=false).
node "$CL_BIN/seed/run.js"

if [ "$replica" = 1 ]; then
  bash "$here/standby.sh"
  export DATABASE_READ_URL
  DATABASE_READ_URL="$(cl_url layerbook_app "$LB_APP_PASSWORD" "$CL_STANDBY_PORT")"
fi

# One process at a time, each once it is ready: on a fresh database, processes starting together race
# to create pg-boss's queues and grant the web role its rights, and PostgreSQL may abort one of them
# (deadlock, "tuple concurrently updated"). Nodes started later, one by one, are not affected.
for i in $(seq 1 "$CL_WORKERS"); do
  start "worker-$i" node "$CL_BIN/main.js" worker
  wait_for "grep -q 'worker started' '$CL_LOGS/worker-$i.log'" 60 || { echo "worker-$i did not start: $CL_LOGS/worker-$i.log" >&2; exit 1; }
done
i=0
for port in $CL_WEB_PORTS; do
  i=$((i + 1))
  PORT="$port" HOST=127.0.0.1 RUN_WORKERS=false start "web-$i" node "$CL_BIN/main.js"
  wait_for "curl -fs -o /dev/null http://127.0.0.1:$port/api/health" 90 || { echo "web-$i did not start: $CL_LOGS/web-$i.log" >&2; exit 1; }
done

bash "$here/nginx-conf.sh" >"$CL_DIR/nginx/nginx.conf"
if [ "$(id -u)" = "0" ]; then chown -R www-data "$CL_DIR/nginx/tmp"; fi
/usr/sbin/nginx -t -q -c "$CL_DIR/nginx/nginx.conf" -p "$CL_DIR/nginx/"
start nginx /usr/sbin/nginx -c "$CL_DIR/nginx/nginx.conf" -p "$CL_DIR/nginx/" -g "daemon off;"
wait_for "curl -fs -o /dev/null --cacert '$CL_DIR/tls/cert.pem' $CL_PUBLIC_URL/api/health" 30 || { echo "nginx did not start: $CL_LOGS/nginx.log" >&2; exit 1; }

started_ok=1
cat <<INFO

  Layerbook, several nodes, at  $CL_PUBLIC_URL   (self-signed: $CL_DIR/tls/cert.pem)
    nginx (round robin)         PID $(cat "$CL_RUN/nginx.pid"), log $CL_LOGS/nginx-access.log
$(i=0; for port in $CL_WEB_PORTS; do i=$((i + 1)); echo "    web-$i                       127.0.0.1:$port  PID $(cat "$CL_RUN/web-$i.pid")"; done)
$(for i in $(seq 1 "$CL_WORKERS"); do echo "    worker-$i                    PID $(cat "$CL_RUN/worker-$i.pid")"; done)
    PostgreSQL primary          127.0.0.1:$CL_PG_PORT  database $CL_DB
$(if [ "$replica" = 1 ]; then echo "    PostgreSQL standby          127.0.0.1:$CL_STANDBY_PORT  (DATABASE_READ_URL: the cash reports read here)"; fi)
    mail inbox                  http://localhost:$CL_MAIL_WEB_PORT
  Demo firm "Fernhollow Plaster & Glaze": owner@fernhollow.example / limewash-demo-2026
  Check it:  npx tsx ops/bench/cluster/cluster-check.ts      Stop it:  bash ops/cluster/down.sh

INFO
