using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Customers;

/// <summary>A customer: contact, notes, jobs and designs (newest first, paged in the database).</summary>
public sealed class DetailsModel(CustomerService customers, DesignStore designs) : PageModel
{
    public const int DesignPageSize = 20;

    public CustomerDetails? Customer { get; private set; }

    public PagedResult<DesignRow>? Designs { get; private set; }

    public Pager? Pager { get; private set; }

    public string? SavedMessage { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, int? page, CancellationToken ct)
    {
        var customer = await customers.GetAsync(id, ct);
        var list = await designs.ListCustomerDesignsAsync(id, DesignSort.UpdatedNewest, page ?? 1, DesignPageSize, ct);
        if (!customer.IsOk || !list.IsOk)
        {
            return NotFound();
        }

        Customer = customer.Value!;
        Designs = list.Value!;
        Pager = new Pager(Designs.Page, Designs.PageCount, Designs.TotalCount, $"/customers/{id}", null);
        SavedMessage = TempData[CustomerFormErrors.SavedMessageKey] as string;
        return Page();
    }

    public static string StatusText(RevisionStatus status) => status switch
    {
        RevisionStatus.Submitted => "submitted for review",
        RevisionStatus.SignedOff => "signed off",
        _ => status.ToString().ToLowerInvariant(),
    };
}
