using Microsoft.EntityFrameworkCore.Migrations;

namespace PackDesigner.Data.Migrations.Postgres;

/// <summary>
/// Database-side guard of the append-only tables: any UPDATE, DELETE or TRUNCATE of design revisions and their
/// status changes raises an exception, whoever sends it (the app, a script, psql). The DbContext refuses the same
/// changes before they reach the database; these triggers also catch raw SQL and bulk updates.
/// The function body is dollar-quoted with <c>$body$</c> so it nests inside the <c>DO $EF$</c> blocks of the
/// idempotent script.
/// </summary>
internal static class AppendOnlyTriggers
{
    private static readonly string[] Tables = ["design_revisions", "design_revision_status_changes"];

    public static void Create(MigrationBuilder migrationBuilder)
    {
        migrationBuilder.Sql("""
            CREATE OR REPLACE FUNCTION refuse_append_only_change() RETURNS trigger LANGUAGE plpgsql AS $body$
            BEGIN
                RAISE EXCEPTION 'rows of % are append-only: % refused', TG_TABLE_NAME, TG_OP
                    USING HINT = 'Add a new design revision or status change instead.';
            END;
            $body$;
            """);
        foreach (var table in Tables)
        {
            migrationBuilder.Sql($"CREATE TRIGGER {table}_append_only BEFORE UPDATE OR DELETE ON {table} FOR EACH ROW EXECUTE FUNCTION refuse_append_only_change();");
            migrationBuilder.Sql($"CREATE TRIGGER {table}_no_truncate BEFORE TRUNCATE ON {table} FOR EACH STATEMENT EXECUTE FUNCTION refuse_append_only_change();");
        }
    }

    public static void Drop(MigrationBuilder migrationBuilder)
    {
        foreach (var table in Tables)
        {
            migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_append_only ON {table};");
            migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_no_truncate ON {table};");
        }

        migrationBuilder.Sql("DROP FUNCTION IF EXISTS refuse_append_only_change();");
    }
}
