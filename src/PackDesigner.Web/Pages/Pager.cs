using System.Globalization;
using Microsoft.AspNetCore.WebUtilities;

namespace PackDesigner.Web.Pages;

/// <summary>Where a list page is: its page, the page count, and the links to the others (the search is kept).</summary>
public sealed record Pager(int Page, int PageCount, int TotalCount, string Path, string? Search)
{
    public bool HasPrevious => Page > 1;

    public bool HasNext => Page < PageCount;

    public string Href(int page)
    {
        var query = new Dictionary<string, string?>(StringComparer.Ordinal);
        if (!string.IsNullOrWhiteSpace(Search))
        {
            query["q"] = Search;
        }

        if (page > 1)
        {
            query["page"] = page.ToString(CultureInfo.InvariantCulture);
        }

        return QueryHelpers.AddQueryString(Path, query);
    }
}
