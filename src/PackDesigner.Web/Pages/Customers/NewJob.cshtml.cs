using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Customers;

public sealed class NewJobModel(CustomerService customers) : PageModel
{
    [BindProperty]
    public JobForm Input { get; set; } = new();

    public int Id { get; private set; }

    public string CustomerName { get; private set; } = string.Empty;

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct) =>
        await LoadAsync(id, ct) ? Page() : NotFound();

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        if (!await LoadAsync(id, ct))
        {
            return NotFound();
        }

        ModelState.Clear();
        var result = await customers.CreateJobAsync(id, Input.ToData(), ct);
        if (result.IsOk)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = "The job was added.";
            return RedirectToPage("/Customers/Details", new { id });
        }

        Problems = CustomerFormErrors.Show(ModelState, result.Errors, CustomerFormErrors.JobFields, "Job");
        return Page();
    }

    private async Task<bool> LoadAsync(int id, CancellationToken ct)
    {
        var customer = await customers.GetAsync(id, ct);
        (Id, CustomerName) = (id, customer.Value?.Name ?? string.Empty);
        return customer.IsOk;
    }
}
