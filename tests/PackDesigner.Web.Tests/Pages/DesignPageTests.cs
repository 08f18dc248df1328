using System.Globalization;
using Microsoft.AspNetCore.Mvc.Testing;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The design page, used as a browser would: load, change fields, post with the antiforgery token.</summary>
public sealed class DesignPageTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    [Fact]
    public async Task Get_Root_ShowsTheFormWithTheDemoDesign()
    {
        var page = await DesignPage.OpenAsync(_client);

        Assert.Equal(200, page.Status);
        var demo = DemoScenario.PickupConversion;
        Assert.Equal(Invariant(demo.Cell.CapacityAh!.Value), page.Value("Input.Cell.CapacityAh"));
        Assert.Equal(Invariant(demo.Cell.InternalResistanceMilliohm!.Value), page.Value("Input.Cell.InternalResistanceMilliohm"));
        Assert.Equal(Invariant(demo.Series), page.Value("Input.Series"));
        Assert.Equal(Invariant(demo.Controller.MaxVoltage), page.Value("Input.Controller.MaxVoltage"));
        Assert.Equal("lfp", page.Value("Input.Cell.Chemistry"));
        Assert.Equal("bottom", page.Value("Input.Balancing"));
        Assert.NotNull(page.Value("__RequestVerificationToken"));
        Assert.NotNull(page.ByTestId("safety-caution"));
        Assert.Null(page.ByTestId("results"));
        Assert.Null(page.Document.QuerySelector("details[data-testid='margins'][open]"));
    }

    [Fact]
    public async Task Post_DemoForm_ShowsEveryResultSectionWithCoreNumbers()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client);

        Assert.Equal(200, result.Status);
        foreach (var section in new[] { "result-pack", "result-thresholds", "result-charger", "result-protection", "result-energy", "result-thermal", "result-ladder", "result-findings" })
        {
            Assert.NotNull(result.ByTestId(section));
        }

        var core = DesignEvaluator.Evaluate(DemoScenario.PickupConversion).Result!;
        var pack = result.ByTestId("result-pack")!.TextContent;
        Assert.Contains(core.Pack.MaxVoltage.ToString("0.0", CultureInfo.InvariantCulture) + "\u00a0V", pack);
        Assert.Contains(core.Charger.ConstantVoltage.ToString("0.00", CultureInfo.InvariantCulture) + "\u00a0V", result.ByTestId("result-charger")!.TextContent);
        Assert.Equal(core.Ladder.Count, result.Document.QuerySelectorAll("[data-testid='ladder-row']").Length);
        Assert.Equal(core.Findings.Select(f => f.Code), result.Findings.Select(f => f.GetAttribute("data-code")));
        Assert.All(result.Findings, f =>
        {
            var severity = f.GetAttribute("data-severity")!;
            Assert.Contains(severity, new[] { "error", "warning", "info" });
            Assert.Contains($"finding-{severity}", f.ClassList);
            Assert.Equal(severity, f.QuerySelector(".severity")!.TextContent.ToLowerInvariant());
        });
        Assert.Null(result.ByTestId("error-summary"));
    }

    [Fact]
    public async Task Post_ProblemDesign_ShowsItsFindingAsText()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { ["Input.Charger.FloatStage"] = "true" });

        var finding = Assert.Single(result.Findings, f => f.GetAttribute("data-code") == "charger.float-stage");
        Assert.Equal("Error", finding.QuerySelector(".severity")!.TextContent);
        Assert.Contains("float", finding.TextContent);
    }

    [Theory]
    [InlineData("Input.Cell.CapacityAh", "abc", "cell.capacityAh", "Enter a number")]
    [InlineData("Input.Cell.NominalVoltage", "3,2", "cell.nominalVoltage", "point as the decimal separator")]
    [InlineData("Input.Parallel", "0", "parallel", "at least 1")]
    [InlineData("Input.Series", "", "series", "Required")]
    [InlineData("Input.Controller.MaxVoltage", "-5", "controller.maxVoltage", "above 0 V")]
    [InlineData("Input.Cell.Chemistry", "plutonium", "cell.chemistry", "Choose one of")]
    public async Task Post_BadValue_ShowsTheMessageBesideTheField(string name, string value, string apiPath, string message)
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { [name] = value });

        Assert.Equal(200, result.Status);
        var field = result.ByTestId("field-" + apiPath)!;
        Assert.Contains("has-error", field.ClassList);
        Assert.Contains(message, field.QuerySelector($"[data-testid='error-{apiPath}']")!.TextContent);
        Assert.Contains(message, result.ByTestId("error-summary")!.TextContent);
        Assert.Null(result.ByTestId("results"));
        // What the user typed is shown back as typed (a select can only show its own options).
        if (result.Form.QuerySelector($"select[name='{name}']") is null)
        {
            Assert.Equal(value, result.Value(name));
        }
    }

    [Fact]
    public async Task Post_BadMargin_OpensTheMarginsSection()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { ["Input.Margins.OverVoltageHysteresisV"] = "0" });

        Assert.NotNull(result.Document.QuerySelector("details[data-testid='margins'][open]"));
        Assert.NotNull(result.ByTestId("error-margins.overVoltageHysteresisV"));
    }

    [Fact]
    public async Task Post_OcvTableWithBadRows_NamesEachRow()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = "0,2.5\n50;3.3\n\n90,3.4,1\n100,3.5" });

        var error = result.ByTestId("error-cell.ocvCurve")!.TextContent;
        Assert.Contains("Row 2", error);
        Assert.Contains("Row 3", error);
        Assert.DoesNotContain("Row 1:", error);
        Assert.Null(result.ByTestId("results"));
    }

    [Fact]
    public async Task Post_OcvTableOutOfOrder_ShowsCoresRowMessage()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = "socPercent,voltage\n0,2.5\n50,3.3\n60,3.2\n100,3.6" });

        Assert.Contains("Row 3: voltage must increase", result.ByTestId("error-cell.ocvCurve")!.TextContent);
    }

    [Fact]
    public async Task Post_ValidOcvTable_IsUsed()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = "0,2.5\n50,3.3\n100,3.6" });

        Assert.NotNull(result.ByTestId("results"));
        Assert.Contains("3 rows", result.ByTestId("result-cell")!.TextContent);
    }

    [Fact]
    public async Task Post_WithoutAntiforgeryToken_IsRejectedWithoutAServerError()
    {
        var page = await DesignPage.OpenAsync(_client);

        var result = await page.SubmitAsync(_client, withToken: false);

        Assert.Equal(400, result.Status);
        Assert.NotNull(result.ByTestId("error-page"));
    }

    [Fact]
    public async Task Get_UnknownPage_ShowsTheErrorPage()
    {
        var page = await DesignPage.OpenAsync(_client, "/no-such-page");

        Assert.Equal(404, page.Status);
        Assert.Contains("not found", page.ByTestId("error-page")!.TextContent, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public async Task Get_Stylesheet_IsServed()
    {
        var page = await DesignPage.OpenAsync(_client);
        var href = page.Document.QuerySelector("link[rel='stylesheet']")!.GetAttribute("href")!;

        using var response = await _client.GetAsync(href);

        Assert.Equal(200, (int)response.StatusCode);
        Assert.Equal("text/css", response.Content.Headers.ContentType?.MediaType);
    }

    private static string Invariant(double value) => value.ToString(CultureInfo.InvariantCulture);
}
