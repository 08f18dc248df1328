using System.Text.Json;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;
using Npgsql;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.Infrastructure;

namespace PackDesigner.Web.Tests;

/// <summary>
/// The app in memory on its own SQLite file (deleted on dispose), so test classes never share a database.
/// Subclasses add their own services or settings in <see cref="ConfigureTestHost"/>.
/// </summary>
public class IsolatedAppFactory : WebApplicationFactory<Program>
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pd-web-" + Guid.NewGuid().ToString("N"));

    public string SqlitePath => Path.Combine(_dir, "app.db");

    protected sealed override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(_dir);
        builder.UseSetting("Storage:SqlitePath", SqlitePath);
        ConfigureTestHost(builder);
    }

    protected virtual void ConfigureTestHost(IWebHostBuilder builder)
    {
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        SqliteConnection.ClearAllPools();
        try
        {
            Directory.Delete(_dir, recursive: true);
        }
        catch (IOException)
        {
            // Left under TMPDIR if a handle is still open.
        }
    }
}

/// <summary>The app in memory. Each test class gets its own instance through <see cref="IClassFixture{TFixture}"/>.</summary>
public sealed class PackDesignerFactory : IsolatedAppFactory
{
    /// <summary>The JSON options the API itself uses, to serialize Core results for comparison.</summary>
    public JsonSerializerOptions ApiJsonOptions =>
        Services.GetRequiredService<IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions>>().Value.SerializerOptions;
}

/// <summary>
/// The app in memory on its own PostgreSQL database (a GUID name on the test server, see <see cref="PostgresServer"/>),
/// created by the app's own migration at start-up and dropped on dispose. Nothing touches the server until the
/// first client or service is asked for, so a class whose tests are skipped never needs it.
/// </summary>
public class PostgresAppFactory : IsolatedAppFactory
{
    public string DatabaseName { get; } = $"packdesigner_web_{Guid.NewGuid():N}";

    private bool _used;

    /// <summary>The connection string the app gets; a subclass may route it elsewhere (see <see cref="TcpRelay"/>).</summary>
    protected virtual string ConnectionString() => PostgresServer.For(DatabaseName);

    protected override void ConfigureTestHost(IWebHostBuilder builder)
    {
        _used = true;
        builder.UseSetting("ConnectionStrings:Postgres", ConnectionString());
        builder.UseSetting("Storage:ConnectTimeoutSeconds", "3");
        ConfigurePostgresHost(builder);
    }

    protected virtual void ConfigurePostgresHost(IWebHostBuilder builder)
    {
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (!disposing || !_used)
        {
            return;
        }

        NpgsqlConnection.ClearAllPools();
        using var connection = new NpgsqlConnection(PostgresServer.For("postgres"));
        connection.Open();
        using var command = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{DatabaseName}\" WITH (FORCE)", connection);
        command.ExecuteNonQuery();
    }
}
