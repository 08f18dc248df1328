using Microsoft.Playwright;
using PackDesigner.Browser.Tests.Infrastructure;
using PackDesigner.Browser.Tests.Pages;

namespace PackDesigner.Browser.Tests;

/// <summary>
/// The walk: create a cell, a customer and a design, save, edit, see revision 2, compare revisions 1 and 2.
/// </summary>
public sealed class DesignWalkTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    [SkippableFact]
    public async Task Walk_CellCustomerDesignEditAndCompare_ShowsRevisionTwoAndTheComparison()
    {
        var tab = await browser.NewPageAsync();
        var cellForm = await new CellFormPage(tab).OpenNewAsync("lfp");
        await cellForm.SetNameAsync("Walk cell");
        await cellForm.SetFigureAsync("CapacityAh", "100");
        await cellForm.SaveAsync();
        await Assertions.Expect(new CellDetailsPage(tab).Name).ToHaveTextAsync("Walk cell");

        var customerForm = await new CustomerFormPage(tab).OpenNewAsync();
        await customerForm.EnterAsync("Walk customer");
        await customerForm.SaveAsync();
        await Assertions.Expect(new CustomerDetailsPage(tab).Name).ToHaveTextAsync("Walk customer");

        var design = await new DesignFormPage(tab).OpenNewAsync();
        await design.SetNameAsync("Walk design");
        await design.FillAsync("Design.SavedBy", "Walk tester");
        await design.ChooseAsync("Design.Owner", "Walk customer");
        await design.ChooseAsync("Design.CellId", "Walk cell");
        await design.ScreenshotAsync(browser.ScreenshotDir, "walk-1-new-design");
        await design.SaveAsync();

        var view = new DesignViewPage(tab);
        var id = view.Id;
        await Assertions.Expect(view.Revisions).ToHaveCountAsync(1);

        var edit = await new DesignFormPage(tab).OpenEditAsync(id);
        await edit.FillAsync("Input.Series", "30");
        await edit.SaveAsync();
        await Assertions.Expect(view.Revisions).ToHaveCountAsync(2);
        await view.ScreenshotAsync(browser.ScreenshotDir, "walk-2-revision-2");

        var compare = await new DesignComparePage(tab).OpenAsync(id, 1, 2);
        await Assertions.Expect(compare.Table).ToBeVisibleAsync();
        await Assertions.Expect(compare.Table).ToContainTextAsync("30");
        await compare.ScreenshotAsync(browser.ScreenshotDir, "walk-3-compare");
    }
}
