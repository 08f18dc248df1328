using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Customers;

public sealed class NewModel(CustomerService customers) : PageModel
{
    [BindProperty]
    public CustomerForm Input { get; set; } = new();

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        ModelState.Clear();
        var result = await customers.CreateAsync(Input.ToData(), ct);
        if (result.IsOk)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = "The customer was added.";
            return RedirectToPage("/Customers/Details", new { id = result.Value!.Id });
        }

        Problems = CustomerFormErrors.Show(ModelState, result.Errors, CustomerFormErrors.CustomerFields, "Customer");
        return Page();
    }
}
