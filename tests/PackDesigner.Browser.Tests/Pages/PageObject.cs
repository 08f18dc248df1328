using System.Text.RegularExpressions;
using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

/// <summary>What every page object shares: the browser page, test-id lookups and form fields by their name.</summary>
public abstract partial class PageObject(IPage page)
{
    public IPage Page { get; } = page;

    public ILocator ByTestId(string testId) => Page.Locator($"[data-testid='{testId}']");

    /// <summary>A form control by its name attribute (for example <c>Input.Cell.CapacityAh</c>).</summary>
    public ILocator Field(string name) => Page.Locator($"[name='{name}']").First;

    public Task FillAsync(string name, string value) => Field(name).FillAsync(value);

    /// <summary>
    /// Clicks a control that submits a form or follows a link and waits for the new document (the old one is
    /// marked first, so a post that re-renders the same address is waited for too).
    /// </summary>
    protected Task SubmitAsync(string testId) => NavigateByAsync(() => ByTestId(testId).ClickAsync());

    /// <summary>Presses Enter in a field, as people do to send a form, and waits for the page it leads to.</summary>
    public Task PressEnterAsync(string name) => NavigateByAsync(() => Field(name).PressAsync("Enter"));

    private async Task NavigateByAsync(Func<Task> action)
    {
        await Page.EvaluateAsync("() => { window.__pdBefore = true; }");
        await action();
        await Page.WaitForFunctionAsync("() => window.__pdBefore !== true");
        await Page.WaitForLoadStateAsync(LoadState.Load);
    }

    /// <summary>The id in a path such as <c>/cells/12</c> or <c>/customers/3/edit</c>.</summary>
    public int IdFromPath(string prefix)
    {
        var m = Regex.Match(new Uri(Page.Url).AbsolutePath, "^" + Regex.Escape(prefix) + @"/(\d+)");
        return m.Success ? int.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) : throw new InvalidOperationException($"No id after {prefix} in {Page.Url}.");
    }

    public Task ScreenshotAsync(string directory, string name) =>
        Page.ScreenshotAsync(new() { Path = Path.Combine(directory, name + ".png"), FullPage = true });
}
