using System.Text.Json;
using System.Text.Json.Nodes;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Tests.TestData;

/// <summary>Calls of the design API with bodies built from <see cref="DesignRequestBuilder"/>.</summary>
public static class DesignApi
{
    public static Task<ApiAnswer> CreateDesignAsync(this HttpClient client, string name, DesignRequestBuilder? input = null,
        int? cellId = null, string createdBy = "tester", int? customerId = null)
    {
        var body = new JsonObject
        {
            ["name"] = name,
            ["createdBy"] = createdBy,
            ["input"] = (input ?? DesignRequestBuilder.Valid()).ToJsonObject(),
        };
        if (cellId is { } c)
        {
            body["cellId"] = c;
        }

        if (customerId is { } cu)
        {
            body["customerId"] = cu;
        }

        return client.PostRawAsync(DesignRoutes.Api, body.ToJsonString());
    }

    public static Task<ApiAnswer> SaveRevisionAsync(this HttpClient client, int id, int basedOnRevision, DesignRequestBuilder input, string createdBy = "tester") =>
        client.PutRawAsync(DesignRoutes.ApiDesign(id), new JsonObject
        {
            ["basedOnRevision"] = basedOnRevision,
            ["createdBy"] = createdBy,
            ["input"] = input.ToJsonObject(),
        }.ToJsonString());

    /// <summary>Creates a design and returns its id (the test fails when the API refuses).</summary>
    public static async Task<int> NewDesignIdAsync(this HttpClient client, string name, DesignRequestBuilder? input = null, int? cellId = null)
    {
        var answer = await client.CreateDesignAsync(name, input, cellId);
        Assert.True(answer.Status == 201, $"POST {DesignRoutes.Api} answered {answer.Status}: {answer.Body}");
        return answer.Body.GetProperty("id").GetInt32();
    }

    public static int Id(this ApiAnswer answer) => answer.Body.GetProperty("id").GetInt32();

    public static JsonElement Latest(this ApiAnswer answer) => answer.Body.GetProperty("latestRevision");
}
