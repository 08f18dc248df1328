using System.Globalization;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The design list: search, sort and paging, all done by the database (one query for the rows, one for the count).</summary>
public sealed class IndexModel(DesignStore store) : PageModel
{
    public static IReadOnlyList<(DesignSort Sort, string Text)> SortChoices { get; } =
    [
        (DesignSort.UpdatedNewest, "Last saved, newest first"),
        (DesignSort.UpdatedOldest, "Last saved, oldest first"),
        (DesignSort.NameAscending, "Name, A to Z"),
        (DesignSort.NameDescending, "Name, Z to A"),
        (DesignSort.CustomerAscending, "Customer, A to Z"),
        (DesignSort.CustomerDescending, "Customer, Z to A"),
        (DesignSort.CellAscending, "Library cell, A to Z"),
        (DesignSort.CellDescending, "Library cell, Z to A"),
        (DesignSort.CreatedNewest, "Created, newest first"),
        (DesignSort.CreatedOldest, "Created, oldest first"),
    ];

    public DesignListQuery Query { get; private set; } = null!;

    public PagedResult<DesignRow> Rows { get; private set; } = null!;

    /// <summary>Parts of the address that could not be used (the list shows its defaults for them).</summary>
    public IReadOnlyList<string> Ignored { get; private set; } = [];

    /// <summary>Query string: <c>q</c> search, <c>sort</c>, <c>p</c> page number (Razor Pages keeps "page" for itself), <c>size</c>.</summary>
    public async Task OnGetAsync(string? q, string? sort, string? p, string? size, CancellationToken ct)
    {
        Query = DesignListQuery.Parse(q, sort, p, size, out var errors);
        Ignored = errors.Select(e => $"{e.Field}: {e.Message}").ToList();
        Rows = await store.ListDesignsAsync(Query.Search, Query.Sort, Query.Page, Query.PageSize, ct);
    }

    /// <summary>The list's address with the same search, sort and size on another page.</summary>
    public string PageUrl(int page)
    {
        var parts = new List<string>();
        if (Query.Search is { } s)
        {
            parts.Add("q=" + Uri.EscapeDataString(s));
        }

        if (Query.Sort != DesignSort.UpdatedNewest)
        {
            parts.Add("sort=" + DesignListQuery.NameOf(Query.Sort));
        }

        if (Query.PageSize != DesignListQuery.DefaultPageSize)
        {
            parts.Add("size=" + Query.PageSize.ToString(CultureInfo.InvariantCulture));
        }

        if (page > 1)
        {
            parts.Add("p=" + page.ToString(CultureInfo.InvariantCulture));
        }

        return DesignRoutes.List + (parts.Count > 0 ? "?" + string.Join("&", parts) : string.Empty);
    }
}
