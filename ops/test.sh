#!/usr/bin/env bash
# `npm test`: everything, stopping at the first failure — static checks (types, lint, format, all at
# zero warnings), unit and API tests (jest, real PostgreSQL), the apps' unit specs (Vitest), then
# end-to-end tests in Chromium. Installs what is missing first; uses its own databases, never the demo data.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"
# The pinned AWS SDK prints a Node-22-from-2027 notice in every test process; it is known (DEVELOPERS.md).
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
# The Angular CLI never asks about usage data in a test run.
export NG_CLI_ANALYTICS=false
bash ops/deps.sh --browser

started=$SECONDS
stage() { # $1 = title; the rest = command
  local title=$1 began=$SECONDS
  shift
  echo "== $title =="
  "$@"
  echo "-- $title: $((SECONDS - began)) s"
}

stage "type check (server, packages, e2e, both apps with templates)" npm run --silent typecheck
stage "lint (ESLint, zero warnings)" npm run --silent lint
stage "format (Prettier)" npm run --silent format:check
stage "words (i18n): both languages, used keys exist, no literal text in templates" \
  bash -c "node --test --test-reporter=dot ops/i18n/check.spec.mjs && node ops/i18n/check.mjs"
bash ops/pg-start.sh
# One spec file at a time (they share one database), in a worker that jest starts afresh once it holds
# more than 1.5 GB after a file: run in band, what each file's server left behind piled up in one heap
# until it ran out of memory near the end of the run.
stage "unit and API tests (jest)" npx jest --maxWorkers=1 --workerIdleMemoryLimit=1536MB --ci
stage "app unit specs (Vitest, jsdom)" npm run --silent test:apps
stage "build for the browser tests" bash ops/build.sh
stage "end-to-end tests (Playwright, Chromium)" npx playwright test
echo "npm test passed in $((SECONDS - started)) s"
