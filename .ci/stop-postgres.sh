#!/usr/bin/env bash
# Stops the throwaway PostgreSQL cluster that start-postgres.sh started (fast shutdown). Idempotent.
# Environment: HOLDPOINT_PG_DIR (default /tmp/holdpoint-pg), as for start-postgres.sh.
set -euo pipefail
base="${HOLDPOINT_PG_DIR:-/tmp/holdpoint-pg}"
data="$base/data"
bin="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
if [ -z "$bin" ] || [ ! -s "$data/PG_VERSION" ]; then
  echo "stop-postgres: no cluster in $data" >&2
  exit 0
fi
if [ "$(id -u)" -eq 0 ]; then
  runuser -u postgres -- "$bin/pg_ctl" -D "$data" -m fast -w stop >&2 || true
else
  "$bin/pg_ctl" -D "$data" -m fast -w stop >&2 || true
fi
