using Microsoft.Playwright;
using PackDesigner.Browser.Tests.Infrastructure;
using PackDesigner.Browser.Tests.Pages;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Browser.Tests;

/// <summary>The design form at <c>/</c> in a real browser: fill, calculate, read the results and findings.</summary>
public sealed class EvaluatePageTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    [SkippableFact]
    public async Task Calculate_DemoDesign_ShowsResultsAndTheFindingsCoreGives()
    {
        var page = await new EvaluatePage(await browser.NewPageAsync()).OpenAsync();
        await page.ScreenshotAsync(browser.ScreenshotDir, "evaluate-1-form");

        await page.CalculateAsync();

        await Assertions.Expect(page.Results).ToBeVisibleAsync();
        await Assertions.Expect(page.ByTestId("result-thresholds")).ToBeVisibleAsync();
        await Assertions.Expect(page.ByTestId("result-ladder")).ToBeVisibleAsync();
        var core = DesignEvaluator.Evaluate(DemoScenario.PickupConversion).Result!;
        await Assertions.Expect(page.Findings).ToHaveCountAsync(core.Findings.Count);
        await page.ScreenshotAsync(browser.ScreenshotDir, "evaluate-2-results");
    }

    [SkippableFact]
    public async Task Calculate_FloatingCharger_ShowsItsFinding()
    {
        var page = await new EvaluatePage(await browser.NewPageAsync()).OpenAsync();

        await page.Field("Input.Charger.FloatStage").CheckAsync();
        await page.CalculateAsync();

        await Assertions.Expect(page.Page.Locator("[data-testid='finding'][data-code='charger.float-stage']")).ToBeVisibleAsync();
    }

    [SkippableFact]
    public async Task Calculate_BadNumber_ShowsTheMessageBesideTheFieldAndNoResults()
    {
        var page = await new EvaluatePage(await browser.NewPageAsync()).OpenAsync();

        await page.FillAsync("Input.Cell.CapacityAh", "3,2");
        await page.CalculateAsync();

        await Assertions.Expect(page.Error("cell.capacityAh")).ToContainTextAsync("point as the decimal separator");
        await Assertions.Expect(page.ErrorSummary).ToBeVisibleAsync();
        await Assertions.Expect(page.Results).ToHaveCountAsync(0);
        await Assertions.Expect(page.Field("Input.Cell.CapacityAh")).ToHaveValueAsync("3,2");
        await page.ScreenshotAsync(browser.ScreenshotDir, "evaluate-3-field-error");
    }
}
