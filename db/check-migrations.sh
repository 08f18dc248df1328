#!/usr/bin/env bash
# CI check of the two migration sets:
#  1. `dotnet ef migrations has-pending-model-changes` for the SQLite set and for the PostgreSQL set (EF 9+ makes
#     Migrate() throw for a provider whose set misses a migration, so both must be checked);
#  2. db/schema.postgres.sql equals a freshly generated idempotent script.
# Exits non-zero on the first failure. Opens no database connection.
set -euo pipefail

root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root"
sqlite=src/PackDesigner.Data.Migrations.Sqlite
postgres=src/PackDesigner.Data.Migrations.Postgres
schema=db/schema.postgres.sql

dotnet tool restore >/dev/null
dotnet build "$sqlite" -nologo -v q -clp:ErrorsOnly
dotnet build "$postgres" -nologo -v q -clp:ErrorsOnly

for project in "$sqlite" "$postgres"; do
  echo "== has-pending-model-changes: $project"
  if ! dotnet ef migrations has-pending-model-changes --project "$project" --startup-project "$project" --no-build; then
    echo "FAIL: the model has changes without a migration in $project. Run: db/migrations.sh add NAME" >&2
    exit 1
  fi
done

tmp="$(mktemp "${TMPDIR:-/tmp}/schema.XXXXXX.sql")"
trap 'rm -f "$tmp"' EXIT
dotnet ef migrations script --idempotent --output "$tmp" --project "$postgres" --startup-project "$postgres" --no-build >/dev/null
sed -i '1s/^\xEF\xBB\xBF//' "$tmp"
if ! diff -u "$schema" "$tmp"; then
  echo "FAIL: $schema is not the script the PostgreSQL migrations generate. Run: db/migrations.sh script" >&2
  exit 1
fi
echo "OK: both migration sets match the model and $schema is current."
