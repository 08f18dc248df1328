using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Npgsql;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Designs;

namespace PackDesigner.Web.Tests.Data;

public sealed class DataServiceCollectionExtensionsTests : IDisposable
{
    private readonly string _contentRoot = Path.Combine(Path.GetTempPath(), "pd-root-" + Guid.NewGuid().ToString("N"));

    [Fact]
    public void AddPackDesignerData_NoPostgresConnectionString_UsesSqliteUnderTheContentRoot()
    {
        using var services = Build([]);
        using var scope = services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();

        Assert.Equal("Microsoft.EntityFrameworkCore.Sqlite", db.Database.ProviderName);
        Assert.Equal(StorageSettings.SqliteMigrationsAssembly, db.GetService<IMigrationsAssembly>().Assembly.GetName().Name);
        Assert.Equal(Path.Combine(_contentRoot, "App_Data", "packdesigner.db"), services.GetRequiredService<StorageSettings>().SqlitePath);
        Assert.NotNull(scope.ServiceProvider.GetRequiredService<DesignStore>());
        Assert.NotNull(scope.ServiceProvider.GetRequiredService<CustomerService>());
        Assert.NotNull(scope.ServiceProvider.GetRequiredService<CellLibrary>());
    }

    [Fact]
    public void AddPackDesignerData_PostgresConnectionString_UsesNpgsqlWithItsMigrationsAndAShortConnectTimeout()
    {
        using var services = Build(new() { ["ConnectionStrings:Postgres"] = "Host=db.invalid;Database=pd;Username=app;Password=secret" });
        using var scope = services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        var settings = services.GetRequiredService<StorageSettings>();

        Assert.Equal("Npgsql.EntityFrameworkCore.PostgreSQL", db.Database.ProviderName);
        Assert.Equal(StorageSettings.PostgresMigrationsAssembly, db.GetService<IMigrationsAssembly>().Assembly.GetName().Name);
        Assert.Equal(StorageSettings.DefaultConnectTimeoutSeconds, new NpgsqlConnectionStringBuilder(settings.ConnectionString).Timeout);
        Assert.Null(db.Database.CreateExecutionStrategy().RetriesOnFailure ? "retrying" : null);
        Assert.Equal("PostgreSQL db.invalid:5432/pd", settings.Describe());
    }

    [Fact]
    public void ToString_PostgresSettings_NeverShowsThePassword()
    {
        var settings = StorageSettings.ForPostgres("Host=h;Database=d;Username=u;Password=hunter2-secret");

        Assert.DoesNotContain("hunter2", settings.ToString(), StringComparison.Ordinal);
        Assert.DoesNotContain("hunter2", settings.Describe(), StringComparison.Ordinal);
    }

    [Fact]
    public void FromConfiguration_TimeoutInConnectionString_IsKept()
    {
        var settings = StorageSettings.FromConfiguration(Config(new()
        {
            ["ConnectionStrings:Postgres"] = "Host=h;Timeout=2",
            ["Storage:CommandTimeoutSeconds"] = "7",
        }), _contentRoot);

        Assert.Equal(2, new NpgsqlConnectionStringBuilder(settings.ConnectionString).Timeout);
        Assert.Equal(7, settings.CommandTimeoutSeconds);
    }

    [Fact]
    public void FromConfiguration_ConnectTimeoutSetting_IsApplied()
    {
        var settings = StorageSettings.FromConfiguration(Config(new()
        {
            ["ConnectionStrings:Postgres"] = "Host=h",
            ["Storage:ConnectTimeoutSeconds"] = "3",
        }), _contentRoot);

        Assert.Equal(3, new NpgsqlConnectionStringBuilder(settings.ConnectionString).Timeout);
    }

    [Theory]
    [InlineData("data/shop.db", "data/shop.db")]
    [InlineData("  ", "App_Data/packdesigner.db")]
    public void FromConfiguration_RelativeSqlitePath_IsUnderTheContentRoot(string configured, string expected)
    {
        var settings = StorageSettings.FromConfiguration(Config(new() { ["Storage:SqlitePath"] = configured }), _contentRoot);

        Assert.Equal(StorageProvider.Sqlite, settings.Provider);
        Assert.Equal(Path.GetFullPath(Path.Combine(_contentRoot, expected)), settings.SqlitePath);
    }

    [Fact]
    public void FromConfiguration_AbsoluteSqlitePath_IsKept()
    {
        var path = Path.Combine(Path.GetTempPath(), "elsewhere", "pd.db");

        var settings = StorageSettings.FromConfiguration(Config(new() { ["Storage:SqlitePath"] = path }), _contentRoot);

        Assert.Equal(path, settings.SqlitePath);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("ten")]
    [InlineData("1.5")]
    public void FromConfiguration_BadTimeout_NamesTheKey(string value)
    {
        var e = Assert.Throws<InvalidOperationException>(() =>
            StorageSettings.FromConfiguration(Config(new() { ["Storage:CommandTimeoutSeconds"] = value }), _contentRoot));

        Assert.Contains("Storage:CommandTimeoutSeconds", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task MigratePackDesignerDatabase_Sqlite_CreatesTheFolderMigratesAndLogsThePath()
    {
        var logs = new ListLoggerProvider();
        await using var services = new ServiceCollection()
            .AddLogging(b => b.AddProvider(logs))
            .AddPackDesignerData(Config([]), _contentRoot)
            .BuildServiceProvider();

        await services.MigratePackDesignerDatabaseAsync();
        await services.MigratePackDesignerDatabaseAsync();

        var path = Path.Combine(_contentRoot, "App_Data", "packdesigner.db");
        Assert.True(File.Exists(path));
        Assert.Contains(logs.Messages, m => m.Contains(path, StringComparison.Ordinal));
        Assert.Contains("Design storage ready: 1 migration(s) applied", logs.Messages);
        Assert.Contains("Design storage ready: 0 migration(s) applied", logs.Messages);
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        Assert.Empty(await db.Database.GetPendingMigrationsAsync());
        Assert.Equal("wal", (await db.Database.SqlQueryRaw<string>("SELECT journal_mode AS \"Value\" FROM pragma_journal_mode").ToListAsync()).Single());
    }

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        if (Directory.Exists(_contentRoot))
        {
            Directory.Delete(_contentRoot, recursive: true);
        }
    }

    private ServiceProvider Build(Dictionary<string, string?> values) =>
        new ServiceCollection().AddLogging().AddPackDesignerData(Config(values), _contentRoot).BuildServiceProvider();

    private static IConfiguration Config(Dictionary<string, string?> values) =>
        new ConfigurationBuilder().AddInMemoryCollection(values).Build();

    private sealed class ListLoggerProvider : ILoggerProvider
    {
        private readonly List<string> _messages = [];

        public IReadOnlyList<string> Messages
        {
            get
            {
                lock (_messages)
                {
                    return [.. _messages];
                }
            }
        }

        public ILogger CreateLogger(string categoryName) => new ListLogger(this);

        public void Dispose()
        {
        }

        private sealed class ListLogger(ListLoggerProvider owner) : ILogger
        {
            public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;

            public bool IsEnabled(LogLevel logLevel) => true;

            public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
            {
                lock (owner._messages)
                {
                    owner._messages.Add(formatter(state, exception));
                }
            }
        }
    }
}
