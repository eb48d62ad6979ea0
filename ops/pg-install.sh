#!/usr/bin/env bash
# Installs PostgreSQL 15 from Debian's packages when it is missing. Safe to run twice.
set -euo pipefail
source "$(dirname "$0")/env.sh"
if [ -x "$PG_BIN/postgres" ]; then exit 0; fi
echo "PostgreSQL 15 not found; installing Debian's package…"
if [ "$(id -u)" != "0" ]; then echo "Run as root, or install the 'postgresql' package yourself." >&2; exit 1; fi
apt-get update -qq
DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
# Debian starts a default cluster on 5432; we run our own cluster, so stop that one.
(command -v pg_ctlcluster >/dev/null && pg_ctlcluster 15 main stop) 2>/dev/null || true
