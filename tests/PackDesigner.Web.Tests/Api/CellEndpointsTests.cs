using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Data.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary><c>/api/v1/cells</c> through HTTP: CRUD, versions, clone, OCV CSV, and field-path errors.</summary>
public sealed class CellEndpointsTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Route = "/api/v1/cells";
    private readonly HttpClient _client = factory.CreateClient();

    private static JsonObject Body(string name) => new()
    {
        ["name"] = name,
        ["maker"] = "Test maker",
        ["chemistry"] = "nmc",
        ["capacityAh"] = 4.8,
        ["nominalVoltage"] = 3.63,
        ["maxChargeVoltage"] = 4.2,
        ["minDischargeVoltage"] = 2.75,
        ["massKg"] = 0.068,
        ["ocvCurve"] = new JsonArray(Point(0, 2.8), Point(20, 3.5), Point(80, 3.95), Point(100, 4.15)),
    };

    private static JsonObject Point(double soc, double volts) => new() { ["socPercent"] = soc, ["voltage"] = volts };

    [Fact]
    public async Task Post_ValidCell_Returns201WithLocationAndTheFigures()
    {
        var answer = await PostAsync(Body("Api cell " + Guid.NewGuid()));

        Assert.Equal(201, answer.Status);
        var id = answer.Body.GetProperty("id").GetInt32();
        Assert.Equal(1, answer.Body.GetProperty("version").GetInt64());
        Assert.Equal("nmc", answer.Body.GetProperty("chemistry").GetString());
        Assert.Equal(4.8, answer.Body.GetProperty("capacityAh").GetDouble());
        Assert.Equal(JsonValueKind.Null, answer.Body.GetProperty("peakDischargeCurrentA").ValueKind);
        Assert.Equal(4, answer.Body.GetProperty("ocvCurve").GetArrayLength());

        var read = await _client.GetAnswerAsync($"{Route}/{id}");
        Assert.Equal(200, read.Status);
        Assert.Equal(answer.Body.GetRawText(), read.Body.GetRawText());
    }

    [Fact]
    public async Task Post_InvalidBody_Returns400KeyedByTheBodysOwnPaths()
    {
        var body = Body("");
        body["capacityAh"] = -5;
        body["capacityAhh"] = 5;
        body["ocvCurve"] = new JsonArray(Point(0, 2.8), Point(20, 3.5), Point(80, 3.95), Point(90, 3.9), Point(100, 4.15));

        var unknown = await PostAsync(body);
        body.Remove("capacityAhh");
        var invalid = await PostAsync(body);
        var noChemistry = await PostAsync(new JsonObject { ["name"] = "x" });
        var wrongType = await PostAsync(new JsonObject { ["name"] = "x", ["chemistry"] = "lfp", ["massKg"] = "heavy" });

        Assert.Equal(400, unknown.Status);
        Assert.Contains("capacityAhh", unknown.Errors.Keys);
        Assert.Equal(400, invalid.Status);
        Assert.Contains("capacityAh", invalid.Errors.Keys);
        Assert.Contains("ocvCurve[3].voltage", invalid.Errors.Keys);
        Assert.Contains("name", invalid.Errors.Keys);
        Assert.DoesNotContain(invalid.Errors.Keys, k => k.StartsWith("cell.", StringComparison.Ordinal));
        Assert.Equal(["chemistry"], noChemistry.Errors.Keys);
        Assert.Equal(["massKg"], wrongType.Errors.Keys);
        Assert.Contains("a number", wrongType.Errors["massKg"][0]);
    }

    [Fact]
    public async Task Post_LfpWithoutTableButHigherMinimum_ExplainsThePresetCurveOnce()
    {
        var body = new JsonObject { ["name"] = "Preset mismatch", ["chemistry"] = "lfp", ["minDischargeVoltage"] = 2.8 };

        var answer = await PostAsync(body);

        Assert.Equal(400, answer.Status);
        Assert.Contains("preset's typical curve", Assert.Single(answer.Errors["ocvCurve"]));
        Assert.DoesNotContain(answer.Errors.Keys, k => k.StartsWith("ocvCurve[", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Put_CurrentVersion_SavesAndStaleVersion_Returns409AndKeepsTheStoredCell()
    {
        var created = (await PostAsync(Body("Versioned " + Guid.NewGuid()))).Body;
        var id = created.GetProperty("id").GetInt32();
        var edit = JsonNode.Parse(created.GetRawText())!.AsObject();
        edit["capacityAh"] = 5.0;

        var first = await _client.PutRawAsync($"{Route}/{id}", edit.ToJsonString());
        edit["capacityAh"] = 6.0;
        var stale = await _client.PutRawAsync($"{Route}/{id}", edit.ToJsonString());
        edit.Remove("version");
        var noVersion = await _client.PutRawAsync($"{Route}/{id}", edit.ToJsonString());
        var nobody = Body("Nobody");
        nobody["version"] = 1;
        var missing = await _client.PutRawAsync($"{Route}/987654", nobody.ToJsonString());

        Assert.Equal(200, first.Status);
        Assert.Equal(2, first.Body.GetProperty("version").GetInt64());
        Assert.Equal(409, stale.Status);
        Assert.Equal("application/problem+json", stale.MediaType);
        Assert.Contains("Someone else", stale.Body.GetProperty("detail").GetString());
        Assert.Equal(["version"], noVersion.Errors.Keys);
        Assert.Equal(404, missing.Status);
        Assert.Equal(5.0, (await _client.GetAnswerAsync($"{Route}/{id}")).Body.GetProperty("capacityAh").GetDouble());
    }

    [Fact]
    public async Task Get_List_SearchesAndPages()
    {
        var token = Guid.NewGuid().ToString("N")[..8];
        foreach (var n in new[] { "c", "a", "b" })
        {
            await PostAsync(Body($"{n} list {token}"));
        }

        var page1 = await _client.GetAnswerAsync($"{Route}?search=LIST+{token}&pageSize=2");
        var page2 = await _client.GetAnswerAsync($"{Route}?search=list+{token}&pageSize=2&page=2");

        Assert.Equal(3, page1.Body.GetProperty("totalCount").GetInt32());
        Assert.Equal(2, page1.Body.GetProperty("pageCount").GetInt32());
        Assert.Equal([$"a list {token}", $"b list {token}"], Names(page1));
        Assert.Equal([$"c list {token}"], Names(page2));
        Assert.True(page1.Body.GetProperty("items")[0].GetProperty("hasOwnOcvCurve").GetBoolean());
    }

    [Fact]
    public async Task Delete_NeedsTheCurrentVersion_AndLinkedDesignsKeepTheirFigures()
    {
        var created = (await PostAsync(Body("Delete " + Guid.NewGuid()))).Body;
        var id = created.GetProperty("id").GetInt32();
        int designId;
        using (var scope = factory.Services.CreateScope())
        {
            var design = await scope.ServiceProvider.GetRequiredService<DesignStore>()
                .CreateDesignAsync("Uses the API cell " + Guid.NewGuid(), null, null, id, TestDesigns.Valid(), "test");
            designId = design.Value!.Id;
        }

        var noVersion = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{id}");
        var stale = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{id}?version=9");
        var deleted = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{id}?version=1");
        var again = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{id}?version=1");

        Assert.Equal(["version"], noVersion.Errors.Keys);
        Assert.Equal(409, stale.Status);
        Assert.Equal(204, deleted.Status);
        Assert.Equal(404, again.Status);
        Assert.Equal(404, (await _client.GetAnswerAsync($"{Route}/{id}")).Status);
        using var check = factory.Services.CreateScope();
        var kept = (await check.ServiceProvider.GetRequiredService<DesignStore>().GetDesignAsync(designId)).Value!;
        Assert.Null(kept.CellId);
        Assert.Equal(TestDesigns.Valid().Cell, kept.LatestRevision.Input.Cell);
    }

    [Fact]
    public async Task PostClone_WithAndWithoutName_Returns201WithACopy()
    {
        var created = (await PostAsync(Body("Clone source " + Guid.NewGuid()))).Body;
        var id = created.GetProperty("id").GetInt32();

        var plain = await _client.PostAsync($"{Route}/{id}/clone", null);
        var plainBody = await ApiAnswer.ReadAsync(plain);
        var named = await _client.PostRawAsync($"{Route}/{id}/clone", "{\"name\":\"Renamed copy\"}");
        var missing = await _client.PostRawAsync($"{Route}/987654/clone", "{}");
        var unknown = await _client.PostRawAsync($"{Route}/{id}/clone", "{\"title\":\"x\"}");

        Assert.Equal(201, plainBody.Status);
        Assert.Equal(created.GetProperty("name").GetString() + " (copy)", plainBody.Body.GetProperty("name").GetString());
        Assert.NotEqual(id, plainBody.Body.GetProperty("id").GetInt32());
        Assert.Equal(created.GetProperty("ocvCurve").GetRawText(), plainBody.Body.GetProperty("ocvCurve").GetRawText());
        Assert.Equal("Renamed copy", named.Body.GetProperty("name").GetString());
        Assert.Equal(404, missing.Status);
        Assert.Equal(["title"], unknown.Errors.Keys);
    }

    [Fact]
    public async Task OcvCsv_ExportThenImport_RoundTripsAndBadCsvNamesTheLine()
    {
        var created = (await PostAsync(Body("Csv " + Guid.NewGuid()))).Body;
        var id = created.GetProperty("id").GetInt32();

        var export = await _client.GetAsync($"{Route}/{id}/ocv.csv");
        var csv = await export.Content.ReadAsStringAsync();
        var bad = await _client.PutRawAsync($"{Route}/{id}/ocv.csv?version=1", "socPercent,voltage\n0,2.8\n50,abc\n100,4.1\n", "text/csv");
        var fraction = await _client.PutRawAsync($"{Route}/{id}/ocv.csv?version=1", "socPercent,voltage\n0,2.8\n0.5,3.7\n1,4.1\n", "text/csv");
        var good = await _client.PutRawAsync($"{Route}/{id}/ocv.csv?version=1", "socPercent,voltage\n0,2.9\n50,3.7\n100,4.1\n", "text/csv");
        var stale = await _client.PutRawAsync($"{Route}/{id}/ocv.csv?version=1", csv, "text/csv");
        var json = await _client.PutRawAsync($"{Route}/{id}/ocv.csv?version=2", "{}");

        Assert.Equal("text/csv", export.Content.Headers.ContentType!.MediaType);
        Assert.Contains("attachment", export.Content.Headers.ContentDisposition!.DispositionType, StringComparison.Ordinal);
        Assert.StartsWith("socPercent,voltage", csv, StringComparison.Ordinal);
        Assert.Contains("20,3.5", csv, StringComparison.Ordinal);
        Assert.Equal(400, bad.Status);
        Assert.Contains(bad.Errors["ocvCsv"], m => m.StartsWith("Line 3:", StringComparison.Ordinal));
        Assert.Contains(fraction.Errors["ocvCsv"], m => m.Contains("fraction", StringComparison.Ordinal));
        Assert.Equal(200, good.Status);
        Assert.Equal(3, good.Body.GetProperty("ocvCurve").GetArrayLength());
        Assert.Equal(409, stale.Status);
        Assert.Equal(415, json.Status);
    }

    [Fact]
    public async Task Get_UnknownCell_Returns404ProblemDetails()
    {
        var answer = await _client.GetAnswerAsync($"{Route}/987654");
        var csv = await _client.GetAnswerAsync($"{Route}/987654/ocv.csv");

        Assert.Equal(404, answer.Status);
        Assert.Equal("application/problem+json", answer.MediaType);
        Assert.Contains("987654", answer.Body.GetProperty("detail").GetString());
        Assert.Equal(404, csv.Status);
    }

    private Task<ApiAnswer> PostAsync(JsonObject body) => _client.PostRawAsync(Route, body.ToJsonString());

    private static List<string> Names(ApiAnswer page) =>
        page.Body.GetProperty("items").EnumerateArray().Select(i => i.GetProperty("name").GetString()!).ToList();
}
