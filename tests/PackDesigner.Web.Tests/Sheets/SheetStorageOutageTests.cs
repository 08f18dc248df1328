using System.Net;
using PackDesigner.Web.Pages.Sheets;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>A database that does not answer: the sheet's routes answer 503 through the app's one error path.</summary>
public sealed class SheetStorageOutageTests(SheetAppFactory factory) : IClassFixture<SheetAppFactory>
{
    [Fact]
    public async Task GetSheetAndFiles_StorageDown_Return503WithoutDetails()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var client = factory.CreateClient();
        factory.StorageDown = true;
        try
        {
            foreach (var path in new[] { SheetRoutes.Sheet(design.Id, 1), SheetRoutes.Pdf(design.Id, 1), SheetRoutes.SettingsCsv(design.Id, 1), SheetRoutes.OcvChart(design.Id, 1) })
            {
                using var response = await client.GetAsync(path);
                Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
                var page = await PrintViewPage.ReadAsync(response);
                Assert.NotNull(page.ByTestId("error-page"));
                Assert.DoesNotContain("Test outage", page.Document.Body!.TextContent, StringComparison.Ordinal);
            }
        }
        finally
        {
            factory.StorageDown = false;
        }

        using var again = await client.GetAsync(SheetRoutes.Pdf(design.Id, 1));
        Assert.Equal(HttpStatusCode.OK, again.StatusCode);
    }
}
