using PackDesigner.Core.Validation;

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
}
