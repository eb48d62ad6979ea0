#!/usr/bin/env bash
# Installs nginx from Debian's packages when it is missing (as ops/pg-install.sh does PostgreSQL). Safe to run twice.
set -euo pipefail
if [ -x /usr/sbin/nginx ]; then exit 0; fi
echo "nginx not found; installing Debian's package…"
if [ "$(id -u)" != "0" ]; then echo "Run as root, or install the 'nginx' package yourself." >&2; exit 1; fi
apt-get update -qq
DEBIAN_FRONTEND=noninteractive apt-get install -y -qq nginx >/dev/null
# Debian may start its default site on port 80; we run our own nginx with our own configuration, so stop that one.
(command -v invoke-rc.d >/dev/null && invoke-rc.d nginx stop) >/dev/null 2>&1 || true
