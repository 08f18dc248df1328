using System.Data.Common;
using System.Globalization;
using Microsoft.Extensions.Configuration;
using Npgsql;

namespace PackDesigner.Data.DependencyInjection;

/// <summary>Which database the app uses.</summary>
public enum StorageProvider
{
    Sqlite,
    Postgres,
}

/// <summary>
/// Storage settings read from configuration:
/// <list type="bullet">
/// <item><c>ConnectionStrings:Postgres</c> (env <c>ConnectionStrings__Postgres</c>): when set, PostgreSQL is used.</item>
/// <item><c>Storage:SqlitePath</c>: the SQLite file otherwise; relative paths are under the content root.
/// Default <c>App_Data/packdesigner.db</c>.</item>
/// <item><c>Storage:ConnectTimeoutSeconds</c> (default 5) and <c>Storage:CommandTimeoutSeconds</c> (default 30).</item>
/// </list>
/// </summary>
public sealed record StorageSettings(StorageProvider Provider, string ConnectionString, string? SqlitePath, int CommandTimeoutSeconds)
{
    public const string PostgresConnectionStringName = "Postgres";
    public const string SqlitePathKey = "Storage:SqlitePath";
    public const string ConnectTimeoutKey = "Storage:ConnectTimeoutSeconds";
    public const string CommandTimeoutKey = "Storage:CommandTimeoutSeconds";
    public const string DefaultSqlitePath = "App_Data/packdesigner.db";
    public const int DefaultConnectTimeoutSeconds = 5;
    public const int DefaultCommandTimeoutSeconds = 30;

    public const string SqliteMigrationsAssembly = "PackDesigner.Data.Migrations.Sqlite";
    public const string PostgresMigrationsAssembly = "PackDesigner.Data.Migrations.Postgres";

    /// <summary>Reads the settings; <paramref name="contentRootPath"/> anchors a relative SQLite path.</summary>
    /// <exception cref="InvalidOperationException">A timeout setting is not a whole number of seconds from 1 to 600.</exception>
    public static StorageSettings FromConfiguration(IConfiguration configuration, string contentRootPath)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var commandTimeout = ReadSeconds(configuration, CommandTimeoutKey, DefaultCommandTimeoutSeconds);
        var postgres = configuration.GetConnectionString(PostgresConnectionStringName);
        if (!string.IsNullOrWhiteSpace(postgres))
        {
            var connectTimeout = ReadSeconds(configuration, ConnectTimeoutKey, DefaultConnectTimeoutSeconds);
            return ForPostgres(postgres, connectTimeout, commandTimeout);
        }

        var path = configuration[SqlitePathKey];
        path = string.IsNullOrWhiteSpace(path) ? DefaultSqlitePath : path.Trim();
        var full = Path.GetFullPath(Path.IsPathRooted(path) ? path : Path.Combine(contentRootPath, path));
        return ForSqliteFile(full, commandTimeout);
    }

    /// <summary>
    /// PostgreSQL settings. The connect timeout is applied unless the connection string sets <c>Timeout</c> itself:
    /// a down server then fails a request within seconds instead of Npgsql's default 15 s. No retry strategy.
    /// </summary>
    public static StorageSettings ForPostgres(string connectionString, int connectTimeoutSeconds = DefaultConnectTimeoutSeconds,
        int commandTimeoutSeconds = DefaultCommandTimeoutSeconds)
    {
        var builder = new NpgsqlConnectionStringBuilder(connectionString);
        var given = new DbConnectionStringBuilder { ConnectionString = connectionString };
        if (!given.ContainsKey("Timeout"))
        {
            builder.Timeout = connectTimeoutSeconds;
        }

        return new StorageSettings(StorageProvider.Postgres, builder.ConnectionString, null, commandTimeoutSeconds);
    }

    /// <summary>SQLite settings for a file (its directory is created at start-up).</summary>
    public static StorageSettings ForSqliteFile(string path, int commandTimeoutSeconds = DefaultCommandTimeoutSeconds)
    {
        var full = Path.GetFullPath(path);
        var cs = new Microsoft.Data.Sqlite.SqliteConnectionStringBuilder
        {
            DataSource = full,
            Mode = Microsoft.Data.Sqlite.SqliteOpenMode.ReadWriteCreate,
            Pooling = true,
            DefaultTimeout = commandTimeoutSeconds,
        };
        return new StorageSettings(StorageProvider.Sqlite, cs.ConnectionString, full, commandTimeoutSeconds);
    }

    /// <summary>Where the data is, for the start-up log: the SQLite path, or host, port and database (never the password).</summary>
    public string Describe()
    {
        if (Provider == StorageProvider.Sqlite)
        {
            return $"SQLite file {SqlitePath}";
        }

        var b = new NpgsqlConnectionStringBuilder(ConnectionString);
        return string.Create(CultureInfo.InvariantCulture, $"PostgreSQL {b.Host}:{b.Port}/{b.Database}");
    }

    /// <summary>The same as <see cref="Describe"/>: a record's default text would show the connection string and its password.</summary>
    public override string ToString() => Describe();

    private static int ReadSeconds(IConfiguration configuration, string key, int fallback)
    {
        var text = configuration[key];
        if (string.IsNullOrWhiteSpace(text))
        {
            return fallback;
        }

        if (int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var seconds) && seconds is >= 1 and <= 600)
        {
            return seconds;
        }

        throw new InvalidOperationException($"Configuration '{key}' must be a whole number of seconds from 1 to 600 (got '{text}').");
    }
}
