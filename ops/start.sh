#!/usr/bin/env bash
# `npm start`: install what is missing, start PostgreSQL, the mail catcher, the S3 fake and the Stripe
# stand-in, migrate, seed the demo firm, build, and serve both apps. Safe to run twice. Stop with `npm stop` (or Ctrl+C).
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"
bash ops/deps.sh
bash ops/pg-start.sh
bash ops/pg-createdb.sh layerbook_dev
db_urls layerbook_dev
mkdir -p "$LB_DATA/run"

export PORT="${PORT:-4300}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}" SMTP_PORT="${SMTP_PORT:-1025}" S3_FAKE_PORT="${S3_FAKE_PORT:-4569}"
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$S3_FAKE_PORT}"
export PUBLIC_URL="${PUBLIC_URL:-http://localhost:$PORT}"
if [ ! -s "$LB_DATA/session-secret" ]; then head -c 48 /dev/urandom | base64 | tr -d '\n/+=' > "$LB_DATA/session-secret"; fi
export SESSION_SECRET="${SESSION_SECRET:-$(cat "$LB_DATA/session-secret")}"
export NODE_ENV="${NODE_ENV:-development}" ROOT_DIR="$LB_ROOT"
# Card payments go to the local Stripe stand-in (packages/stripe-fake) unless a real key is given:
# set STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET and STRIPE_API_BASE (empty for Stripe itself) to change that.
STRIPE_FAKE_PORT="${STRIPE_FAKE_PORT:-12111}"
if [ -z "${STRIPE_SECRET_KEY:-}" ]; then
  STRIPE_FAKE=1
  export STRIPE_SECRET_KEY="sk_test_layerbook_local" STRIPE_WEBHOOK_SECRET="whsec_layerbook_local"
  export STRIPE_API_BASE="http://127.0.0.1:$STRIPE_FAKE_PORT"
else
  STRIPE_FAKE=0
fi

# Mail catcher with a web inbox; started by PID, stopped by PID.
if ! { [ -f "$LB_DATA/run/maildev.pid" ] && kill -0 "$(cat "$LB_DATA/run/maildev.pid")" 2>/dev/null; }; then
  # Run the binary itself (not through npx) so the recorded PID is the server, and npm stop can stop it.
  nohup "$LB_ROOT/node_modules/.bin/maildev" --smtp "$SMTP_PORT" --web "$MAIL_WEB_PORT" --ip 127.0.0.1 --mail-directory "$LB_DATA/mail" >"$LB_DATA/run/maildev.log" 2>&1 &
  echo $! > "$LB_DATA/run/maildev.pid"
fi

bash ops/build.sh

# S3 stand-in for uploaded files (objects kept in .data/s3); started by PID, stopped by PID.
if ! { [ -f "$LB_DATA/run/s3.pid" ] && kill -0 "$(cat "$LB_DATA/run/s3.pid")" 2>/dev/null; }; then
  nohup node server/dist/files/s3-fake-cli.js "$LB_DATA/s3" "$S3_FAKE_PORT" >"$LB_DATA/run/s3.log" 2>&1 &
  echo $! > "$LB_DATA/run/s3.pid"
  for _ in $(seq 1 50); do curl -s -o /dev/null "$S3_ENDPOINT" && break; sleep 0.1; done
fi

# Stripe stand-in: Checkout's card page and signed webhooks to this server; started by PID, stopped by PID.
if [ "$STRIPE_FAKE" = 1 ] && ! { [ -f "$LB_DATA/run/stripe.pid" ] && kill -0 "$(cat "$LB_DATA/run/stripe.pid")" 2>/dev/null; }; then
  STRIPE_FAKE_WEBHOOK_URL="http://127.0.0.1:$PORT/api/payments/webhook" \
    nohup node packages/stripe-fake/dist/cli.js --port "$STRIPE_FAKE_PORT" >"$LB_DATA/run/stripe.log" 2>&1 &
  echo $! > "$LB_DATA/run/stripe.pid"
  for _ in $(seq 1 50); do curl -s -o /dev/null "$STRIPE_API_BASE/_test/health" && break; sleep 0.1; done
fi

node server/dist/seed/run.js

if [ -f "$LB_DATA/run/server.pid" ] && kill -0 "$(cat "$LB_DATA/run/server.pid")" 2>/dev/null; then
  kill "$(cat "$LB_DATA/run/server.pid")"; sleep 1
fi
cat <<INFO

  Layerbook is starting at  $PUBLIC_URL
    admin (owner, office, crew)   $PUBLIC_URL/sign-in
    client portal                 $PUBLIC_URL/portal/sign-in
    mail inbox (every e-mail)     http://localhost:$MAIL_WEB_PORT
    S3 fake (uploaded files)      $S3_ENDPOINT  (objects in .data/s3)
$(if [ "$STRIPE_FAKE" = 1 ]; then printf '    Stripe stand-in (card pay)    %s  (card 4242 4242 4242 4242 pays, any future expiry and CVC;\n                                  4000 0000 0000 0002 is declined; log in .data/run/stripe.log)' "$STRIPE_API_BASE"; else printf '    card payments                 Stripe itself (STRIPE_SECRET_KEY is set)'; fi)
  Demo firm "Fernhollow Plaster & Glaze", password for every demo login: limewash-demo-2026
    owner   owner@fernhollow.example
    office  office@fernhollow.example
    crew    crew@fernhollow.example
    client  hattie@brambleton.example  (portal: ask for a sign-in link, then open it from the inbox)
  Stop everything with: npm stop

INFO
node server/dist/main.js &
echo $! > "$LB_DATA/run/server.pid"
wait "$(cat "$LB_DATA/run/server.pid")"
