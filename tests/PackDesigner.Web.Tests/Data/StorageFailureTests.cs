using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Npgsql;
using PackDesigner.Data;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Storage;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

/// <summary>Telling "the database is down" apart from bugs and constraint errors.</summary>
public sealed class StorageFailureTests
{
    [Theory]
    [InlineData("08006", true)] // connection_failure
    [InlineData("08001", true)] // sqlclient_unable_to_establish_sqlconnection
    [InlineData("53300", true)] // too_many_connections
    [InlineData("57P01", true)] // admin_shutdown
    [InlineData("57P03", true)] // cannot_connect_now
    [InlineData("28P01", true)] // invalid_password
    [InlineData("3D000", true)] // invalid_catalog_name
    [InlineData("23505", false)] // unique_violation
    [InlineData("P0001", false)] // raise_exception (the append-only trigger)
    [InlineData("40001", false)] // serialization_failure
    public void IsUnavailable_PostgresErrorCode_ClassifiesByClass(string sqlState, bool unavailable)
    {
        // SQLSTATE codes from the PostgreSQL manual, Appendix A.
        var error = new PostgresException("message", "ERROR", "ERROR", sqlState);

        Assert.Equal(unavailable, StorageFailure.IsUnavailable(new DbUpdateException("save failed", error)));
    }

    [Theory]
    [InlineData(5, true)] // SQLITE_BUSY
    [InlineData(10, true)] // SQLITE_IOERR
    [InlineData(14, true)] // SQLITE_CANTOPEN
    [InlineData(19, false)] // SQLITE_CONSTRAINT
    [InlineData(1, false)] // SQLITE_ERROR (for example RAISE(ABORT) from a trigger)
    public void IsUnavailable_SqliteErrorCode_ClassifiesByCode(int code, bool unavailable)
    {
        // Result codes from https://www.sqlite.org/rescode.html.
        Assert.Equal(unavailable, StorageFailure.IsUnavailable(new SqliteException("message", code)));
    }

    [Fact]
    public void IsUnavailable_TimeoutOrSocketDeepInside_IsUnavailable()
    {
        Assert.True(StorageFailure.IsUnavailable(new InvalidOperationException("outer", new NpgsqlException("read", new TimeoutException()))));
        Assert.True(StorageFailure.IsUnavailable(new DbUpdateException("x", new IOException("io", new SocketException((int)SocketError.ConnectionReset)))));
        Assert.False(StorageFailure.IsUnavailable(new InvalidOperationException("a bug")));
        Assert.False(StorageFailure.IsUnavailable(new DbUpdateConcurrencyException("stale")));
        Assert.False(StorageFailure.IsUnavailable(null));
    }

    [Fact]
    public async Task DesignStore_PostgresOnAClosedPort_ThrowsStorageUnavailableQuickly()
    {
        var settings = StorageSettings.ForPostgres($"Host=127.0.0.1;Port={ClosedPort()};Username=postgres;Database=nowhere");
        await using var db = new PackDesignerDbContext(PackDesignerDbContextOptions.Create(settings));
        var store = new DesignStore(db, TimeProvider.System);
        var watch = Stopwatch.StartNew();

        var create = await Assert.ThrowsAsync<StorageUnavailableException>(() =>
            store.CreateDesignAsync("Down", null, null, null, TestDesigns.Valid(), "a"));
        var list = await Assert.ThrowsAsync<StorageUnavailableException>(() => store.ListDesignsAsync(null, DesignSort.UpdatedNewest, 1, 10));

        // Npgsql's provider wraps the failure once ("likely due to a transient failure") without retrying.
        Assert.Contains(Chain(create), e => e is NpgsqlException { IsTransient: true });
        Assert.True(StorageFailure.IsUnavailable(list));
        Assert.InRange(watch.Elapsed, TimeSpan.Zero, TimeSpan.FromSeconds(StorageSettings.DefaultConnectTimeoutSeconds * 2));
    }

    [Fact]
    public async Task DesignStore_SqliteFileThatCannotBeOpened_ThrowsStorageUnavailable()
    {
        var settings = StorageSettings.ForSqliteFile(Path.Combine(Path.GetTempPath(), "no-such-folder-" + Guid.NewGuid(), "x.db"));
        await using var db = new PackDesignerDbContext(PackDesignerDbContextOptions.Create(settings));

        var e = await Assert.ThrowsAsync<StorageUnavailableException>(() =>
            new DesignStore(db, TimeProvider.System).CreateDesignAsync("Down", null, null, null, TestDesigns.Valid(), "a"));

        Assert.Equal(14, Assert.IsType<SqliteException>(e.InnerException).SqliteErrorCode);
    }

    [Fact]
    public async Task MigrateAtStartUp_PostgresDown_ThrowsStorageUnavailable()
    {
        var config = new ConfigurationBuilder()
            .AddInMemoryCollection(new Dictionary<string, string?> { ["ConnectionStrings:Postgres"] = $"Host=127.0.0.1;Port={ClosedPort()};Username=postgres" })
            .Build();
        await using var services = new ServiceCollection().AddLogging().AddPackDesignerData(config, Path.GetTempPath()).BuildServiceProvider();

        await Assert.ThrowsAsync<StorageUnavailableException>(() => services.MigratePackDesignerDatabaseAsync());
    }

    private static IEnumerable<Exception> Chain(Exception e)
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
        {
            yield return x;
        }
    }

    private static int ClosedPort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        var port = ((IPEndPoint)listener.LocalEndpoint).Port;
        listener.Stop();
        return port;
    }
}
