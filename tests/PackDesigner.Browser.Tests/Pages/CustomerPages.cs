using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

/// <summary>The customer form (<c>/customers/new</c>, <c>/customers/{id}/edit</c>).</summary>
public sealed class CustomerFormPage(IPage page) : PageObject(page)
{
    public async Task<CustomerFormPage> OpenNewAsync()
    {
        await Page.GotoAsync("/customers/new");
        return this;
    }

    public async Task EnterAsync(string name, string? contact = null)
    {
        await FillAsync("Input.Name", name);
        if (contact is not null)
        {
            await FillAsync("Input.Contact", contact);
        }
    }

    public Task SaveAsync() => SubmitAsync("save-customer");

    public ILocator Error(string apiPath) => ByTestId("error-" + apiPath);
}

/// <summary>A customer's page (<c>/customers/{id}</c>) with its jobs and designs.</summary>
public sealed class CustomerDetailsPage(IPage page) : PageObject(page)
{
    public int Id => IdFromPath("/customers");

    public ILocator Name => ByTestId("customer-name");

    public ILocator Jobs => ByTestId("job-row");

    public ILocator Designs => ByTestId("customer-design-row");

    public async Task AddJobAsync(string title, string vehicleOrSystem)
    {
        await SubmitAsync("add-job");
        await FillAsync("Input.Title", title);
        await FillAsync("Input.VehicleOrSystem", vehicleOrSystem);
        await SubmitAsync("save-job");
    }
}
