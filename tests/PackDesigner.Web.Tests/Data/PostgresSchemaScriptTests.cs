using Microsoft.EntityFrameworkCore;
using Npgsql;
using PackDesigner.Data;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

/// <summary>db/schema.postgres.sql, the idempotent script for a shop's server, builds the migrated schema.</summary>
public sealed class PostgresSchemaScriptTests : IPostgresTests, IAsyncLifetime
{
    private readonly string _database = $"packdesigner_script_{Guid.NewGuid():N}";

    [ProviderFact]
    public async Task SchemaScript_AppliedTwiceToAnEmptyDatabase_BuildsTheMigratedSchemaWithTriggers()
    {
        var script = await File.ReadAllTextAsync(Path.Combine(RepositoryRoot.Path, "db", "schema.postgres.sql"));
        await using (var connection = new NpgsqlConnection(PostgresServer.For(_database)))
        {
            await connection.OpenAsync();
            for (var i = 0; i < 2; i++)
            {
                await using var command = new NpgsqlCommand(script, connection);
                await command.ExecuteNonQueryAsync();
            }
        }

        var settings = StorageSettings.ForPostgres(PostgresServer.For(_database));
        await using var db = new PackDesignerDbContext(PackDesignerDbContextOptions.Create(settings));
        Assert.Empty(await db.Database.GetPendingMigrationsAsync());
        var design = (await new PackDesigner.Data.Designs.DesignStore(db, TimeProvider.System)
            .CreateDesignAsync("Scripted", null, null, null, TestDesigns.Valid(), "a")).Value!;
        var e = Assert.ThrowsAny<Exception>(() => db.Database.ExecuteSqlRaw("DELETE FROM design_revisions WHERE id = {0}", design.LatestRevision.Id));
        Assert.Contains("append-only", e.Message, StringComparison.Ordinal);
    }

    public async Task InitializeAsync()
    {
        if (PostgresServer.SkipReason is not null)
        {
            return;
        }

        await using var connection = new NpgsqlConnection(PostgresServer.For("postgres"));
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand($"CREATE DATABASE \"{_database}\"", connection);
        await command.ExecuteNonQueryAsync();
    }

    public async Task DisposeAsync()
    {
        if (PostgresServer.SkipReason is not null)
        {
            return;
        }

        NpgsqlConnection.ClearAllPools();
        await using var connection = new NpgsqlConnection(PostgresServer.For("postgres"));
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{_database}\" WITH (FORCE)", connection);
        await command.ExecuteNonQueryAsync();
    }
}
