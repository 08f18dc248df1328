using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Data;
using PackDesigner.Data.Json;
using PackDesigner.Web.Api;
using PackDesigner.Web.Pages.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

public sealed class DesignApiSqliteTests(PackDesignerFactory factory) : DesignApiTests<PackDesignerFactory>(factory);

public sealed class DesignApiPostgresTests(PostgresAppFactory factory) : DesignApiTests<PostgresAppFactory>(factory), IPostgresTests;

/// <summary>The design API through the whole app, on SQLite and on PostgreSQL.</summary>
public abstract class DesignApiTests<TFactory>(TFactory factory) : IClassFixture<TFactory>
    where TFactory : WebApplicationFactory<Program>
{
    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    [ProviderFact]
    public async Task Post_ValidDesign_Returns201WithRevision1AndTheHashOfTheCanonicalInput()
    {
        var input = DesignRequestBuilder.Valid();

        var answer = await _client.CreateDesignAsync("API pack " + Guid.NewGuid(), input);

        Assert.Equal(201, answer.Status);
        var latest = answer.Latest();
        Assert.Equal(1, latest.GetProperty("number").GetInt32());
        Assert.Equal("draft", latest.GetProperty("status").GetString());
        Assert.True(latest.GetProperty("createdAt").GetDateTime().Kind == DateTimeKind.Utc);
        var core = DesignRequestMapper.TryMap(input.Build(), out _)!;
        // The hash is SHA-256 of the canonical JSON (FIPS 180-4 through .NET's SHA256), lower-case hex.
        Assert.Equal(CanonicalDesignJson.Sha256Hex(CanonicalDesignJson.Serialize(core)), latest.GetProperty("inputHash").GetString());
        var result = latest.GetProperty("result");
        // 16S1P of 100 Ah cells: 16 × 3.65 V = 58.4 V maximum, 100 Ah (series adds voltage, parallel adds capacity).
        Assert.Equal(58.4, result.GetProperty("pack").GetProperty("maxVoltage").GetDouble(), 9);
        Assert.Equal(100, result.GetProperty("pack").GetProperty("capacityAh").GetDouble(), 9);
    }

    [ProviderFact]
    public async Task Post_InvalidInput_Returns400WithFieldPathsAndStoresNothing()
    {
        var before = await CountAsync();

        var answer = await _client.CreateDesignAsync("Bad " + Guid.NewGuid(), DesignRequestBuilder.Valid().WithParallel(0).WithCell(c => c with { CapacityAh = -5 }));

        Assert.Equal(400, answer.Status);
        Assert.Contains("input.parallel", answer.Errors.Keys);
        Assert.Contains("input.cell.capacityAh", answer.Errors.Keys);
        Assert.Equal(before, await CountAsync());
    }

    [ProviderFact]
    public async Task Post_NoNameAndNoInput_NamesBothFields()
    {
        var answer = await _client.PostRawAsync(DesignRoutes.Api, """{ "name": " ", "colour": "red" }""");

        Assert.Equal(400, answer.Status);
        Assert.Contains("input", answer.Errors.Keys);
        Assert.Contains("colour", answer.Errors.Keys);
    }

    [ProviderFact]
    public async Task Put_BasedOnLatest_AddsRevision2AndLeavesRevision1AsItWas()
    {
        var id = await _client.NewDesignIdAsync("Two revisions " + Guid.NewGuid());
        var first = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1));

        var saved = await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2));

        Assert.Equal(200, saved.Status);
        Assert.Equal(2, saved.Latest().GetProperty("number").GetInt32());
        Assert.NotEqual(first.Body.GetProperty("inputHash").GetString(), saved.Latest().GetProperty("inputHash").GetString());
        var again = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1));
        Assert.Equal(first.Body.GetProperty("inputHash").GetString(), again.Body.GetProperty("inputHash").GetString());
        Assert.Equal(first.Body.GetProperty("result").GetRawText(), again.Body.GetProperty("result").GetRawText());
        Assert.Equal(first.Body.GetProperty("input").GetRawText(), again.Body.GetProperty("input").GetRawText());
        Assert.False(again.Body.GetProperty("isLatest").GetBoolean());
        var list = await _client.GetAnswerAsync(DesignRoutes.ApiRevisions(id));
        Assert.Equal([2, 1], list.Body.EnumerateArray().Select(r => r.GetProperty("number").GetInt32()));
    }

    [ProviderFact]
    public async Task Put_StaleRevision_Returns409NamingTheLatestAndSavesNothing()
    {
        var id = await _client.NewDesignIdAsync("Stale " + Guid.NewGuid());
        Assert.Equal(200, (await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2))).Status);

        var stale = await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(3));

        Assert.Equal(409, stale.Status);
        Assert.Equal("application/problem+json", stale.MediaType);
        Assert.Equal(2, stale.Body.GetProperty("latestRevision").GetInt32());
        Assert.Equal(3, stale.Body.GetProperty("unsavedInput").GetProperty("parallel").GetInt32());
        var list = await _client.GetAnswerAsync(DesignRoutes.ApiRevisions(id));
        Assert.Equal(2, list.Body.GetArrayLength());
    }

    [ProviderFact]
    public async Task Put_TwoSavesFromTheSameRevisionAtOnce_ExactlyOneWinsAndBothInputsSurvive()
    {
        var id = await _client.NewDesignIdAsync("Race " + Guid.NewGuid());
        using var other = factory.CreateClient();

        var answers = await Task.WhenAll(
            _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2), "first"),
            other.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(3), "second"));

        Assert.Equal([200, 409], answers.Select(a => a.Status).Order());
        var winner = answers.Single(a => a.Status == 200);
        var loser = answers.Single(a => a.Status == 409);
        var stored = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 2));
        Assert.Equal(winner.Latest().GetProperty("inputHash").GetString(), stored.Body.GetProperty("inputHash").GetString());
        // The loser's input comes back with the conflict; the winner's is revision 2; revision 3 does not exist.
        Assert.NotEqual(stored.Body.GetProperty("input").GetProperty("parallel").GetInt32(),
            loser.Body.GetProperty("unsavedInput").GetProperty("parallel").GetInt32());
        Assert.Equal(404, (await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 3))).Status);
    }

    [ProviderFact]
    public async Task Revisions_NoEndpointChangesOrDeletesThem()
    {
        var id = await _client.NewDesignIdAsync("Fixed " + Guid.NewGuid());
        var before = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1));

        var attempts = new[]
        {
            await _client.SendAnswerAsync(HttpMethod.Delete, DesignRoutes.ApiRevision(id, 1)),
            await _client.PutRawAsync(DesignRoutes.ApiRevision(id, 1), DesignRequestBuilder.Valid().WithParallel(4).ToJson()),
            await _client.SendAnswerAsync(HttpMethod.Patch, DesignRoutes.ApiRevision(id, 1)),
            await _client.SendAnswerAsync(HttpMethod.Delete, DesignRoutes.ApiDesign(id)),
            await _client.SendAnswerAsync(HttpMethod.Delete, DesignRoutes.ApiRevisions(id)),
        };

        Assert.All(attempts, a => Assert.Equal(405, a.Status));
        var after = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1));
        Assert.Equal(before.Body.GetRawText(), after.Body.GetRawText());
    }

    [ProviderFact]
    public async Task Get_UnknownDesignOrRevision_Returns404ProblemDetails()
    {
        var id = await _client.NewDesignIdAsync("Found " + Guid.NewGuid());

        var noDesign = await _client.GetAnswerAsync(DesignRoutes.ApiDesign(int.MaxValue));
        var noRevision = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 9));

        Assert.Equal(404, noDesign.Status);
        Assert.Equal("application/problem+json", noDesign.MediaType);
        Assert.Equal(404, noRevision.Status);
        Assert.Contains("no revision 9", noRevision.Body.GetProperty("detail").GetString());
    }

    [ProviderFact]
    public async Task List_SearchSortAndPage_AreAppliedByTheServer()
    {
        var tag = "Lst" + Guid.NewGuid().ToString("N")[..8];
        foreach (var name in new[] { "b", "c", "a" })
        {
            await _client.NewDesignIdAsync($"{tag} {name}");
        }

        var page1 = await _client.GetAnswerAsync($"{DesignRoutes.Api}?search={tag.ToUpperInvariant()}&sort=nameAscending&pageSize=2");
        var page2 = await _client.GetAnswerAsync($"{DesignRoutes.Api}?search={tag}&sort=nameAscending&pageSize=2&page=2");

        Assert.Equal(200, page1.Status);
        Assert.Equal(3, page1.Body.GetProperty("totalCount").GetInt32());
        Assert.Equal(2, page1.Body.GetProperty("pageCount").GetInt32());
        Assert.Equal([$"{tag} a", $"{tag} b"], Names(page1));
        Assert.Equal([$"{tag} c"], Names(page2));
    }

    [ProviderFact]
    public async Task List_BadQuery_Returns400NamingEachParameter()
    {
        var answer = await _client.GetAnswerAsync($"{DesignRoutes.Api}?sort=colour&page=0&pageSize=1000");

        Assert.Equal(400, answer.Status);
        Assert.Equal(["page", "pageSize", "sort"], answer.Errors.Keys.Order());
    }

    [ProviderFact]
    public async Task Restore_OldRevision_SavesItsInputAsTheNextRevision()
    {
        var id = await _client.NewDesignIdAsync("Restore " + Guid.NewGuid());
        var first = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1));
        await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2));

        var restored = await _client.PostRawAsync($"{DesignRoutes.ApiRevision(id, 1)}/restore", """{ "basedOnRevision": 2, "createdBy": "tester" }""");

        Assert.Equal(200, restored.Status);
        Assert.Equal(3, restored.Latest().GetProperty("number").GetInt32());
        Assert.Equal(first.Body.GetProperty("inputHash").GetString(), restored.Latest().GetProperty("inputHash").GetString());
    }

    [ProviderFact]
    public async Task Post_UnicodeName_IsStoredAndReturnedExactly()
    {
        var name = "Ωmega 電池 <script>alert(1)</script> " + Guid.NewGuid();

        var id = await _client.NewDesignIdAsync(name);

        Assert.Equal(name, (await _client.GetAnswerAsync(DesignRoutes.ApiDesign(id))).Body.GetProperty("name").GetString());
    }

    [ProviderFact]
    public async Task OpenApi_Document_CoversTheDesignEndpoints()
    {
        var answer = await _client.GetAnswerAsync("/openapi/v1.json");

        Assert.Equal(200, answer.Status);
        var paths = answer.Body.GetProperty("paths");
        foreach (var (path, method) in new[]
        {
            ("/api/v1/designs", "post"), ("/api/v1/designs", "get"), ("/api/v1/designs/{id}", "get"), ("/api/v1/designs/{id}", "put"),
            ("/api/v1/designs/{id}/revisions", "get"), ("/api/v1/designs/{id}/revisions/{number}", "get"), ("/api/v1/evaluate", "post"),
        })
        {
            Assert.True(paths.TryGetProperty(path, out var item) && item.TryGetProperty(method, out _), $"{method} {path} is missing");
        }

        Assert.False(paths.GetProperty("/api/v1/designs/{id}").TryGetProperty("delete", out _));
    }

    [ProviderFact]
    public async Task Healthz_DatabaseUp_Answers200Healthy()
    {
        var answer = await _client.GetAnswerAsync("/healthz");

        Assert.Equal(200, answer.Status);
        Assert.Equal("healthy", answer.Body.GetProperty("status").GetString());
        Assert.Equal("healthy", answer.Body.GetProperty("database").GetProperty("status").GetString());
    }

    private static List<string> Names(ApiAnswer page) =>
        page.Body.GetProperty("items").EnumerateArray().Select(i => i.GetProperty("name").GetString()!).ToList();

    private async Task<int> CountAsync()
    {
        using var scope = factory.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        return await db.Designs.CountAsync() + await db.DesignRevisions.CountAsync();
    }
}
