using Microsoft.EntityFrameworkCore.Migrations;

namespace PackDesigner.Data.Migrations.Sqlite;

/// <summary>
/// Database-side guard of the append-only tables: any UPDATE or DELETE of design revisions and their status
/// changes aborts, whoever sends it. The DbContext refuses the same changes before they reach the database; these
/// triggers also catch raw SQL and bulk updates. A later migration that rebuilds one of these tables (SQLite's way
/// of altering columns) drops its triggers with it and must create them again.
/// </summary>
internal static class AppendOnlyTriggers
{
    private static readonly string[] Tables = ["design_revisions", "design_revision_status_changes"];

    public static void Create(MigrationBuilder migrationBuilder)
    {
        foreach (var table in Tables)
        {
            migrationBuilder.Sql($"""
                CREATE TRIGGER {table}_no_update BEFORE UPDATE ON {table}
                BEGIN
                    SELECT RAISE(ABORT, 'rows of {table} are append-only: UPDATE refused');
                END;
                """);
            migrationBuilder.Sql($"""
                CREATE TRIGGER {table}_no_delete BEFORE DELETE ON {table}
                BEGIN
                    SELECT RAISE(ABORT, 'rows of {table} are append-only: DELETE refused');
                END;
                """);
        }
    }

    public static void Drop(MigrationBuilder migrationBuilder)
    {
        foreach (var table in Tables)
        {
            migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_no_update;");
            migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_no_delete;");
        }
    }
}
