using System.Globalization;
using Microsoft.Playwright;
using PackDesigner.Browser.Tests.Infrastructure;
using PackDesigner.Browser.Tests.Pages;
using PackDesigner.Core.Cells;

namespace PackDesigner.Browser.Tests;

/// <summary>Creating library cells and customers in a real browser, the way a shop starts.</summary>
public sealed class LibraryTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    [SkippableFact]
    public async Task CreateCell_FromAPresetWithAPastedTable_PreviewsRowErrorsThenSaves()
    {
        var form = await new CellFormPage(await browser.NewPageAsync()).OpenNewAsync("nmc");
        Assert.Equal(ChemistryPresets.Nmc.CapacityAh.ToString(CultureInfo.InvariantCulture), await form.FigureAsync("CapacityAh"));

        await form.FillPresetAsync("lfp");
        Assert.Equal(ChemistryPresets.Lfp.MaxChargeVoltage.ToString(CultureInfo.InvariantCulture), await form.FigureAsync("MaxChargeVoltage"));

        await form.SetNameAsync("Browser cell Ω");
        await form.SetFigureAsync("CapacityAh", "105");
        await form.PasteOcvTableAsync("0,2.5\n50,3.3\n40,3.31\n100,3.6");
        await form.PressEnterAsync("Input.Name");

        // Enter saves (here: refuses the table), it does not fill in the preset over the typed figures.
        Assert.Equal("105", await form.FigureAsync("CapacityAh"));
        await Assertions.Expect(form.PreviewRow(3)).ToContainTextAsync("increase strictly");
        await Assertions.Expect(form.Error("cell.ocvCurve")).ToBeVisibleAsync();
        await form.ScreenshotAsync(browser.ScreenshotDir, "cell-1-preview-errors");

        await form.PasteOcvTableAsync("0,2.5\n40,3.29\n50,3.3\n100,3.6");
        await form.SaveAsync();
        await Assertions.Expect(form.PreviewOk).ToBeVisibleAsync();
        await Assertions.Expect(form.PreviewRows).ToHaveCountAsync(4);
        await form.ScreenshotAsync(browser.ScreenshotDir, "cell-2-preview-ok");

        await form.SaveAsync();

        var details = new CellDetailsPage(form.Page);
        await Assertions.Expect(details.Name).ToHaveTextAsync("Browser cell Ω");
        await Assertions.Expect(details.OcvRows).ToHaveCountAsync(4);
        await Assertions.Expect(details.SavedMessage).ToBeVisibleAsync();
        await details.ScreenshotAsync(browser.ScreenshotDir, "cell-3-saved");
    }

    [SkippableFact]
    public async Task CreateCell_UploadedCsv_IsShownAsAPreviewBeforeSaving()
    {
        var file = Path.Combine(Path.GetTempPath(), "pd-ocv-" + Guid.NewGuid().ToString("N") + ".csv");
        await File.WriteAllTextAsync(file, "socPercent,voltage\n0,2.6\n25,3.25\n75,3.34\n100,3.55\n");
        try
        {
            var form = await new CellFormPage(await browser.NewPageAsync()).OpenNewAsync();
            await form.SetNameAsync("Uploaded table cell");
            await form.ChooseOcvFileAsync(file);
            await form.SaveAsync();

            await Assertions.Expect(form.PreviewOk).ToBeVisibleAsync();
            await Assertions.Expect(form.Field("Input.Cell.OcvTable")).ToHaveValueAsync(new System.Text.RegularExpressions.Regex("25,3.25"));
            await form.ScreenshotAsync(browser.ScreenshotDir, "cell-4-upload-preview");

            await form.SaveAsync();
            await Assertions.Expect(new CellDetailsPage(form.Page).OcvRows).ToHaveCountAsync(4);
        }
        finally
        {
            File.Delete(file);
        }
    }

    [SkippableFact]
    public async Task EditCell_InTwoTabs_TheSecondSaveShowsTheConflictAndKeepsItsInput()
    {
        var form = await new CellFormPage(await browser.NewPageAsync()).OpenNewAsync();
        await form.SetNameAsync("Two tabs");
        await form.SaveAsync();
        var id = new CellDetailsPage(form.Page).Id;

        var first = await new CellFormPage(await browser.NewPageAsync()).OpenEditAsync(id);
        var second = await new CellFormPage(await browser.NewPageAsync()).OpenEditAsync(id);
        await first.SetFigureAsync("CapacityAh", "90");
        await first.SaveAsync();
        await second.SetFigureAsync("CapacityAh", "120");
        await second.SaveAsync();

        await Assertions.Expect(second.Conflict).ToContainTextAsync("Someone else");
        await Assertions.Expect(second.Field("Input.Cell.CapacityAh")).ToHaveValueAsync("120");
        await second.ScreenshotAsync(browser.ScreenshotDir, "cell-5-conflict");
    }

    [SkippableFact]
    public async Task CreateCustomer_WithAJob_ShowsBothOnTheCustomersPage()
    {
        var form = await new CustomerFormPage(await browser.NewPageAsync()).OpenNewAsync();
        await form.SaveAsync();
        await Assertions.Expect(form.Error("name")).ToBeVisibleAsync();

        await form.EnterAsync("Browser customer 顧客", "browser@example.invalid");
        await form.SaveAsync();

        var details = new CustomerDetailsPage(form.Page);
        await Assertions.Expect(details.Name).ToHaveTextAsync("Browser customer 顧客");
        await details.AddJobAsync("Harbour launch", "6 m launch (test)");
        await Assertions.Expect(details.Jobs).ToHaveCountAsync(1);
        await Assertions.Expect(details.Jobs.First).ToContainTextAsync("6 m launch (test)");
        await details.ScreenshotAsync(browser.ScreenshotDir, "customer-1-with-job");
    }
}
