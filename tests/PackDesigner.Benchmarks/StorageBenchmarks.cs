using System.Diagnostics;
using BenchmarkDotNet.Attributes;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;
using PackDesigner.Web.Storage;

namespace PackDesigner.Benchmarks;

/// <summary>
/// Storage on a local PostgreSQL (db/start-postgres.sh with PGTEST_DIR=/tmp/pd-pg-bench, port 55434; fsync off, as
/// for the tests), seeded once with 10 000 designs. Targets: saving a revision ≤ 5 ms median; the designs list page
/// (query and render, through the whole app in memory) ≤ 50 ms median. Run in-process, because the app is hosted by
/// WebApplicationFactory (its type argument only names the web app's assembly):
/// <c>dotnet run -c Release --project tests/PackDesigner.Benchmarks -- --filter '*Storage*' --job short --inProcess</c>.
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class StorageBenchmarks
{
    public const int DesignCount = 10_000;
    private const string Database = "packdesigner_bench";

    private ServiceProvider _services = null!;
    private WebApplicationFactory<StorageGate> _app = null!;
    private HttpClient _client = null!;
    private DesignInput _input = null!;
    private int _designId;
    private int _latest;

    [GlobalSetup]
    public void Setup()
    {
        var connection = StartPostgres() + ";Database=" + Database;
        _services = new ServiceCollection()
            .AddLogging(b => b.SetMinimumLevel(LogLevel.Warning))
            .AddPackDesignerData(StorageSettings.ForPostgres(connection))
            .BuildServiceProvider();
        _services.MigratePackDesignerDatabaseAsync().GetAwaiter().GetResult();
        SeedAsync().GetAwaiter().GetResult();
        _input = DemoScenario.PickupConversion;
        using (var scope = _services.CreateScope())
        {
            var created = scope.ServiceProvider.GetRequiredService<DesignStore>()
                .CreateDesignAsync("Benchmark save target " + Guid.NewGuid(), null, null, null, _input, "bench").GetAwaiter().GetResult();
            _designId = created.Value!.Id;
            _latest = 1;
        }

        // WebApplicationFactory looks for the web project beside the solution otherwise.
        Environment.SetEnvironmentVariable("ASPNETCORE_TEST_CONTENTROOT_PACKDESIGNER_WEB", Path.Combine(FindRoot(), "src", "PackDesigner.Web"));
        _app = new WebApplicationFactory<StorageGate>().WithWebHostBuilder(b =>
        {
            b.UseSetting("ConnectionStrings:Postgres", connection);
            b.UseSetting("Logging:LogLevel:Default", "Warning");
            b.UseSetting("Logging:LogLevel:Microsoft.EntityFrameworkCore", "Warning");
        });
        _client = _app.CreateClient();
        // Warm the page and its query once.
        _client.GetStringAsync("/designs").GetAwaiter().GetResult();
    }

    [GlobalCleanup]
    public void Cleanup()
    {
        _client.Dispose();
        _app.Dispose();
        _services.Dispose();
    }

    /// <summary>One revision: evaluate, serialize, hash, insert design update + revision + status row in one transaction.</summary>
    [Benchmark]
    public async Task<int> SaveRevision()
    {
        using var scope = _services.CreateScope();
        var saved = await scope.ServiceProvider.GetRequiredService<DesignStore>()
            .SaveRevisionAsync(_designId, _latest, _input, "bench");
        _latest = saved.Value!.LatestRevisionNumber;
        return _latest;
    }

    /// <summary>One round trip to the server (<c>SELECT 1</c> on a pooled connection): the unit the other figures are made of.</summary>
    [Benchmark(Baseline = true)]
    public async Task<int> RoundTrip()
    {
        using var scope = _services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        return await db.Database.SqlQueryRaw<int>("SELECT 1 AS \"Value\"").SingleAsync();
    }

    /// <summary>The list query alone: first page of 25 by last change, with the count.</summary>
    [Benchmark]
    public async Task<int> ListQuery()
    {
        using var scope = _services.CreateScope();
        var page = await scope.ServiceProvider.GetRequiredService<DesignStore>().ListDesignsAsync(null, DesignSort.UpdatedNewest, 1, 25);
        return page.Items.Count;
    }

    /// <summary>GET /designs through the whole app: routing, the storage gate, query, Razor render.</summary>
    [Benchmark]
    public Task<string> ListPage() => _client.GetStringAsync("/designs");

    /// <summary>GET /designs with a search over design, customer and cell names, sorted by name, page 40.</summary>
    [Benchmark]
    public Task<string> ListPageSearchSortedDeepPage() => _client.GetStringAsync("/designs?q=pack&sort=nameAscending&p=40");

    private async Task SeedAsync()
    {
        using var scope = _services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        var have = await db.Designs.CountAsync();
        if (have >= DesignCount)
        {
            return;
        }

        var customers = new List<int>();
        var service = scope.ServiceProvider.GetRequiredService<CustomerService>();
        for (var i = 0; i < 20; i++)
        {
            customers.Add((await service.CreateAsync(new CustomerData($"Bench customer {i:00}"))).Value!.Id);
        }

        var cells = new List<int>();
        var library = scope.ServiceProvider.GetRequiredService<CellLibrary>();
        for (var i = 0; i < 10; i++)
        {
            cells.Add((await library.CreateAsync(new CellData($"Bench cell {i}", DemoScenario.PickupConversion.Cell))).Value!.Id);
        }

        // Every seeded design holds one real revision: the demo input, its canonical JSON, hash and result.
        var input = DemoScenario.PickupConversion;
        var json = CanonicalDesignJson.Serialize(input);
        var hash = CanonicalDesignJson.Sha256Hex(json);
        var result = DesignEvaluator.Evaluate(input).Result!;
        var resultJson = CanonicalDesignJson.SerializeResult(result);
        var start = DateTime.UtcNow.AddDays(-400);
        db.ChangeTracker.AutoDetectChangesEnabled = false;
        for (var i = have; i < DesignCount; i++)
        {
            var when = start.AddMinutes(i * 37);
            var revision = new DesignRevision
            {
                Number = 1,
                InputJson = json,
                InputSha256 = hash,
                ResultJson = resultJson,
                CalculationVersion = result.CalculationVersion,
                Series = input.Series,
                Parallel = input.Parallel,
                Status = RevisionStatus.Draft,
                CreatedUtc = when,
                CreatedBy = "seed",
            };
            revision.StatusChanges.Add(new DesignRevisionStatusChange { Sequence = 1, Status = RevisionStatus.Draft, ChangedBy = "seed", ChangedUtc = when });
            var design = new Design
            {
                Name = $"Seeded pack {i:00000}",
                CustomerId = i % 3 == 0 ? null : customers[i % customers.Count],
                CellId = i % 4 == 0 ? null : cells[i % cells.Count],
                CreatedUtc = when,
                UpdatedUtc = when,
                LatestRevisionNumber = 1,
            };
            design.Revisions.Add(revision);
            db.Designs.Add(design);
            if ((i + 1) % 1000 == 0 || i == DesignCount - 1)
            {
                db.ChangeTracker.DetectChanges();
                await db.SaveChangesAsync();
                db.ChangeTracker.Clear();
            }
        }
    }

    /// <summary>Starts (or reuses) the benchmark server and returns its base connection string.</summary>
    private static string StartPostgres()
    {
        var root = FindRoot();
        var info = new ProcessStartInfo("bash", [Path.Combine(root, "db", "start-postgres.sh")])
        {
            RedirectStandardOutput = true,
            UseShellExecute = false,
            WorkingDirectory = root,
        };
        info.Environment["PGTEST_DIR"] = Environment.GetEnvironmentVariable("PGTEST_DIR") ?? "/tmp/pd-pg-bench";
        info.Environment["PGTEST_PORT"] = Environment.GetEnvironmentVariable("PGTEST_PORT") ?? "55434";
        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException("db/start-postgres.sh failed with exit code " + process.ExitCode);
        }

        return output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)[^1];
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "PackDesigner.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("PackDesigner.sln not found above " + AppContext.BaseDirectory);
    }
}
