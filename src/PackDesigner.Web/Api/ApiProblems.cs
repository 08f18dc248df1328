using PackDesigner.Core.Validation;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Api;

/// <summary>RFC 9457 ProblemDetails responses of the API.</summary>
public static class ApiProblems
{
    public const string InvalidTitle = "The request has invalid input.";
    public const string InvalidDetail = "Each key of 'errors' is the camelCase path of a field in the request, for example cell.capacityAh.";

    /// <summary>400 with every error grouped by field path, in input order.</summary>
    public static IResult Invalid(IEnumerable<ValidationError> errors)
    {
        var byField = errors
            .GroupBy(e => e.Field, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Select(e => e.Message).Distinct(StringComparer.Ordinal).ToArray(), StringComparer.Ordinal);
        return TypedResults.ValidationProblem(byField, detail: InvalidDetail, title: InvalidTitle);
    }

    /// <summary>400 naming one field.</summary>
    public static IResult Field(string field, string message) => Invalid([new ValidationError(field, message)]);

    public static IResult Status(int statusCode, string title, string detail) =>
        TypedResults.Problem(statusCode: statusCode, title: title, detail: detail);

    public static IResult NotFound(string message) => Status(StatusCodes.Status404NotFound, "Not found.", message);

    public static IResult Conflict(string message) => Status(StatusCodes.Status409Conflict, "Conflict.", message);

    /// <summary>
    /// The ProblemDetails of a failed store operation: 400 with its field errors (keys rewritten by
    /// <paramref name="fieldPath"/> into the request's paths), 404 or 409 with the store's message.
    /// </summary>
    /// <exception cref="ArgumentException">The result is Ok.</exception>
    public static IResult From<T>(StoreResult<T> result, Func<string, string>? fieldPath = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Status switch
        {
            StoreStatus.Invalid => Invalid(result.Errors.Select(e => fieldPath is null ? e : e with { Field = fieldPath(e.Field) })),
            StoreStatus.NotFound => NotFound(result.Message!),
            StoreStatus.Conflict => Conflict(result.Message!),
            _ => throw new ArgumentException("An Ok result is not a problem.", nameof(result)),
        };
    }
}
