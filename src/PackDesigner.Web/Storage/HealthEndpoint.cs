using System.Text.Json;
using Microsoft.AspNetCore.Diagnostics.HealthChecks;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Diagnostics.HealthChecks;
using PackDesigner.Core.Evaluation;
using PackDesigner.Data;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Storage;

namespace PackDesigner.Web.Storage;

/// <summary>
/// The database check of <c>/healthz</c>: the migrations are applied (or can be now) and a query on the designs
/// table answers. The reason of a failure names no host, password or exception text.
/// </summary>
public sealed class DatabaseHealthCheck(StorageGate gate, PackDesignerDbContext db) : IHealthCheck
{
    public async Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        try
        {
            await gate.EnsureOpenAsync(cancellationToken);
            await db.Designs.AsNoTracking().Select(d => d.Id).FirstOrDefaultAsync(cancellationToken);
            return HealthCheckResult.Healthy("The design database answers.");
        }
        catch (Exception ex) when (StorageFailure.IsUnavailable(ex))
        {
            StorageGate.ClearPools();
            return HealthCheckResult.Unhealthy("The design database cannot be reached.");
        }
    }
}

/// <summary><c>GET /healthz</c>: 200 with status "healthy", or 503 "unhealthy" when the database does not answer; JSON either way.</summary>
public static class HealthEndpoint
{
    public const string Path = "/healthz";
    public const string DatabaseCheck = "database";

    public static IServiceCollection AddPackDesignerHealth(this IServiceCollection services)
    {
        services.AddHealthChecks().AddCheck<DatabaseHealthCheck>(DatabaseCheck);
        return services;
    }

    public static IEndpointRouteBuilder MapPackDesignerHealth(this IEndpointRouteBuilder app)
    {
        app.MapHealthChecks(Path, new HealthCheckOptions { ResponseWriter = WriteAsync, AllowCachingResponses = false })
            .WithMetadata(StorageFreeAttribute.Instance);
        return app;
    }

    private static Task WriteAsync(HttpContext context, HealthReport report)
    {
        var settings = context.RequestServices.GetRequiredService<StorageSettings>();
        var database = report.Entries.TryGetValue(DatabaseCheck, out var entry) ? entry : default;
        var body = new HealthResponse(
            Text(report.Status),
            new AppHealth("healthy", DesignEvaluator.CalculationVersion),
            new DatabaseHealth(Text(database.Status), settings.Provider == StorageProvider.Postgres ? "postgres" : "sqlite",
                database.Description ?? string.Empty, (long)database.Duration.TotalMilliseconds));
        context.Response.ContentType = "application/json; charset=utf-8";
        return context.Response.WriteAsync(JsonSerializer.Serialize(body, HealthJson));
    }

    private static readonly JsonSerializerOptions HealthJson = new(JsonSerializerDefaults.Web);

    private static string Text(HealthStatus s) => s == HealthStatus.Healthy ? "healthy" : s == HealthStatus.Degraded ? "degraded" : "unhealthy";
}

public sealed record HealthResponse(string Status, AppHealth App, DatabaseHealth Database);

public sealed record AppHealth(string Status, string CalculationVersion);

public sealed record DatabaseHealth(string Status, string Provider, string Description, long DurationMs);
