using System.Data.Common;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Npgsql;
using PackDesigner.Web.Pages.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.Infrastructure;
using PackDesigner.Web.Tests.Pages;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests;

/// <summary>
/// SQLite that stops answering in the middle of a run: another connection holds the write lock, and the app's
/// commands give up after one second. Saves answer 503, store nothing, and work again once the lock is gone.
/// </summary>
public sealed class StorageOutageSqliteWebTests(StorageOutageSqliteWebTests.Factory factory) : IClassFixture<StorageOutageSqliteWebTests.Factory>
{
    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    [Fact]
    public async Task Save_DatabaseLocked_Answers503StoresNothingAndRecovers()
    {
        var id = await _client.NewDesignIdAsync("Before the outage " + Guid.NewGuid());
        var edit = await DesignPage.OpenAsync(_client, DesignRoutes.Edit(id));
        var before = await CountAsync();

        DesignPage page;
        ApiAnswer post, put;
        await using (await HoldWriteLockAsync())
        {
            post = await _client.CreateDesignAsync("During the outage");
            put = await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2));
            page = await edit.PressAsync(_client, "save", new Dictionary<string, string> { ["Input.Parallel"] = "4", ["Design.SavedBy"] = "Eve" });
        }

        Assert.Equal(503, post.Status);
        Assert.Equal("application/problem+json", post.MediaType);
        Assert.Equal("Storage unavailable.", post.Body.GetProperty("title").GetString());
        Assert.Equal(503, put.Status);
        Assert.Equal(503, page.Status);
        Assert.NotNull(page.ByTestId("storage-unavailable"));
        Assert.Equal("4", page.Value("Input.Parallel"));
        Assert.Equal(before, await CountAsync());

        // Recovery without a restart.
        Assert.Equal(201, (await _client.CreateDesignAsync("After the outage")).Status);
        Assert.Equal(302, (await edit.PressAsync(_client, "save", new Dictionary<string, string> { ["Input.Parallel"] = "4", ["Design.SavedBy"] = "Eve" })).Status);
    }

    private async Task<DbConnection> HoldWriteLockAsync()
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = factory.SqlitePath, Pooling = false }.ConnectionString);
        await connection.OpenAsync();
        await using var command = connection.CreateCommand();
        command.CommandText = "BEGIN IMMEDIATE;";
        await command.ExecuteNonQueryAsync();
        return connection;
    }

    private async Task<long> CountAsync()
    {
        await using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = factory.SqlitePath, Pooling = false }.ConnectionString);
        await connection.OpenAsync();
        await using var command = connection.CreateCommand();
        command.CommandText = "SELECT (SELECT count(*) FROM designs) + (SELECT count(*) FROM design_revisions) + (SELECT count(*) FROM design_revision_status_changes)";
        return (long)(await command.ExecuteScalarAsync())!;
    }

    /// <summary>The app with a one-second command timeout (SQLite: also the wait for a lock).</summary>
    public sealed class Factory : IsolatedAppFactory
    {
        protected override void ConfigureTestHost(IWebHostBuilder builder) => builder.UseSetting("Storage:CommandTimeoutSeconds", "1");
    }
}

/// <summary>
/// PostgreSQL taken away from the running app and given back, through a <see cref="TcpRelay"/> between them: the
/// app answers 503 (pages and API), /healthz says unhealthy, nothing is half-written, and it recovers by itself.
/// </summary>
public sealed class StorageOutagePostgresWebTests : IPostgresTests
{
    [ProviderFact]
    public async Task Requests_DatabaseGoesAwayMidRun_Answer503AndRecoverWithoutRestart()
    {
        using var factory = new RelayedPostgresAppFactory();
        using var client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });
        var id = await client.NewDesignIdAsync("Relayed " + Guid.NewGuid());
        var before = await factory.CountAsync();

        factory.Relay.Cut();
        var post = await client.CreateDesignAsync("While it is away");
        var list = await client.GetAnswerAsync(DesignRoutes.Api);
        var page = await DesignPage.OpenAsync(client, DesignRoutes.List);
        var health = await client.GetAnswerAsync("/healthz");
        var form = await DesignPage.OpenAsync(client, "/");
        factory.Relay.Restore();

        Assert.Equal(503, post.Status);
        Assert.Equal("Storage unavailable.", post.Body.GetProperty("title").GetString());
        Assert.Equal(503, list.Status);
        Assert.Equal(503, page.Status);
        Assert.Equal("503", page.ByTestId("error-page")!.GetAttribute("data-status"));
        Assert.Contains("Storage unavailable", page.Document.QuerySelector("h1")!.TextContent);
        Assert.Equal(503, health.Status);
        Assert.Equal("unhealthy", health.Body.GetProperty("database").GetProperty("status").GetString());
        Assert.Equal(200, form.Status);
        Assert.Equal(before, await factory.CountAsync());

        Assert.Equal(200, (await client.GetAnswerAsync(DesignRoutes.ApiDesign(id))).Status);
        Assert.Equal(201, (await client.CreateDesignAsync("After it came back")).Status);
        Assert.Equal(200, (await client.GetAnswerAsync("/healthz")).Status);
    }

    [ProviderFact]
    public async Task Start_DatabaseDown_AppStartsAndMigratesOnceItIsBack()
    {
        using var factory = new RelayedPostgresAppFactory();
        factory.Relay.Cut();

        using var client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });
        var form = await DesignPage.OpenAsync(client, "/");
        var evaluate = await client.EvaluateAsync(DesignRequestBuilder.Valid());
        var list = await DesignPage.OpenAsync(client, DesignRoutes.List);
        var health = await client.GetAnswerAsync("/healthz");
        factory.Relay.Restore();

        Assert.Equal(200, form.Status);
        Assert.Equal(200, evaluate.Status);
        Assert.Equal(503, list.Status);
        Assert.Equal(503, health.Status);
        Assert.Equal(200, (await DesignPage.OpenAsync(client, DesignRoutes.List)).Status);
        Assert.Equal(201, (await client.CreateDesignAsync("First design after start-up")).Status);
        Assert.Equal(200, (await client.GetAnswerAsync("/healthz")).Status);
    }

    /// <summary>The PostgreSQL app factory with a relay between the app and the server.</summary>
    private sealed class RelayedPostgresAppFactory : PostgresAppFactory
    {
        private TcpRelay? _relay;

        public TcpRelay Relay => _relay ??= CreateRelay();

        protected override string ConnectionString() =>
            new NpgsqlConnectionStringBuilder(PostgresServer.For(DatabaseName)) { Host = "127.0.0.1", Port = Relay.Port }.ConnectionString;

        /// <summary>Rows of the design tables, counted past the relay.</summary>
        public async Task<long> CountAsync()
        {
            await using var connection = new NpgsqlConnection(PostgresServer.For(DatabaseName));
            await connection.OpenAsync();
            await using var command = new NpgsqlCommand(
                "SELECT (SELECT count(*) FROM designs) + (SELECT count(*) FROM design_revisions) + (SELECT count(*) FROM design_revision_status_changes)", connection);
            return (long)(await command.ExecuteScalarAsync())!;
        }

        private TcpRelay CreateRelay()
        {
            var server = new NpgsqlConnectionStringBuilder(PostgresServer.BaseConnectionString);
            return new TcpRelay(server.Host!, server.Port);
        }

        protected override void Dispose(bool disposing)
        {
            _relay?.Restore();
            base.Dispose(disposing);
            _relay?.Dispose();
        }
    }
}
