using System.Collections.Concurrent;
using System.Data.Common;
using Microsoft.AspNetCore.Hosting;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using PackDesigner.Core.Design;
using PackDesigner.Data;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Reports.Model;
using PackDesigner.Web.Pages.Sheets;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>
/// The app on its own SQLite file, with the log kept in memory and a switch that makes every new database
/// connection time out (as an unreachable server would). Seeds designs through the app's own <see cref="DesignStore"/>.
/// </summary>
public sealed class SheetAppFactory : IsolatedAppFactory
{
    private readonly OutageSwitch _outage = new();

    public LogSink Logs { get; } = new();

    /// <summary>While true, opening a database connection fails with a timeout.</summary>
    public bool StorageDown
    {
        get => _outage.Down;
        set => _outage.Down = value;
    }

    protected override void ConfigureTestHost(IWebHostBuilder builder) => builder.ConfigureServices(services =>
    {
        services.AddSingleton<ILoggerProvider>(Logs);
        services.ConfigureDbContext<PackDesignerDbContext>(o => o.AddInterceptors(_outage));
    });

    /// <summary>A design with revision 1 of <paramref name="input"/>, with a customer and job when their names are given.</summary>
    public async Task<DesignDetails> CreateDesignAsync(string name, DesignInput input, string? customer = null, string? job = null)
    {
        await using var scope = Services.CreateAsyncScope();
        int? customerId = null;
        int? jobId = null;
        if (customer is not null)
        {
            var customers = scope.ServiceProvider.GetRequiredService<CustomerService>();
            customerId = Ok(await customers.CreateAsync(new CustomerData(customer + " " + Guid.NewGuid().ToString("N")[..6]))).Id;
            if (job is not null)
            {
                jobId = Ok(await customers.CreateJobAsync(customerId.Value, new JobData(job))).Id;
            }
        }

        var store = scope.ServiceProvider.GetRequiredService<DesignStore>();
        return Ok(await store.CreateDesignAsync(name, customerId, jobId, null, input, "Test designer"));
    }

    public async Task<DesignDetails> SaveRevisionAsync(int designId, int basedOn, DesignInput input)
    {
        await using var scope = Services.CreateAsyncScope();
        return Ok(await scope.ServiceProvider.GetRequiredService<DesignStore>().SaveRevisionAsync(designId, basedOn, input, "Test designer"));
    }

    public async Task ChangeStatusAsync(int designId, int revision, RevisionStatus status, string by)
    {
        await using var scope = Services.CreateAsyncScope();
        Ok(await scope.ServiceProvider.GetRequiredService<DesignStore>().ChangeStatusAsync(designId, revision, status, by));
    }

    /// <summary>
    /// Appends a revision written directly through the DbContext, as an older build (or a bug) could have left it:
    /// a copy of revision 1 with the given calculation version and result JSON. Returns its number.
    /// </summary>
    public async Task<int> InsertRevisionAsync(int designId, string calculationVersion, Func<string, string>? changeResultJson = null)
    {
        await using var scope = Services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        var design = await db.Designs.SingleAsync(d => d.Id == designId);
        var first = await db.DesignRevisions.AsNoTracking().SingleAsync(r => r.DesignId == designId && r.Number == 1);
        var number = design.LatestRevisionNumber + 1;
        var created = first.CreatedUtc.AddMinutes(5);
        var revision = new DesignRevision
        {
            DesignId = designId,
            Number = number,
            InputJson = first.InputJson,
            InputSha256 = first.InputSha256,
            ResultJson = changeResultJson?.Invoke(first.ResultJson) ?? first.ResultJson,
            CalculationVersion = calculationVersion,
            Series = first.Series,
            Parallel = first.Parallel,
            Status = RevisionStatus.Draft,
            CreatedUtc = created,
            CreatedBy = "Older build",
        };
        revision.StatusChanges.Add(new DesignRevisionStatusChange { Sequence = 1, Status = RevisionStatus.Draft, ChangedBy = "Older build", ChangedUtc = created });
        db.DesignRevisions.Add(revision);
        design.LatestRevisionNumber = number;
        await db.SaveChangesAsync();
        return number;
    }

    /// <summary>The model the app builds for a revision, to compare what it serves against.</summary>
    public async Task<DesignSheetModel> ModelAsync(int designId, int revision)
    {
        await using var scope = Services.CreateAsyncScope();
        var sheet = await scope.ServiceProvider.GetRequiredService<RevisionSheetService>().LoadAsync(designId, revision);
        Assert.Equal(RevisionSheetState.Ready, sheet.State);
        return sheet.Model!;
    }

    public async Task<RevisionDetails> RevisionAsync(int designId, int revision)
    {
        await using var scope = Services.CreateAsyncScope();
        return Ok(await scope.ServiceProvider.GetRequiredService<DesignStore>().GetRevisionAsync(designId, revision));
    }

    private static T Ok<T>(PackDesigner.Data.Results.StoreResult<T> result)
    {
        Assert.True(result.IsOk, $"{result.Status}: {result.Message} {string.Join("; ", result.Errors.Select(e => e.Field + ": " + e.Message))}");
        return result.Value!;
    }

    private sealed class OutageSwitch : DbConnectionInterceptor
    {
        public volatile bool Down;

        public override InterceptionResult ConnectionOpening(DbConnection connection, ConnectionEventData eventData, InterceptionResult result) =>
            Down ? throw new TimeoutException("Test outage: the database does not answer.") : result;

        public override ValueTask<InterceptionResult> ConnectionOpeningAsync(DbConnection connection, ConnectionEventData eventData,
            InterceptionResult result, CancellationToken cancellationToken = default) =>
            Down ? throw new TimeoutException("Test outage: the database does not answer.") : ValueTask.FromResult(result);
    }
}

/// <summary>Every log entry of the app: level, category, message and exception.</summary>
public sealed class LogSink : ILoggerProvider
{
    private readonly ConcurrentQueue<(LogLevel Level, string Category, string Message, Exception? Exception)> _entries = new();

    public IReadOnlyList<(LogLevel Level, string Category, string Message, Exception? Exception)> Entries => _entries.ToArray();

    public ILogger CreateLogger(string categoryName) => new Logger(this, categoryName);

    public void Dispose()
    {
    }

    private sealed class Logger(LogSink sink, string category) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state)
            where TState : notnull => null;

        public bool IsEnabled(LogLevel logLevel) => logLevel >= LogLevel.Warning;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            if (IsEnabled(logLevel))
            {
                sink._entries.Enqueue((logLevel, category, formatter(state, exception), exception));
            }
        }
    }
}
