using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Pages;

/// <summary>The design form at <c>/</c> and its results.</summary>
public sealed class EvaluatePage(IPage page) : PageObject(page)
{
    public async Task<EvaluatePage> OpenAsync()
    {
        await Page.GotoAsync("/");
        return this;
    }

    public Task CalculateAsync() => SubmitAsync("calculate");

    public ILocator Results => ByTestId("results");

    public ILocator Findings => ByTestId("finding");

    public ILocator ErrorSummary => ByTestId("error-summary");

    public ILocator Error(string apiPath) => ByTestId("error-" + apiPath);

    public ILocator DemoOffer => ByTestId("demo-offer");
}
