using System.Text.Json;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Web.Demo;

namespace PackDesigner.Web.Pages.Demo;

/// <summary>What the demo scenario contains, and the button that loads it (idempotent; post, redirect, get).</summary>
public sealed class IndexModel(DemoLoader loader) : PageModel
{
    private const string SummaryKey = "DemoSummary";

    public DemoLoadSummary? Summary { get; private set; }

    public void OnGet() =>
        Summary = TempData[SummaryKey] is string json ? JsonSerializer.Deserialize<DemoLoadSummary>(json) : null;

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        TempData[SummaryKey] = JsonSerializer.Serialize(await loader.LoadAsync(ct));
        return RedirectToPage();
    }
}
