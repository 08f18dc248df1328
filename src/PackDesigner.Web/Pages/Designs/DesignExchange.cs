using System.Globalization;
using System.Text;
using System.Text.Json;
using PackDesigner.Core.Design;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;
using PackDesigner.Web.Api;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>A design file read for import: the name and Core input, or the errors keyed by their path in the file.</summary>
public sealed record DesignFile(string? Name, DesignInput? Input, string? ExportedInputHash, IReadOnlyList<ValidationError> Errors)
{
    public bool IsValid => Errors.Count == 0 && Input is not null && Name is not null;
}

/// <summary>
/// Our own JSON file of one design revision, schema version 1:
/// <code>{ "schemaVersion": 1, "kind": "packdesigner.design", "name": "…", "exportedAtUtc": "…Z",
///   "revision": { "number": 3, "inputHash": "…", "calculationVersion": "1.0.0" }, "input": { … } }</code>
/// <c>input</c> is the revision's canonical input JSON, which is also the shape of the evaluate request, so its
/// hash can be checked after import. Import needs <c>schemaVersion</c>, <c>kind</c>, <c>name</c> and <c>input</c>;
/// <c>revision</c> and <c>exportedAtUtc</c> are information.
/// </summary>
public static class DesignExchange
{
    public const int SchemaVersion = 1;
    public const string Kind = "packdesigner.design";
    public const int MaxBytes = JsonBody.MaxBytes;

    /// <summary>The file for one revision, indented UTF-8 JSON.</summary>
    public static byte[] Export(string name, RevisionDetails revision, DateTime exportedAtUtc)
    {
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteNumber("schemaVersion", SchemaVersion);
            w.WriteString("kind", Kind);
            w.WriteString("name", name);
            w.WriteString("exportedAtUtc", exportedAtUtc.ToUniversalTime().ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture));
            w.WriteStartObject("revision");
            w.WriteNumber("number", revision.Number);
            w.WriteString("inputHash", revision.InputSha256);
            w.WriteString("calculationVersion", revision.CalculationVersion);
            w.WriteEndObject();
            w.WritePropertyName("input");
            using (var input = JsonDocument.Parse(revision.InputJson))
            {
                input.RootElement.WriteTo(w);
            }

