using System.Text.Json;
using System.Text.Json.Serialization;

namespace PackDesigner.Web.Api;

/// <summary>JSON conventions of the API: camelCase members, enums as camelCase strings, numbers only as JSON numbers.</summary>
public static class ApiJson
{
    public static void Configure(JsonSerializerOptions options)
    {
        options.PropertyNamingPolicy = JsonNamingPolicy.CamelCase;
        options.PropertyNameCaseInsensitive = true;
        options.NumberHandling = JsonNumberHandling.Strict;
        options.MaxDepth = 32;
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.CamelCase, allowIntegerValues: false));
    }
}
