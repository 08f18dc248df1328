using System.Text.Json;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;

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
