#!/usr/bin/env bash
# `npm test`: everything — unit (packages), API on a real PostgreSQL, end-to-end in Chromium.
# Installs what is missing first; uses its own databases, never the demo data.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"
# The pinned AWS SDK prints a Node-22-from-2027 notice in every test process; it is known (DEVELOPERS.md).
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
bash ops/deps.sh --browser
bash ops/pg-start.sh

echo "== unit and API tests (jest) =="
npx jest --runInBand --ci

echo "== build for the browser tests =="
bash ops/build.sh

echo "== end-to-end tests (Playwright, Chromium) =="
npx playwright test
