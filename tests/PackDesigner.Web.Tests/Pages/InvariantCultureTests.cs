using System.Globalization;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>
/// Numbers keep a point as the decimal separator whatever culture the request runs under: the request's thread
/// culture is de-DE (a decimal comma) and the test server carries it into the app.
/// </summary>
public sealed class InvariantCultureTests : IClassFixture<PackDesignerFactory>, IDisposable
{
    private readonly CultureInfo _before = CultureInfo.CurrentCulture;
    private readonly HttpClient _client;

    public InvariantCultureTests(PackDesignerFactory factory)
    {
        factory.Server.PreserveExecutionContext = true;
        _client = factory.CreateClient();
        CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("de-DE");
    }

    public void Dispose() => CultureInfo.CurrentCulture = _before;

    [Fact]
    public async Task Page_UnderGermanCulture_ReadsAndWritesPoints()
    {
        // The precondition: under this culture a plain ToString() writes a comma, so the checks below can fail.
        Assert.Equal("3,65", 3.65.ToString(CultureInfo.CurrentCulture));

        var page = await DesignPage.OpenAsync(_client);
        Assert.Equal("3.65", page.Value("Input.Cell.MaxChargeVoltage"));
        Assert.Equal("0.55", page.Value("Input.Cell.InternalResistanceMilliohm"));

        var result = await page.SubmitAsync(_client);
        Assert.Null(result.ByTestId("error-summary"));
        var pack = result.ByTestId("result-pack")!.TextContent;
        Assert.Contains("116.8\u00a0V", pack);
        Assert.DoesNotContain("116,8", pack);
        Assert.DoesNotMatch(@"\d,\d", result.ByTestId("results")!.TextContent);
    }

    [Fact]
    public async Task Api_UnderGermanCulture_MessagesUsePoints()
    {
        Assert.Equal("2,5", 2.5.ToString(CultureInfo.CurrentCulture));

        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithCell(c => c with { CapacityAh = -2.5 }));

        Assert.Contains("-2.5", Assert.Single(answer.Errors["cell.capacityAh"]));
    }
}
