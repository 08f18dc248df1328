using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Results;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Customers;

/// <summary>Edits or deletes one job of a customer (a job of another customer is not found here).</summary>
public sealed class EditJobModel(CustomerService customers) : PageModel
{
    [BindProperty]
    public JobForm Input { get; set; } = new();

    public int Id { get; private set; }

    public string CustomerName { get; private set; } = string.Empty;

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    public string? Refusal { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, int jobId, CancellationToken ct)
    {
        var job = await LoadAsync(id, jobId, ct);
        if (job is null)
        {
            return NotFound();
        }

        Input = JobForm.From(job);
        return Page();
    }

    public async Task<IActionResult> OnPostAsync(int id, int jobId, CancellationToken ct)
    {
        if (await LoadAsync(id, jobId, ct) is null)
        {
            return NotFound();
        }

        ModelState.Clear();
        var result = await customers.UpdateJobAsync(jobId, Input.ToData(), ct);
        if (result.IsOk)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = "Your changes to the job were saved.";
            return RedirectToPage("/Customers/Details", new { id });
        }

        Problems = CustomerFormErrors.Show(ModelState, result.Errors, CustomerFormErrors.JobFields, "Job");
        return Page();
    }

    public async Task<IActionResult> OnPostDeleteAsync(int id, int jobId, CancellationToken ct)
    {
        var job = await LoadAsync(id, jobId, ct);
        if (job is null)
        {
            return NotFound();
        }

        var result = await customers.DeleteJobAsync(jobId, ct);
        if (result.Status is StoreStatus.Ok or StoreStatus.NotFound)
        {
            TempData[CustomerFormErrors.SavedMessageKey] = "The job was deleted.";
            return RedirectToPage("/Customers/Details", new { id });
        }

        ModelState.Clear();
        Input = JobForm.From(job);
        Refusal = string.Join(" ", result.Errors.Select(e => e.Message));
        return Page();
    }

    private async Task<JobDetails?> LoadAsync(int id, int jobId, CancellationToken ct)
    {
        var customer = await customers.GetAsync(id, ct);
        var job = customer.Value?.Jobs.FirstOrDefault(j => j.Id == jobId);
        (Id, CustomerName) = (id, customer.Value?.Name ?? string.Empty);
        return job;
    }
}
