#!/usr/bin/env bash
# Starts a throwaway PostgreSQL 15 for tests and contributors, and prints its connection string on stdout
# (everything else goes to stderr). Idempotent: a server already running in the data directory is reused.
#
#   PGTEST_DIR   data directory            (default /tmp/packdesigner-pg)
#   PGTEST_PORT  TCP port on 127.0.0.1     (default 55432)
#   PGTEST_BIN   PostgreSQL binaries       (default /usr/lib/postgresql/15/bin; installed with apt-get when missing)
#
# Trust authentication, fsync=off and synchronous_commit=off: for tests only, never for real data.
# PostgreSQL refuses to run as root, so as root its commands run as the postgres user (runuser).
set -euo pipefail

dir="${PGTEST_DIR:-/tmp/packdesigner-pg}"
port="${PGTEST_PORT:-55432}"
bin="${PGTEST_BIN:-/usr/lib/postgresql/15/bin}"
is_root=false
[ "$(id -u)" -eq 0 ] && is_root=true

if [ ! -x "$bin/initdb" ]; then
  if $is_root && command -v apt-get >/dev/null; then
    echo "PostgreSQL not found at $bin: installing the postgresql package" >&2
    export DEBIAN_FRONTEND=noninteractive
    apt-get install -y postgresql >&2 || { apt-get update >&2 && apt-get install -y postgresql >&2; }
  fi
  if [ ! -x "$bin/initdb" ]; then
    echo "PostgreSQL 15 is not installed at $bin (Debian: apt-get install postgresql)" >&2
    exit 1
  fi
fi

as_pg() {
  if $is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

if $is_root && ! id postgres >/dev/null 2>&1; then
  useradd --system --home-dir /var/lib/postgresql --create-home postgres
fi

if [ ! -f "$dir/PG_VERSION" ]; then
  mkdir -p "$dir"
  if $is_root; then chown postgres:postgres "$dir"; fi
  chmod 700 "$dir"
  as_pg "$bin/initdb" -D "$dir" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >&2
fi

if as_pg "$bin/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
  echo "PostgreSQL already running in $dir" >&2
else
  as_pg "$bin/pg_ctl" -D "$dir" -l "$dir/server.log" -w -t 60 \
    -o "-p $port -c listen_addresses=127.0.0.1 -c unix_socket_directories=$dir -c fsync=off -c synchronous_commit=off" \
    start >&2
fi

if ! "$bin/pg_isready" -q -h 127.0.0.1 -p "$port" -t 10; then
  echo "PostgreSQL in $dir does not answer on 127.0.0.1:$port (running on another port? see $dir/server.log)" >&2
  exit 1
fi

echo "Host=127.0.0.1;Port=$port;Username=postgres"
