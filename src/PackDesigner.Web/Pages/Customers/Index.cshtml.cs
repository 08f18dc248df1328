using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;

namespace PackDesigner.Web.Pages.Customers;

/// <summary>The customers, searched and paged in the database.</summary>
public sealed class IndexModel(CustomerService customers) : PageModel
{
    public const int PageSize = 25;

    public string? Search { get; private set; }

    public IReadOnlyList<CustomerRow> Rows { get; private set; } = [];

    public Pager? Pager { get; private set; }

    public string? SavedMessage { get; private set; }

    public async Task OnGetAsync(string? q, int? page, CancellationToken ct)
    {
        Search = q?.Trim();
        var result = await customers.ListAsync(Search, page ?? 1, PageSize, ct);
        Rows = result.Items;
        Pager = new Pager(result.Page, result.PageCount, result.TotalCount, "/customers", Search);
        SavedMessage = TempData[CustomerFormErrors.SavedMessageKey] as string;
    }
}
