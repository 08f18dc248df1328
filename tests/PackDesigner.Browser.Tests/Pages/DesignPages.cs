using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

// The design pages: /designs/new and /designs/{id}/edit (fields Design.Name, Design.Owner, Design.CellId and the
// design form's Input.* fields; save button data-testid="save"), /designs/{id} with data-testid="revision-row",
// /designs/{id}/compare?a=&b= with the changed inputs in data-testid="compare-inputs".

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

    public Task SetNameAsync(string name) => FillAsync("Design.Name", name);

    /// <summary>Chooses the first option of the select <paramref name="name"/> whose visible text contains <paramref name="optionText"/>.</summary>
    public async Task ChooseAsync(string name, string optionText)
    {
        var select = Page.Locator($"select[name='{name}']");
        var value = await select.Locator("option", new() { HasTextString = optionText }).First.GetAttributeAsync("value");
        await select.SelectOptionAsync(value ?? string.Empty);
    }

    public Task SaveAsync() => SubmitAsync("save");
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

    public ILocator Table => ByTestId("compare-inputs");
}
