using System.Globalization;
using System.Text.Json;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Designs;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// The design list's query string (<c>search</c>, <c>sort</c>, <c>page</c>, <c>pageSize</c>) read for the page and
/// the API alike. Sort names are the camelCase names of <see cref="DesignSort"/>, for example <c>nameAscending</c>.
/// </summary>
public sealed record DesignListQuery(string? Search, DesignSort Sort, int Page, int PageSize)
{
    public const int DefaultPageSize = 25;

    public static IReadOnlyList<string> SortNames { get; } =
        Enum.GetNames<DesignSort>().Select(JsonNamingPolicy.CamelCase.ConvertName).ToArray();

    /// <summary>The camelCase name of a sort order, as the query string writes it.</summary>
    public static string NameOf(DesignSort sort) => JsonNamingPolicy.CamelCase.ConvertName(sort.ToString());

    /// <summary>Reads the query; each value that cannot be used gives an error keyed by its parameter name.</summary>
    public static DesignListQuery Parse(string? search, string? sort, string? page, string? pageSize, out IReadOnlyList<ValidationError> errors)
    {
        var list = new List<ValidationError>();
        var order = DesignSort.UpdatedNewest;
        if (!string.IsNullOrWhiteSpace(sort))
        {
            var i = Array.FindIndex(SortNames.ToArray(), n => string.Equals(n, sort.Trim(), StringComparison.OrdinalIgnoreCase));
            if (i < 0)
            {
                list.Add(new ValidationError("sort", "Choose one of: " + string.Join(", ", SortNames) + "."));
            }
            else
            {
                order = Enum.GetValues<DesignSort>()[i];
            }
        }

        var number = Whole(list, "page", page, 1, int.MaxValue / DesignStore.MaxPageSize, 1);
        var size = Whole(list, "pageSize", pageSize, 1, DesignStore.MaxPageSize, DefaultPageSize);
        var text = string.IsNullOrWhiteSpace(search) ? null : search.Trim();
        if (text is { Length: > 200 })
        {
            list.Add(new ValidationError("search", "Search for at most 200 characters."));
            text = null;
        }

        errors = list;
        return new DesignListQuery(text, order, number, size);
    }

    private static int Whole(List<ValidationError> errors, string field, string? text, int min, int max, int fallback)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return fallback;
        }

        if (int.TryParse(text.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var value) && value >= min && value <= max)
        {
            return value;
        }

        errors.Add(new ValidationError(field, string.Create(CultureInfo.InvariantCulture, $"Enter a whole number from {min} to {max}.")));
        return fallback;
    }
}
