using Microsoft.AspNetCore.Mvc;
using PackDesigner.Data.Storage;

namespace PackDesigner.Web.Demo;

/// <summary>
/// The first-run offer to load the demo scenario, shown while the database has no designs. When storage cannot be
/// reached it shows nothing, so the page around it still works.
/// </summary>
public sealed class DemoOfferViewComponent(DemoLoader loader) : ViewComponent
{
    public async Task<IViewComponentResult> InvokeAsync()
    {
        try
        {
            return await loader.HasNoDesignsAsync(HttpContext.RequestAborted) ? View() : Content(string.Empty);
        }
        catch (StorageUnavailableException)
        {
            return Content(string.Empty);
        }
    }
}
