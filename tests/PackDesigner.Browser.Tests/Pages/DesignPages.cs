using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

// ADAPT AFTER MERGE: the design pages come from the `designs` branch. These page objects follow the routes and
// test ids agreed for it (/designs/new with the / form's input names plus Name, data-testid="save-design",
// /designs/{id} with data-testid="revision-row", /designs/{id}/compare?a=&b= with data-testid="compare-table").
// The edit route (/designs/{id}/edit) and the customer/cell selects (a <select> whose name ends in CustomerId or
// CellId) are assumptions; check them against the merged pages.

/// <summary>The design form of <c>/designs/new</c> and <c>/designs/{id}/edit</c>.</summary>
public sealed class DesignFormPage(IPage page) : PageObject(page)
{
    public async Task<DesignFormPage> OpenNewAsync()
    {
        await Page.GotoAsync("/designs/new");
        return this;
    }

    public async Task<DesignFormPage> OpenEditAsync(int id)
    {
        await Page.GotoAsync($"/designs/{id}/edit");
        return this;
    }

    public Task SetNameAsync(string name) => FillAsync("Name", name);

    /// <summary>Chooses an option by its visible text in the first select whose name ends with <paramref name="nameEnding"/>, when the form has one.</summary>
    public async Task<bool> TryChooseAsync(string nameEnding, string optionText)
    {
        var select = Page.Locator($"select[name$='{nameEnding}']").First;
        if (await select.CountAsync() == 0)
        {
            return false;
        }

        await select.SelectOptionAsync(new SelectOptionValue { Label = optionText });
        return true;
    }

    public Task SaveAsync() => SubmitAsync("save-design");
}

/// <summary>A design's page (<c>/designs/{id}</c>) with its revision history.</summary>
public sealed class DesignViewPage(IPage page) : PageObject(page)
{
    public int Id => IdFromPath("/designs");

    public ILocator Revisions => ByTestId("revision-row");
}

/// <summary>The comparison of two revisions (<c>/designs/{id}/compare?a=1&amp;b=2</c>).</summary>
public sealed class DesignComparePage(IPage page) : PageObject(page)
{
    public async Task<DesignComparePage> OpenAsync(int id, int a, int b)
    {
        await Page.GotoAsync($"/designs/{id}/compare?a={a}&b={b}");
        return this;
    }

    public ILocator Table => ByTestId("compare-table");
}
