using Microsoft.EntityFrameworkCore;
using PackDesigner.Data.DependencyInjection;

namespace PackDesigner.Data;

/// <summary>
/// Provider set-up shared by the app and the design-time factories of the two migrations projects, so that
/// migrations are made against exactly the model the app runs.
/// </summary>
public static class PackDesignerDbContextOptions
{
    /// <summary>
    /// Npgsql with the PostgreSQL migrations assembly, or SQLite with the SQLite migrations assembly. No retry
    /// strategy: a down database fails the request at once (the connect timeout bounds the wait).
    /// </summary>
    public static DbContextOptionsBuilder Configure(DbContextOptionsBuilder options, StorageSettings settings)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(settings);
        return settings.Provider switch
        {
            StorageProvider.Postgres => options.UseNpgsql(settings.ConnectionString, o => o
                .MigrationsAssembly(StorageSettings.PostgresMigrationsAssembly)
                .CommandTimeout(settings.CommandTimeoutSeconds)),
            StorageProvider.Sqlite => options.UseSqlite(settings.ConnectionString, o => o
                .MigrationsAssembly(StorageSettings.SqliteMigrationsAssembly)
                .CommandTimeout(settings.CommandTimeoutSeconds)),
            _ => throw new ArgumentOutOfRangeException(nameof(settings), settings.Provider, "Unknown storage provider."),
        };
    }

    /// <summary>Options for a context created by hand (tests, tools).</summary>
    public static DbContextOptions<PackDesignerDbContext> Create(StorageSettings settings)
    {
        var builder = new DbContextOptionsBuilder<PackDesignerDbContext>();
        Configure(builder, settings);
        return builder.Options;
    }
}