            w.WriteEndObject();
        }

        return buffer.ToArray();
    }

    /// <summary>Reads a design file; every problem is keyed by its path in the file (<c>input.cell.capacityAh</c>).</summary>
    public static DesignFile Read(string text, JsonSerializerOptions apiJson)
    {
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(text))
        {
            return Fail("file", "The file is empty: paste or upload a design exported from PackDesigner.");
        }

        if (Encoding.UTF8.GetByteCount(text) > MaxBytes)
        {
            return Fail("file", string.Create(CultureInfo.InvariantCulture, $"The file is larger than {MaxBytes / 1024} KiB; a design file is a few kilobytes."));
        }

        JsonDocument doc;
        try
        {
            doc = JsonDocument.Parse(text, new JsonDocumentOptions { MaxDepth = 32 });
        }
        catch (JsonException ex)
        {
            return Fail("file", string.Create(CultureInfo.InvariantCulture,
                $"The file is not valid JSON (line {(ex.LineNumber ?? 0) + 1}, position {(ex.BytePositionInLine ?? 0) + 1})."));
        }

        using (doc)
        {
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object)
            {
                return Fail("file", "Expected a JSON object with schemaVersion, kind, name and input.");
            }

            CheckSchema(root, errors);
            var name = ReadName(root, errors);
            var hash = root.TryGetProperty("revision", out var rev) && rev.ValueKind == JsonValueKind.Object
                && rev.TryGetProperty("inputHash", out var h) && h.ValueKind == JsonValueKind.String ? h.GetString() : null;
            var input = ReadInput(root, apiJson, errors);
            return new DesignFile(name, errors.Count == 0 ? input : null, hash, errors);
        }
    }

    private static void CheckSchema(JsonElement root, List<ValidationError> errors)
    {
        if (!root.TryGetProperty("schemaVersion", out var v))
        {
            errors.Add(new ValidationError("schemaVersion", "Required: this file does not say its schema version (PackDesigner writes 1)."));
        }
        else if (v.ValueKind != JsonValueKind.Number || !v.TryGetInt32(out var n))
        {
            errors.Add(new ValidationError("schemaVersion", "Expected a whole number (1)."));
        }
        else if (n != SchemaVersion)
        {
            errors.Add(new ValidationError("schemaVersion", string.Create(CultureInfo.InvariantCulture,
                $"This file has schema version {n}; this PackDesigner reads version {SchemaVersion}.")));
        }

        if (!root.TryGetProperty("kind", out var k) || k.ValueKind != JsonValueKind.String)
        {
            errors.Add(new ValidationError("kind", $"Required: \"{Kind}\"."));
        }
        else if (k.GetString() != Kind)
        {
            errors.Add(new ValidationError("kind", $"This is not a design file: kind must be \"{Kind}\"."));
        }
    }

    private static string? ReadName(JsonElement root, List<ValidationError> errors)
    {
        if (!root.TryGetProperty("name", out var n) || n.ValueKind != JsonValueKind.String || string.IsNullOrWhiteSpace(n.GetString()))
        {
            errors.Add(new ValidationError("name", "Required: the design's name, as text."));
            return null;
        }

        var name = n.GetString()!.Trim();
        if (name.Length > FieldLengths.Name)
        {
            errors.Add(new ValidationError("name", string.Create(CultureInfo.InvariantCulture, $"At most {FieldLengths.Name} characters.")));
        }

        return name;
    }

    private static DesignInput? ReadInput(JsonElement root, JsonSerializerOptions apiJson, List<ValidationError> errors)
    {
        if (!root.TryGetProperty("input", out var input) || input.ValueKind != JsonValueKind.Object)
        {
            errors.Add(new ValidationError("input", "Required: the design input, as a JSON object."));
            return null;
        }

        EvaluateRequest? request;
        try
        {
            request = input.Deserialize<EvaluateRequest>(apiJson);
        }
        catch (JsonException ex)
        {
            var field = JsonBody.FieldOf(ex.Path);
            errors.Add(new ValidationError(field == JsonBody.BodyKey ? "input" : "input." + field,
                "Expected " + JsonBody.Describe(typeof(EvaluateRequest), ex.Path, apiJson) + "."));
            return null;
        }

        if (request is null)
        {
            errors.Add(new ValidationError("input", "Required: the design input, as a JSON object."));
            return null;
        }

        var design = DesignRequestMapper.TryMap(request, out var mapping);
        errors.AddRange(mapping.Select(e => e with { Field = "input." + e.Field }));
        return design;
    }

    /// <summary>The lower-case hex SHA-256 the input will be stored under.</summary>
    public static string HashOf(DesignInput input) => CanonicalDesignJson.Sha256Hex(CanonicalDesignJson.Serialize(input));

    private static DesignFile Fail(string field, string message) => new(null, null, null, [new ValidationError(field, message)]);
}

/// <summary>The export download: <c>GET /designs/{id}/revisions/{number}/export.json</c>.</summary>
public static class DesignExportEndpoint
{
    public static IEndpointRouteBuilder MapDesignExport(this IEndpointRouteBuilder app)
    {
        app.MapGet("/designs/{id:int}/revisions/{number:int}/export.json", ExportAsync).ExcludeFromDescription();
        return app;
    }

    private static async Task<IResult> ExportAsync(int id, int number, DesignStore store, TimeProvider clock, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        var revision = design.IsOk ? await store.GetRevisionAsync(id, number, ct) : null;
        if (revision is not { IsOk: true })
        {
            return Results.NotFound();
        }

        var bytes = DesignExchange.Export(design.Value!.Name, revision.Value!, clock.GetUtcNow().UtcDateTime);
        return TypedResults.File(bytes, "application/json", string.Create(CultureInfo.InvariantCulture, $"design-{id}-revision-{number}.json"));
    }
}
