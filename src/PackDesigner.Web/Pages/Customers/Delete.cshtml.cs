using System.Globalization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Customers;

/// <summary>Confirms and deletes a customer; refused, with the reason, while jobs or designs refer to it.</summary>
public sealed class DeleteModel(CustomerService customers, DesignStore designs) : PageModel
{
    public int Id { get; private set; }

    public string Name { get; private set; } = string.Empty;

    /// <summary>Why the customer cannot be deleted, when it cannot.</summary>
    public string? Refusal { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var customer = await customers.GetAsync(id, ct);
        if (!customer.IsOk)
        {
            return NotFound();
        }

        (Id, Name) = (id, customer.Value!.Name);
        var jobs = customer.Value.Jobs.Count;
        var designCount = (await designs.ListCustomerDesignsAsync(id, DesignSort.UpdatedNewest, 1, 1, ct)).Value?.TotalCount ?? 0;
        if (jobs > 0 || designCount > 0)
        {
            Refusal = string.Create(CultureInfo.InvariantCulture,
                $"This customer has {Count(jobs, "job")} and {Count(designCount, "design")}. Designs are the shop's records and keep their customer: move the designs to another customer and delete the jobs first.");
        }

        return Page();
    }

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        var result = await customers.DeleteAsync(id, ct);
        if (result.Status is StoreStatus.Ok or StoreStatus.NotFound)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = result.IsOk ? "The customer was deleted." : "The customer had already been deleted.";
            return RedirectToPage("/Customers/Index");
        }

        var customer = await customers.GetAsync(id, ct);
        (Id, Name) = (id, customer.Value?.Name ?? string.Empty);
        Refusal = string.Join(" ", result.Errors.Select(e => e.Message));
        return Page();
    }

    private static string Count(int n, string what) => string.Create(CultureInfo.InvariantCulture, $"{n} {what}{(n == 1 ? "" : "s")}");
}
