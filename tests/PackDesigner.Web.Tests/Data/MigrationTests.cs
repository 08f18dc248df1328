using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class MigrationSqliteTests(SqliteTestDatabase database) : MigrationTests<SqliteTestDatabase>(database);

public sealed class MigrationPostgresTests(PostgresTestDatabase database) : MigrationTests<PostgresTestDatabase>(database), IPostgresTests;

/// <summary>Each provider's migration set builds exactly the model, with the append-only triggers.</summary>
public abstract class MigrationTests<TDatabase>(TDatabase database) : IClassFixture<TDatabase>
    where TDatabase : TestDatabase
{
    [ProviderFact]
    public async Task Migrate_FreshDatabase_AppliesTheProvidersSetAndLeavesNoModelChanges()
    {
        await using var db = database.CreateContext();

        Assert.False(db.Database.HasPendingModelChanges());
        Assert.Empty(await db.Database.GetPendingMigrationsAsync());
        Assert.Equal(db.Database.GetMigrations(), await db.Database.GetAppliedMigrationsAsync());
        var expected = database.Provider == StorageProvider.Postgres
            ? StorageSettings.PostgresMigrationsAssembly
            : StorageSettings.SqliteMigrationsAssembly;
        Assert.Equal(expected, db.GetService<IMigrationsAssembly>().Assembly.GetName().Name);
    }

    [ProviderFact]
    public async Task Migrate_FreshDatabase_CreatesSnakeCaseTablesAndTriggers()
    {
        await using var db = database.CreateContext();
        var postgres = database.Provider == StorageProvider.Postgres;

        var tables = await db.Database.SqlQueryRaw<string>(postgres
            ? "SELECT table_name AS \"Value\" FROM information_schema.tables WHERE table_schema = 'public'"
            : "SELECT name AS \"Value\" FROM sqlite_master WHERE type = 'table'").ToListAsync();
        var triggers = await db.Database.SqlQueryRaw<string>(postgres
            ? "SELECT tgname::text AS \"Value\" FROM pg_trigger WHERE NOT tgisinternal"
            : "SELECT name AS \"Value\" FROM sqlite_master WHERE type = 'trigger'").ToListAsync();

        Assert.Superset(new HashSet<string> { "customers", "jobs", "cells", "designs", "design_revisions", "design_revision_status_changes" }, tables.ToHashSet());
        string[] expectedTriggers = postgres
            ? ["design_revisions_append_only", "design_revisions_no_truncate", "design_revision_status_changes_append_only", "design_revision_status_changes_no_truncate"]
            : ["design_revisions_no_update", "design_revisions_no_delete", "design_revision_status_changes_no_update", "design_revision_status_changes_no_delete"];
        Assert.Equal(expectedTriggers.Order(), triggers.Order());
    }
}
