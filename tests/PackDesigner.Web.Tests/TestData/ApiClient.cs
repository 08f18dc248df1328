using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;

namespace PackDesigner.Web.Tests.TestData;

/// <summary>Sends bodies to the API and reads its answers.</summary>
public static class ApiClient
{
    public const string EvaluatePath = "/api/v1/evaluate";

    public static Task<ApiAnswer> EvaluateAsync(this HttpClient client, DesignRequestBuilder design) =>
        client.PostRawAsync(EvaluatePath, design.ToJson());

    public static async Task<ApiAnswer> PostRawAsync(this HttpClient client, string path, string body, string contentType = "application/json")
    {
        using var content = new StringContent(body, Encoding.UTF8);
        content.Headers.ContentType = new MediaTypeHeaderValue(contentType);
        using var response = await client.PostAsync(path, content);
        return await ApiAnswer.ReadAsync(response);
    }

    public static async Task<ApiAnswer> PutRawAsync(this HttpClient client, string path, string body, string contentType = "application/json")
    {
        using var content = new StringContent(body, Encoding.UTF8);
        content.Headers.ContentType = new MediaTypeHeaderValue(contentType);
        using var response = await client.PutAsync(path, content);
        return await ApiAnswer.ReadAsync(response);
    }

    public static async Task<ApiAnswer> SendAnswerAsync(this HttpClient client, HttpMethod method, string path)
    {
        using var request = new HttpRequestMessage(method, path);
        using var response = await client.SendAsync(request);
        return await ApiAnswer.ReadAsync(response);
    }

    public static async Task<ApiAnswer> GetAnswerAsync(this HttpClient client, string path)
    {
        using var response = await client.GetAsync(path);
        return await ApiAnswer.ReadAsync(response);
    }
}

/// <summary>Status, media type and JSON body of an API answer.</summary>
public sealed record ApiAnswer(int Status, string? MediaType, JsonElement Body)
{
    public static async Task<ApiAnswer> ReadAsync(HttpResponseMessage response)
    {
        var text = await response.Content.ReadAsStringAsync();
        var body = text.Length == 0 || !(response.Content.Headers.ContentType?.MediaType?.Contains("json", StringComparison.Ordinal) ?? false)
            ? default
            : JsonDocument.Parse(text).RootElement.Clone();
        return new ApiAnswer((int)response.StatusCode, response.Content.Headers.ContentType?.MediaType, body);
    }

    /// <summary>The field paths of a ProblemDetails' <c>errors</c> object.</summary>
    public IReadOnlyDictionary<string, string[]> Errors =>
        Body.ValueKind == JsonValueKind.Object && Body.TryGetProperty("errors", out var errors)
            ? errors.EnumerateObject().ToDictionary(p => p.Name, p => p.Value.EnumerateArray().Select(m => m.GetString()!).ToArray())
            : new Dictionary<string, string[]>();

    public IReadOnlyList<string> FindingCodes =>
        Body.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("code").GetString()!).ToList();
}
