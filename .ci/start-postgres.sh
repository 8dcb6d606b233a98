#!/usr/bin/env bash
# Starts (or finds running) a throwaway PostgreSQL cluster on loopback for the archive's "postgres" tests.
# Idempotent. Diagnostics go to stderr; stdout is exactly one line for eval:
#   export HOLDPOINT_PG_URL='jdbc:postgresql://127.0.0.1:55432/postgres?user=postgres'
# Usage: eval "$(.ci/start-postgres.sh)"
# Environment: HOLDPOINT_PG_PORT (default 55432), HOLDPOINT_PG_DIR (default /tmp/holdpoint-pg).
# The cluster trusts loopback connections: it is for tests only and never listens beyond 127.0.0.1.
set -euo pipefail
port="${HOLDPOINT_PG_PORT:-55432}"
base="${HOLDPOINT_PG_DIR:-/tmp/holdpoint-pg}"
data="$base/data"
sock="$base/socket"
log="$base/server.log"
url="jdbc:postgresql://127.0.0.1:${port}/postgres?user=postgres"

say() { echo "start-postgres: $*" >&2; }

bindir() {
  local d
  d="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  if [ -z "$d" ] || [ ! -x "$d/initdb" ]; then
    if [ "$(id -u)" -eq 0 ]; then
      say "installing the Debian package postgresql"
      export DEBIAN_FRONTEND=noninteractive
      apt-get update -qq >&2
      apt-get install -y -qq --no-install-recommends postgresql >&2
      d="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)"
    else
      say "PostgreSQL server binaries not found (install the Debian package postgresql)"
      exit 1
    fi
  fi
  echo "$d"
}

# as the unprivileged postgres user when run as root (initdb refuses root)
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

bin="$(bindir)"
if "$bin/pg_isready" -q -h 127.0.0.1 -p "$port"; then
  say "already running on 127.0.0.1:$port"
  echo "export HOLDPOINT_PG_URL='$url'"
  exit 0
fi

mkdir -p "$base"
if [ "$(id -u)" -eq 0 ]; then
  id postgres >/dev/null 2>&1 || useradd --system --home-dir "$base" --shell /usr/sbin/nologin postgres
  chown postgres "$base"
fi
if [ ! -s "$data/PG_VERSION" ]; then
  say "creating a throwaway cluster in $data"
  as_pg "$bin/initdb" -D "$data" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 >&2
fi
as_pg mkdir -p "$sock"
say "starting on 127.0.0.1:$port (log $log)"
as_pg "$bin/pg_ctl" -D "$data" -l "$log" -w -t 60 \
  -o "-c listen_addresses=127.0.0.1 -p $port -k $sock -c max_connections=50 -c fsync=off" start >&2
echo "export HOLDPOINT_PG_URL='$url'"
