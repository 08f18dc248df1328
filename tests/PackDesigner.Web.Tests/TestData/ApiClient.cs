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

    public static Task<ApiAnswer> PutRawAsync(this HttpClient client, string path, string body, string contentType = "application/json") =>
        client.SendRawAsync(HttpMethod.Put, path, body, contentType);

    public static Task<ApiAnswer> SendAnswerAsync(this HttpClient client, HttpMethod method, string path) =>
        client.SendRawAsync(method, path);

    public static async Task<ApiAnswer> SendRawAsync(this HttpClient client, HttpMethod method, string path, string? body = null, string contentType = "application/json")
    {
        using var request = new HttpRequestMessage(method, path);
        if (body is not null)
        {
            request.Content = new StringContent(body, Encoding.UTF8);
            request.Content.Headers.ContentType = new MediaTypeHeaderValue(contentType);
        }

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
    /// <summary>The body as text (for answers that are not JSON, such as CSV).</summary>
    public string Text { get; init; } = string.Empty;

    public static async Task<ApiAnswer> ReadAsync(HttpResponseMessage response)
    {
        var text = await response.Content.ReadAsStringAsync();
        var media = response.Content.Headers.ContentType?.MediaType;
        var json = media is not null && media.Contains("json", StringComparison.Ordinal);
        var body = text.Length == 0 || !json ? default : JsonDocument.Parse(text).RootElement.Clone();
        return new ApiAnswer((int)response.StatusCode, media, body) { Text = text };
    }

    /// <summary>The field paths of a ProblemDetails' <c>errors</c> object.</summary>
    public IReadOnlyDictionary<string, string[]> Errors =>
        Body.ValueKind == JsonValueKind.Object && Body.TryGetProperty("errors", out var errors)
            ? errors.EnumerateObject().ToDictionary(p => p.Name, p => p.Value.EnumerateArray().Select(m => m.GetString()!).ToArray())
            : new Dictionary<string, string[]>();

    public IReadOnlyList<string> FindingCodes =>
        Body.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("code").GetString()!).ToList();
}
