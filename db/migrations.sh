#!/usr/bin/env bash
# Runs EF Core migration commands for BOTH migration sets with the right provider every time.
#
#   db/migrations.sh add NAME   add migration NAME to the SQLite and the PostgreSQL set, then refresh db/schema.postgres.sql
#   db/migrations.sh remove     remove the last migration from both sets (only if not applied anywhere), refresh the script
#   db/migrations.sh list       list the migrations of both sets
#   db/migrations.sh script     regenerate db/schema.postgres.sql (idempotent PostgreSQL script)
#
# Each migrations project is its own startup project and holds an IDesignTimeDbContextFactory that always picks
# its provider, so `dotnet ef` cannot silently use the other provider (which it would with one shared startup
# project whose configuration decides). No database connection is opened.
set -euo pipefail

root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root"
sqlite=src/PackDesigner.Data.Migrations.Sqlite
postgres=src/PackDesigner.Data.Migrations.Postgres
schema=db/schema.postgres.sql

ef() {
  local project="$1"; shift
  dotnet ef "$@" --project "$project" --startup-project "$project" --no-build
}

build() {
  dotnet tool restore >/dev/null
  dotnet build "$sqlite" -nologo -v q -clp:ErrorsOnly
  dotnet build "$postgres" -nologo -v q -clp:ErrorsOnly
}

script() {
  build
  ef "$postgres" migrations script --idempotent --output "$schema"
  # dotnet ef writes a UTF-8 byte-order mark, which psql would read as part of the first statement.
  sed -i '1s/^\xEF\xBB\xBF//' "$schema"
  echo "wrote $schema"
}

case "${1:-}" in
  add)
    name="${2:?usage: db/migrations.sh add NAME}"
    build
    ef "$sqlite" migrations add "$name" --output-dir Migrations
    ef "$postgres" migrations add "$name" --output-dir Migrations
    script
    echo "Added $name to both sets. Triggers and other raw SQL are not generated: add them to both migrations by hand if the change needs them."
    ;;
  remove)
    build
    ef "$sqlite" migrations remove --force
    ef "$postgres" migrations remove --force
    script
    ;;
  list)
    build
    echo "== SQLite"; ef "$sqlite" migrations list --no-connect
    echo "== PostgreSQL"; ef "$postgres" migrations list --no-connect
    ;;
  script)
    script
    ;;
  *)
    sed -n '2,12p' "$0"
    exit 2
    ;;
esac
