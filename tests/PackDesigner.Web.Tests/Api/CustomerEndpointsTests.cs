using System.Text.Json.Nodes;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Data.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary><c>/api/v1/customers</c> and their jobs through HTTP.</summary>
public sealed class CustomerEndpointsTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Route = "/api/v1/customers";
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Customers_CreateReadUpdateDelete_Work()
    {
        var created = await PostAsync(Route, new JsonObject { ["name"] = "Kundin Ω " + Guid.NewGuid(), ["contact"] = "x@example.invalid" });
        var id = created.Body.GetProperty("id").GetInt32();
        var location = created.Body.GetProperty("name").GetString();

        var updated = await _client.PutRawAsync($"{Route}/{id}", new JsonObject { ["name"] = location + " renamed", ["notes"] = "n" }.ToJsonString());
        var read = await _client.GetAnswerAsync($"{Route}/{id}");
        var deleted = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{id}");
        var gone = await _client.GetAnswerAsync($"{Route}/{id}");

        Assert.Equal(201, created.Status);
        Assert.Equal(200, updated.Status);
        Assert.Equal(location + " renamed", read.Body.GetProperty("name").GetString());
        Assert.Equal(JsonValueKindNull, read.Body.GetProperty("contact").ValueKind);
        Assert.Equal("n", read.Body.GetProperty("notes").GetString());
        Assert.Equal(0, read.Body.GetProperty("jobs").GetArrayLength());
        Assert.Equal(204, deleted.Status);
        Assert.Equal(404, gone.Status);
    }

    [Fact]
    public async Task Customers_BadBody_Returns400NamingTheField()
    {
        var blank = await PostAsync(Route, new JsonObject { ["name"] = "  " });
        var unknown = await PostAsync(Route, new JsonObject { ["name"] = "A", ["phone"] = "1" });
        var tooLong = await PostAsync(Route, new JsonObject { ["name"] = new string('n', 201) });
        var empty = await _client.PostRawAsync(Route, "");

        Assert.Equal(["name"], blank.Errors.Keys);
        Assert.Equal(["phone"], unknown.Errors.Keys);
        Assert.Contains("200", tooLong.Errors["name"][0]);
        Assert.Equal(400, empty.Status);
        Assert.Contains("the customer", empty.Errors["$"][0]);
    }

    [Fact]
    public async Task Jobs_CreateReadUpdateDelete_UnderTheirCustomerOnly()
    {
        var a = (await PostAsync(Route, new JsonObject { ["name"] = "Owner A " + Guid.NewGuid() })).Body.GetProperty("id").GetInt32();
        var b = (await PostAsync(Route, new JsonObject { ["name"] = "Owner B " + Guid.NewGuid() })).Body.GetProperty("id").GetInt32();

        var job = await PostAsync($"{Route}/{a}/jobs", new JsonObject { ["title"] = "Boat", ["vehicleOrSystem"] = "Launch" });
        var jobId = job.Body.GetProperty("id").GetInt32();
        var updated = await _client.PutRawAsync($"{Route}/{a}/jobs/{jobId}", new JsonObject { ["title"] = "Boat repower" }.ToJsonString());
        var list = await _client.GetAnswerAsync($"{Route}/{a}/jobs");
        var viaOther = await _client.GetAnswerAsync($"{Route}/{b}/jobs/{jobId}");
        var deleteViaOther = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{b}/jobs/{jobId}");
        var noTitle = await PostAsync($"{Route}/{a}/jobs", new JsonObject { ["vehicleOrSystem"] = "x" });
        var noCustomer = await PostAsync($"{Route}/987654/jobs", new JsonObject { ["title"] = "x" });

        Assert.Equal(201, job.Status);
        Assert.Equal(a, job.Body.GetProperty("customerId").GetInt32());
        Assert.Equal("Boat repower", updated.Body.GetProperty("title").GetString());
        Assert.Equal(JsonValueKindNull, updated.Body.GetProperty("vehicleOrSystem").ValueKind);
        Assert.Equal(1, list.Body.GetArrayLength());
        Assert.Equal(404, viaOther.Status);
        Assert.Equal(404, deleteViaOther.Status);
        Assert.Equal(["title"], noTitle.Errors.Keys);
        Assert.Equal(404, noCustomer.Status);

        Assert.Equal(204, (await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{a}/jobs/{jobId}")).Status);
        Assert.Equal(0, (await _client.GetAnswerAsync($"{Route}/{a}/jobs")).Body.GetArrayLength());
    }

    [Fact]
    public async Task Delete_WhileReferenced_Returns409AndKeepsEverything()
    {
        var customer = (await PostAsync(Route, new JsonObject { ["name"] = "Referenced " + Guid.NewGuid() })).Body.GetProperty("id").GetInt32();
        var job = (await PostAsync($"{Route}/{customer}/jobs", new JsonObject { ["title"] = "Pickup" })).Body.GetProperty("id").GetInt32();
        using (var scope = factory.Services.CreateScope())
        {
            await scope.ServiceProvider.GetRequiredService<DesignStore>().CreateDesignAsync("Referencing " + Guid.NewGuid(), null, job, null, TestDesigns.Valid(), "test");
        }

        var customerDelete = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{customer}");
        var jobDelete = await _client.SendRawAsync(HttpMethod.Delete, $"{Route}/{customer}/jobs/{job}");

        Assert.Equal(409, customerDelete.Status);
        Assert.Contains("1 job(s) and 1 design(s)", customerDelete.Body.GetProperty("detail").GetString());
        Assert.Equal(409, jobDelete.Status);
        Assert.Contains("design", jobDelete.Body.GetProperty("detail").GetString());
        Assert.Equal(200, (await _client.GetAnswerAsync($"{Route}/{customer}/jobs/{job}")).Status);
    }

    [Fact]
    public async Task List_SearchesCaseInsensitively()
    {
        var token = Guid.NewGuid().ToString("N")[..8];
        await PostAsync(Route, new JsonObject { ["name"] = $"Ärzte Werkstatt {token}" });
        await PostAsync(Route, new JsonObject { ["name"] = $"Other {token}" });

        var found = await _client.GetAnswerAsync($"{Route}?search=" + Uri.EscapeDataString($"ärzte werkstatt {token}"));

        var item = Assert.Single(found.Body.GetProperty("items").EnumerateArray());
        Assert.Equal($"Ärzte Werkstatt {token}", item.GetProperty("name").GetString());
        Assert.Equal(0, item.GetProperty("jobCount").GetInt32());
    }

    private const System.Text.Json.JsonValueKind JsonValueKindNull = System.Text.Json.JsonValueKind.Null;

    private Task<ApiAnswer> PostAsync(string path, JsonObject body) => _client.PostRawAsync(path, body.ToJsonString());
}
