using System.Text.Json;
using System.Text.Json.Serialization.Metadata;
using System.Text.RegularExpressions;

namespace PackDesigner.Web.Api;

/// <summary>The outcome of reading a JSON body: the value, or a ProblemDetails result naming the field or position.</summary>
public sealed record JsonBodyResult<T>(T? Value, IResult? Problem)
    where T : class;

/// <summary>
/// Reads a JSON request body with a size cap and turns every way it can be wrong (too large, empty, not JSON,
/// malformed, a value of the wrong type) into a 4xx ProblemDetails that names the field path and the line and
/// position, without echoing parser or exception text.
/// </summary>
public static partial class JsonBody
{
    /// <summary>Largest body accepted, bytes. A design with a 100-row OCV table is about 6 kB.</summary>
    public const int MaxBytes = 64 * 1024;

    public const string BodyKey = "$";

    /// <summary>Reads the body as <typeparamref name="T"/>; <paramref name="subject"/> names what the body holds in messages ("the design", "the cell").</summary>
    public static async Task<JsonBodyResult<T>> ReadAsync<T>(HttpRequest request, JsonSerializerOptions options, CancellationToken ct, string subject = "the design")
        where T : class
    {
        var bytes = await ReadCappedAsync(request, ct);
        if (bytes is null)
        {
            return Fail<T>(ApiProblems.Status(StatusCodes.Status413PayloadTooLarge, "The request body is too large.",
                FormattableString.Invariant($"Send at most {MaxBytes / 1024} KiB of JSON.")));
        }

        if (bytes.Length == 0)
        {
            return Fail<T>(ApiProblems.Field(BodyKey, $"The request body is empty: send {subject} as a JSON object."));
        }

        if (!request.HasJsonContentType())
        {
            return Fail<T>(ApiProblems.Status(StatusCodes.Status415UnsupportedMediaType, "Unsupported media type.",
                $"Send {subject} as application/json."));
        }

        try
        {
            using var _ = JsonDocument.Parse(bytes, new JsonDocumentOptions { MaxDepth = options.MaxDepth });
        }
        catch (JsonException ex)
        {
            return Fail<T>(ApiProblems.Field(BodyKey, $"The body is not valid JSON{Position(ex)}."));
        }

        try
        {
            var value = JsonSerializer.Deserialize<T>(bytes, options);
            return value is null
                ? Fail<T>(ApiProblems.Field(BodyKey, $"Expected a JSON object with {subject}."))
                : new JsonBodyResult<T>(value, null);
        }
        catch (JsonException ex)
        {
            var field = FieldOf(ex.Path);
            return Fail<T>(ApiProblems.Field(field, $"Expected {Describe(typeof(T), ex.Path, options)}{Position(ex)}."));
        }
    }

    /// <summary>The body, or null when it is larger than <see cref="MaxBytes"/>.</summary>
    private static async Task<byte[]?> ReadCappedAsync(HttpRequest request, CancellationToken ct)
    {
        if (request.ContentLength > MaxBytes)
        {
            return null;
        }

        using var buffer = new MemoryStream();
        var chunk = new byte[8192];
        int n;
        try
        {
            while ((n = await request.Body.ReadAsync(chunk, ct)) > 0)
            {
                if (buffer.Length + n > MaxBytes)
                {
                    return null;
                }

                buffer.Write(chunk, 0, n);
            }
        }
        catch (BadHttpRequestException ex) when (ex.StatusCode == StatusCodes.Status413PayloadTooLarge)
        {
            return null;
        }

        return buffer.ToArray();
    }

    private static JsonBodyResult<T> Fail<T>(IResult problem)
        where T : class => new(null, problem);

    private static string Position(JsonException ex) => ex.LineNumber is { } line
        ? FormattableString.Invariant($" (line {line + 1}, position {(ex.BytePositionInLine ?? 0) + 1})")
        : string.Empty;

    /// <summary>"$.cell.capacityAh" → "cell.capacityAh"; the root is "$".</summary>
    public static string FieldOf(string? jsonPath) =>
        string.IsNullOrEmpty(jsonPath) || jsonPath == "$" ? BodyKey
        : jsonPath.StartsWith("$.", StringComparison.Ordinal) ? jsonPath[2..]
        : jsonPath.TrimStart('$');

    /// <summary>What the contract expects at <paramref name="jsonPath"/>: "a number", "true or false", "one of: …".</summary>
    public static string Describe(Type root, string? jsonPath, JsonSerializerOptions options)
    {
        var type = (Type?)root;
        foreach (Match m in PathSegment().Matches(jsonPath ?? string.Empty))
        {
            if (type is null)
            {
                break;
            }

            var info = options.GetTypeInfo(type);
            type = m.Groups["index"].Success
                ? info.ElementType
                : info.Properties.FirstOrDefault(p => string.Equals(p.Name, m.Groups["name"].Value, StringComparison.OrdinalIgnoreCase))?.PropertyType;
        }

        return Describe(type is null ? null : Nullable.GetUnderlyingType(type) ?? type, options);
    }

    private static string Describe(Type? type, JsonSerializerOptions options)
    {
        if (type is null)
        {
            return "a valid value";
        }

        if (type.IsEnum)
        {
            var names = Enum.GetNames(type).Select(n => options.PropertyNamingPolicy?.ConvertName(n) ?? n);
            return "one of: " + string.Join(", ", names);
        }

        if (type == typeof(double) || type == typeof(float) || type == typeof(decimal))
        {
            return "a number";
        }

        if (type == typeof(int) || type == typeof(long))
        {
            return "a whole number";
        }

        if (type == typeof(bool))
        {
            return "true or false";
        }

        if (type == typeof(string))
        {
            return "a string";
        }

        return options.GetTypeInfo(type).Kind switch
        {
            JsonTypeInfoKind.Enumerable => "an array",
            JsonTypeInfoKind.Object or JsonTypeInfoKind.Dictionary => "an object",
            _ => "a valid value",
        };
    }

    [GeneratedRegex(@"\.(?<name>[A-Za-z0-9_]+)|\['(?<name>[^']*)'\]|\[(?<index>\d+)\]")]
    private static partial Regex PathSegment();
}
