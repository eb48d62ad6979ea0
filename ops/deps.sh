#!/usr/bin/env bash
# Installs what a fresh clone lacks: npm dependencies (from the lockfile) and, for browser
# tests, Debian's Chromium. Safe to run twice; quiet when everything is present.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"
stamp="node_modules/.layerbook-lock"
if [ ! -d node_modules ] || [ ! -f "$stamp" ] || ! cmp -s package-lock.json "$stamp"; then
  echo "Installing npm dependencies…"
  npm ci --no-audit --no-fund --loglevel=error
  cp package-lock.json "$stamp"
fi
if [ "${1:-}" = "--browser" ] && [ ! -x /usr/bin/chromium ]; then
  echo "Installing Chromium from Debian's packages (for the browser tests)…"
  if [ "$(id -u)" != "0" ]; then echo "Run as root, or install the 'chromium' package yourself." >&2; exit 1; fi
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium fonts-liberation >/dev/null
fi
