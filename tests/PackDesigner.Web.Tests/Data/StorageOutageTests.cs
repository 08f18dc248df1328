using System.Data.Common;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Storage;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class StorageOutageSqliteTests(SqliteTestDatabase database) : StorageOutageTests<SqliteTestDatabase>(database);

public sealed class StorageOutagePostgresTests(PostgresTestDatabase database) : StorageOutageTests<PostgresTestDatabase>(database), IPostgresTests;

/// <summary>
/// A database that stops answering in the middle of a save: the store reports storage unavailable and the
/// transaction leaves nothing behind. Another connection holds a lock the save needs; the save's command timeout
/// is one second.
/// </summary>
public abstract class StorageOutageTests<TDatabase>(TDatabase database) : IClassFixture<TDatabase>
    where TDatabase : TestDatabase
{
    [ProviderFact]
    public async Task CreateDesign_DatabaseStopsAnsweringMidSave_ThrowsStorageUnavailableAndWritesNothing()
    {
        var name = "Half " + Guid.NewGuid();
        await using (var blocker = await HoldWriteLockAsync())
        {
            await using var db = database.CreateContext(commandTimeoutSeconds: 1);
            var e = await Assert.ThrowsAsync<StorageUnavailableException>(() =>
                database.Designs(db).CreateDesignAsync(name, null, null, null, TestDesigns.Valid(), "a"));
            Assert.True(StorageFailure.IsUnavailable(e.InnerException));
        }

        await using var check = database.CreateContext();
        Assert.False(await check.Designs.AnyAsync(d => d.Name == name));
        Assert.Equal(0, await check.DesignRevisions.CountAsync(r => !check.Designs.Any(d => d.Id == r.DesignId)));
        // The store works again once the lock is gone.
        Assert.True((await database.Designs(check).CreateDesignAsync(name, null, null, null, TestDesigns.Valid(), "a")).IsOk);
    }

    [ProviderFact]
    public async Task SaveRevision_DatabaseStopsAnsweringMidSave_LeavesTheDesignAtItsRevision()
    {
        int designId;
        await using (var setup = database.CreateContext())
        {
            designId = (await database.Designs(setup).CreateDesignAsync("Outage " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!.Id;
        }

        await using (var blocker = await HoldWriteLockAsync())
        {
            await using var db = database.CreateContext(commandTimeoutSeconds: 1);
            await Assert.ThrowsAsync<StorageUnavailableException>(() =>
                database.Designs(db).SaveRevisionAsync(designId, 1, TestDesigns.Default().WithSeries(15).Build(), "a"));
        }

        await using var check = database.CreateContext();
        Assert.Equal(1, (await check.Designs.AsNoTracking().SingleAsync(d => d.Id == designId)).LatestRevisionNumber);
        Assert.Equal(1, await check.DesignRevisions.CountAsync(r => r.DesignId == designId));
    }

    /// <summary>
    /// PostgreSQL: locks the status-change table, which a save writes last (after the design and revision rows),
    /// so the save is cut off half-way. SQLite: takes the database's write lock, which the save needs first.
    /// </summary>
    private async Task<DbConnection> HoldWriteLockAsync()
    {
        // Unpooled, so closing the connection really ends its transaction and releases the lock.
        DbConnection connection = database.Provider == StorageProvider.Postgres
            ? new NpgsqlConnection(new NpgsqlConnectionStringBuilder(database.Settings.ConnectionString) { Pooling = false }.ConnectionString)
            : new SqliteConnection(new SqliteConnectionStringBuilder(database.Settings.ConnectionString) { Pooling = false }.ConnectionString);
        await connection.OpenAsync();
        await using var command = connection.CreateCommand();
        command.CommandText = database.Provider == StorageProvider.Postgres
            ? "BEGIN; LOCK TABLE design_revision_status_changes IN EXCLUSIVE MODE;"
            : "BEGIN IMMEDIATE;";
        await command.ExecuteNonQueryAsync();
        return connection;
    }
}
