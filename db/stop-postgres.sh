#!/usr/bin/env bash
# Stops the throwaway PostgreSQL started by db/start-postgres.sh (same PGTEST_DIR / PGTEST_BIN).
#   --purge   also delete its data directory
set -euo pipefail

dir="${PGTEST_DIR:-/tmp/packdesigner-pg}"
bin="${PGTEST_BIN:-/usr/lib/postgresql/15/bin}"

as_pg() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

if [ -f "$dir/PG_VERSION" ] && as_pg "$bin/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
  as_pg "$bin/pg_ctl" -D "$dir" -m fast -w stop >&2
else
  echo "No PostgreSQL running in $dir" >&2
fi

if [ "${1:-}" = "--purge" ]; then
  rm -rf "$dir"
  echo "Removed $dir" >&2
fi
