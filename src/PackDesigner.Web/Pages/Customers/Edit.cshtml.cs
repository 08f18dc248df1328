using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Results;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Customers;

public sealed class EditModel(CustomerService customers) : PageModel
{
    [BindProperty]
    public CustomerForm Input { get; set; } = new();

    public int Id { get; private set; }

    public string StoredName { get; private set; } = string.Empty;

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var customer = await customers.GetAsync(id, ct);
        if (!customer.IsOk)
        {
            return NotFound();
        }

        (Id, StoredName, Input) = (id, customer.Value!.Name, CustomerForm.From(customer.Value));
        return Page();
    }

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        ModelState.Clear();
        var result = await customers.UpdateAsync(id, Input.ToData(), ct);
        if (result.IsOk)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = "Your changes were saved.";
            return RedirectToPage("/Customers/Details", new { id });
        }

        (Id, StoredName) = (id, Input.Name ?? string.Empty);
        var errors = result.Status == StoreStatus.NotFound
            ? [new Core.Validation.ValidationError("", "This customer has been deleted since you opened it; nothing was saved.")]
            : result.Errors;
        Problems = CustomerFormErrors.Show(ModelState, errors, CustomerFormErrors.CustomerFields, "Customer");
        return Page();
    }
}
