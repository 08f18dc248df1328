using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

/// <summary>The new-cell and edit-cell form (<c>/cells/new</c>, <c>/cells/{id}/edit</c>).</summary>
public sealed class CellFormPage(IPage page) : PageObject(page)
{
    public async Task<CellFormPage> OpenNewAsync(string? preset = null)
    {
        await Page.GotoAsync(preset is null ? "/cells/new" : "/cells/new?preset=" + preset);
        return this;
    }

    public async Task<CellFormPage> OpenEditAsync(int id)
    {
        await Page.GotoAsync($"/cells/{id}/edit");
        return this;
    }

    public Task SetNameAsync(string name) => FillAsync("Input.Name", name);

    /// <summary>A datasheet figure by its property, e.g. <c>CapacityAh</c>.</summary>
    public Task SetFigureAsync(string property, string value) => FillAsync("Input.Cell." + property, value);

    public Task<string> FigureAsync(string property) => Field("Input.Cell." + property).InputValueAsync();

    public async Task FillPresetAsync(string chemistry)
    {
        await Field("Input.Cell.Chemistry").SelectOptionAsync(chemistry);
        await SubmitAsync("fill-preset");
    }

    public Task PasteOcvTableAsync(string rows) => FillAsync("Input.Cell.OcvTable", rows);

    public Task ChooseOcvFileAsync(string path) => Page.Locator("input[name='OcvFile']").SetInputFilesAsync(path);

    public Task PreviewAsync() => SubmitAsync("preview-ocv");

    public Task SaveAsync() => SubmitAsync("save-cell");

    public ILocator Preview => ByTestId("ocv-preview");

    public ILocator PreviewRows => ByTestId("ocv-preview-row");

    public ILocator PreviewRow(int line) => Page.Locator($"[data-testid='ocv-preview-row'][data-line='{line}']");

    public ILocator PreviewOk => ByTestId("ocv-preview-ok");

    public ILocator Conflict => ByTestId("conflict");

    public ILocator Error(string apiPath) => ByTestId("error-" + apiPath);
}

/// <summary>A library cell's page (<c>/cells/{id}</c>).</summary>
public sealed class CellDetailsPage(IPage page) : PageObject(page)
{
    public int Id => IdFromPath("/cells");

    public ILocator Name => ByTestId("cell-name");

    public ILocator OcvRows => ByTestId("ocv-row");

    public ILocator SavedMessage => ByTestId("saved-message");

    public Task EditAsync() => SubmitAsync("edit-cell");

    public Task CloneAsync() => SubmitAsync("clone-cell");
}
