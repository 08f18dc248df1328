using System.Security.Cryptography;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Data.Json;

/// <summary>
/// The one JSON form of a design input that is stored and hashed. Fixed rules, so the same input always gives the
/// same bytes: System.Text.Json with source-generated metadata (properties in declaration order), camelCase names,
/// enums as camelCase strings, numbers in the invariant shortest round-trip form, no indentation, null properties
/// left out (so adding an optional field to Core later does not change the hash of older inputs), and NaN or
/// infinities refused. The hash is SHA-256 of the UTF-8 bytes, as lower-case hex.
/// </summary>
public static class CanonicalDesignJson
{
    private static readonly JsonSerializerOptions Options = CreateOptions();
    private static readonly CanonicalJsonContext Context = new(Options);

    /// <summary>The canonical JSON text of <paramref name="input"/>.</summary>
    /// <exception cref="ArgumentException">The input holds a NaN or infinite number (validation refuses those first).</exception>
    public static string Serialize(DesignInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        try
        {
            return JsonSerializer.Serialize(input, Context.DesignInput);
        }
        catch (ArgumentException ex)
        {
            throw new ArgumentException("A design input with a non-finite number has no canonical JSON.", nameof(input), ex);
        }
    }

    /// <summary>Reads canonical (or any compatible) JSON back into a Core design input.</summary>
    /// <exception cref="JsonException">The text is not a design input.</exception>
    public static DesignInput Deserialize(string json) =>
        JsonSerializer.Deserialize(json, Context.DesignInput) ?? throw new JsonException("The JSON text is null, not a design input.");

    /// <summary>Lower-case hex SHA-256 of the UTF-8 bytes of <paramref name="json"/>.</summary>
    public static string Sha256Hex(string json) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(json)));

    /// <summary>The canonical JSON of an open-circuit-voltage table.</summary>
    public static string SerializeCurve(IReadOnlyList<OcvPoint> points) => JsonSerializer.Serialize(points, Context.IReadOnlyListOcvPoint);

    /// <summary>Reads an open-circuit-voltage table written by <see cref="SerializeCurve"/>.</summary>
    public static IReadOnlyList<OcvPoint> DeserializeCurve(string json) =>
        JsonSerializer.Deserialize(json, Context.IReadOnlyListOcvPoint) ?? throw new JsonException("The JSON text is null, not a table.");

    /// <summary>
    /// JSON of an evaluation result, for storage and display only: it cannot be read back into Core types (the OCV
    /// curve is a computed object). Same rules as the input.
    /// </summary>
    public static string SerializeResult(EvaluationResult result) => JsonSerializer.Serialize(result, Context.EvaluationResult);

    private static JsonSerializerOptions CreateOptions()
    {
        var options = new JsonSerializerOptions
        {
            PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
            DictionaryKeyPolicy = null,
            DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
            NumberHandling = JsonNumberHandling.Strict,
            WriteIndented = false,
            Encoder = JavaScriptEncoder.Default,
            AllowTrailingCommas = false,
            ReadCommentHandling = JsonCommentHandling.Disallow,
            RespectRequiredConstructorParameters = true,
        };
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.CamelCase, allowIntegerValues: false));
        return options;
    }
}

[JsonSerializable(typeof(DesignInput))]
[JsonSerializable(typeof(IReadOnlyList<OcvPoint>))]
[JsonSerializable(typeof(EvaluationResult))]
internal sealed partial class CanonicalJsonContext : JsonSerializerContext;
