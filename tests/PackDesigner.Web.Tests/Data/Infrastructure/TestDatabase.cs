using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Npgsql;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Designs;

namespace PackDesigner.Web.Tests.Data.Infrastructure;

/// <summary>
/// A real, migrated database owned by one test class (an xunit class fixture): a temporary SQLite file or a
/// PostgreSQL database with a GUID name. Created with <c>Migrate()</c>, removed on dispose.
/// </summary>
public abstract class TestDatabase : IAsyncLifetime
{
    public abstract StorageProvider Provider { get; }

    /// <summary>The settings the app would use for this database.</summary>
    public StorageSettings Settings { get; protected set; } = null!;

    public PackDesignerDbContext CreateContext() => new(PackDesignerDbContextOptions.Create(Settings));

    /// <summary>A context whose commands give up after <paramref name="commandTimeoutSeconds"/> (for the storage-unavailable tests).</summary>
    public PackDesignerDbContext CreateContext(int commandTimeoutSeconds) =>
        new(PackDesignerDbContextOptions.Create(WithCommandTimeout(commandTimeoutSeconds)));

    /// <summary>A context that reports every command it runs to <paramref name="interceptor"/>.</summary>
    public PackDesignerDbContext CreateContext(IInterceptor interceptor) =>
        new(new DbContextOptionsBuilder<PackDesignerDbContext>(PackDesignerDbContextOptions.Create(Settings)).AddInterceptors(interceptor).Options);

    public DesignStore Designs(PackDesignerDbContext db) => new(db, TimeProvider.System);

    public CellLibrary Cells(PackDesignerDbContext db) => new(db, TimeProvider.System);

    public CustomerService Customers(PackDesignerDbContext db) => new(db, TimeProvider.System);

    public async Task InitializeAsync()
    {
        Settings = await CreateSettingsAsync();
        await using var db = CreateContext();
        await db.Database.MigrateAsync();
    }

    public abstract Task DisposeAsync();

    protected abstract Task<StorageSettings> CreateSettingsAsync();

    protected abstract StorageSettings WithCommandTimeout(int seconds);
}

/// <summary>A temporary SQLite file under TMPDIR.</summary>
public sealed class SqliteTestDatabase : TestDatabase
{
    public override StorageProvider Provider => StorageProvider.Sqlite;

    public string FilePath { get; } = Path.Combine(Path.GetTempPath(), $"packdesigner-test-{Guid.NewGuid():N}.db");

    protected override Task<StorageSettings> CreateSettingsAsync() => Task.FromResult(StorageSettings.ForSqliteFile(FilePath));

    // SQLite waits for a lock up to the connection's default timeout as well as the command's.
    protected override StorageSettings WithCommandTimeout(int seconds) => StorageSettings.ForSqliteFile(FilePath, seconds);

    public override Task DisposeAsync()
    {
        SqliteConnection.ClearAllPools();
        foreach (var suffix in new[] { "", "-wal", "-shm", "-journal" })
        {
            File.Delete(FilePath + suffix);
        }

        return Task.CompletedTask;
    }
}

/// <summary>A database with a GUID name on the test PostgreSQL server (see <see cref="PostgresServer"/>).</summary>
public sealed class PostgresTestDatabase : TestDatabase
{
    public override StorageProvider Provider => StorageProvider.Postgres;

    public string DatabaseName { get; } = $"packdesigner_test_{Guid.NewGuid():N}";

    protected override Task<StorageSettings> CreateSettingsAsync() =>
        Task.FromResult(StorageSettings.ForPostgres(PostgresServer.For(DatabaseName)));

    protected override StorageSettings WithCommandTimeout(int seconds) => Settings with { CommandTimeoutSeconds = seconds };

    public override async Task DisposeAsync()
    {
        if (Settings is null)
        {
            return;
        }

        NpgsqlConnection.ClearAllPools();
        await using var connection = new NpgsqlConnection(PostgresServer.For("postgres"));
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{DatabaseName}\" WITH (FORCE)", connection);
        await command.ExecuteNonQueryAsync();
    }
}
