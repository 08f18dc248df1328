using System.Diagnostics;
using Npgsql;

namespace PackDesigner.Web.Tests.Data.Infrastructure;

/// <summary>
/// The PostgreSQL server for the tests: env <c>PACKDESIGNER_TEST_POSTGRES</c> (a base connection string such as
/// <c>Host=127.0.0.1;Port=55432;Username=postgres</c>), else the throwaway server that db/start-postgres.sh starts.
/// When neither works the PostgreSQL tests are skipped with the reason, except with env <c>CI=true</c>, where they
/// run and fail.
/// </summary>
internal static class PostgresServer
{
    public const string EnvironmentVariable = "PACKDESIGNER_TEST_POSTGRES";
    private static readonly Lazy<(string? ConnectionString, string? Problem)> State = new(Probe, LazyThreadSafetyMode.ExecutionAndPublication);

    public static bool IsCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Why the PostgreSQL tests are skipped, or null when they run (always null under CI).</summary>
    public static string? SkipReason => !IsCi && State.Value.Problem is { } p ? p : null;

    /// <summary>The base connection string (no database named).</summary>
    /// <exception cref="InvalidOperationException">No server could be reached.</exception>
    public static string BaseConnectionString => State.Value.ConnectionString
        ?? throw new InvalidOperationException("PostgreSQL tests cannot run: " + State.Value.Problem
            + (IsCi ? " (CI=true: a missing server fails these tests)" : ""));

    /// <summary>A connection string to database <paramref name="database"/> on the server.</summary>
    public static string For(string database, int? timeoutSeconds = null)
    {
        var b = new NpgsqlConnectionStringBuilder(BaseConnectionString) { Database = database };
        if (timeoutSeconds is { } t)
        {
            b.Timeout = t;
        }

        return b.ConnectionString;
    }

    private static (string?, string?) Probe()
    {
        var fromEnv = Environment.GetEnvironmentVariable(EnvironmentVariable);
        if (!string.IsNullOrWhiteSpace(fromEnv))
        {
            var problem = TryConnect(fromEnv);
            return problem is null ? (fromEnv, null) : (null, $"{EnvironmentVariable} is set but the server does not answer: {problem}");
        }

        var (started, startProblem) = StartWithScript();
        if (started is null)
        {
            return (null, $"{EnvironmentVariable} is not set and db/start-postgres.sh could not start a server: {startProblem}");
        }

        var connectProblem = TryConnect(started);
        return connectProblem is null ? (started, null) : (null, $"db/start-postgres.sh printed {started} but it does not answer: {connectProblem}");
    }

    private static string? TryConnect(string baseConnectionString)
    {
        try
        {
            var b = new NpgsqlConnectionStringBuilder(baseConnectionString) { Database = "postgres", Timeout = 5, Pooling = false };
            using var connection = new NpgsqlConnection(b.ConnectionString);
            connection.Open();
            using var command = new NpgsqlCommand("SELECT 1", connection);
            command.ExecuteScalar();
            return null;
        }
        catch (Exception ex) when (ex is NpgsqlException or ArgumentException or InvalidOperationException or TimeoutException)
        {
            return ex.Message;
        }
    }

    private static (string?, string?) StartWithScript()
    {
        var script = Path.Combine(RepositoryRoot.Path, "db", "start-postgres.sh");
        if (!File.Exists(script))
        {
            return (null, "script not found at " + script);
        }

        try
        {
            var info = new ProcessStartInfo("bash", [script])
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
                WorkingDirectory = RepositoryRoot.Path,
            };
            using var process = Process.Start(info) ?? throw new InvalidOperationException("bash did not start");
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            // The first start may install PostgreSQL with apt-get.
            if (!process.WaitForExit(TimeSpan.FromMinutes(5)))
            {
                process.Kill(entireProcessTree: true);
                return (null, "the script did not finish within 5 minutes");
            }

            var lines = stdout.Result.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
            if (process.ExitCode != 0 || lines.Length == 0)
            {
                var tail = stderr.Result.Trim();
                return (null, $"exit code {process.ExitCode}: {(tail.Length > 400 ? tail[^400..] : tail)}");
            }

            return (lines[^1], null);
        }
        catch (Exception ex) when (ex is System.ComponentModel.Win32Exception or InvalidOperationException or IOException)
        {
            return (null, ex.Message);
        }
    }
}
