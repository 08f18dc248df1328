using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using Microsoft.Extensions.Logging;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Storage;

namespace PackDesigner.Data.DependencyInjection;

/// <summary>Registers the data layer and migrates the database at start-up.</summary>
public static class DataServiceCollectionExtensions
{
    /// <summary>
    /// Adds <see cref="PackDesignerDbContext"/>, <see cref="DesignStore"/>, <see cref="CustomerService"/> and
    /// <see cref="CellLibrary"/> (scoped) and <see cref="StorageSettings"/>. The provider is chosen from
    /// <paramref name="configuration"/> (see <see cref="StorageSettings"/>). The app must reference both
    /// migrations projects so their assemblies are deployed beside it.
    /// </summary>
    public static IServiceCollection AddPackDesignerData(this IServiceCollection services, IConfiguration configuration, string contentRootPath) =>
        services.AddPackDesignerData(StorageSettings.FromConfiguration(configuration, contentRootPath));

    /// <summary>As <see cref="AddPackDesignerData(IServiceCollection, IConfiguration, string)"/> with explicit settings.</summary>
    public static IServiceCollection AddPackDesignerData(this IServiceCollection services, StorageSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        services.AddSingleton(settings);
        services.TryAddSingleton(TimeProvider.System);
        services.AddDbContext<PackDesignerDbContext>(options => PackDesignerDbContextOptions.Configure(options, settings));
        services.AddScoped<DesignStore>();
        services.AddScoped<CustomerService>();
        services.AddScoped<CellLibrary>();
        return services;
    }

    /// <summary>
    /// Logs where the data is, creates the SQLite file's folder, and applies pending migrations with
    /// <c>Migrate()</c> (never <c>EnsureCreated</c>). Call once at start-up, before serving requests:
    /// <c>await app.Services.MigratePackDesignerDatabaseAsync();</c>
    /// </summary>
    /// <exception cref="StorageUnavailableException">The database cannot be reached.</exception>
    public static async Task MigratePackDesignerDatabaseAsync(this IServiceProvider services, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(services);
        await using var scope = services.CreateAsyncScope();
        var settings = scope.ServiceProvider.GetRequiredService<StorageSettings>();
        var logger = scope.ServiceProvider.GetRequiredService<ILoggerFactory>().CreateLogger("PackDesigner.Data");
        logger.LogInformation("Design storage: {Location}", settings.Describe());
        if (settings.SqlitePath is { } path)
        {
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        }

        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        await StorageFailure.GuardAsync(async () =>
        {
            var pending = (await db.Database.GetPendingMigrationsAsync(ct)).ToList();
            await db.Database.MigrateAsync(ct);
            if (settings.Provider == StorageProvider.Sqlite)
            {
                // Write-ahead logging lets readers go on while a revision is written; the mode is kept in the file.
                await db.Database.ExecuteSqlRawAsync("PRAGMA journal_mode=WAL;", ct);
            }

            logger.LogInformation("Design storage ready: {Count} migration(s) applied", pending.Count);
            return pending.Count;
        });
    }
}
