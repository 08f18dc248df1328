using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Core.Demo;
using PackDesigner.Data;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Json;
using PackDesigner.Web.Demo;
using PackDesigner.Web.Tests.Pages;

namespace PackDesigner.Web.Tests.Demo;

/// <summary>The demo scenario: loaded through the data services, idempotently, and offered on first run.</summary>
public sealed class DemoLoaderTests
{
    [Fact]
    public async Task Load_Twice_AddsEverythingOnceAndNothingTheSecondTime()
    {
        using var factory = new PackDesignerFactory();

        var first = await LoadAsync(factory);
        var afterFirst = await CountRowsAsync(factory);
        var second = await LoadAsync(factory);
        var afterSecond = await CountRowsAsync(factory);

        Assert.Equal(new DemoLoadSummary(3, 3, 3, 3, 4), first);
        Assert.True(second.AddedNothing);
        Assert.Equal(afterFirst, afterSecond);
        Assert.Equal((3, 3, 3, 3, 4), afterFirst);
    }

    [Fact]
    public async Task Load_Scenario_StoresTheInventedRecordsAsDescribed()
    {
        using var factory = new PackDesignerFactory();
        await LoadAsync(factory);

        using var scope = factory.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        var cells = await db.Cells.AsNoTracking().ToListAsync();
        var customers = await db.Customers.AsNoTracking().Select(c => c.Name).ToListAsync();
        var designs = await db.Designs.AsNoTracking().ToListAsync();

        Assert.All(cells, c => Assert.Contains("(invented", c.Name, StringComparison.Ordinal));
        Assert.All(cells, c => Assert.Contains("Invented figures", c.Notes, StringComparison.Ordinal));
        Assert.All(customers, n => Assert.Contains("(invented", n, StringComparison.Ordinal));
        Assert.All(designs, d => Assert.NotNull(d.CustomerId));
        Assert.All(designs, d => Assert.NotNull(d.JobId));
        Assert.All(designs, d => Assert.NotNull(d.CellId));
        Assert.Contains(cells, c => c.Name == DemoScenario.CellName);

        var pickup = designs.Single(d => d.Name == DemoScenario.DesignName);
        var store = scope.ServiceProvider.GetRequiredService<DesignStore>();
        var revisions = (await store.GetRevisionsAsync(pickup.Id)).Value!;
        Assert.Equal([1, 2], revisions.Select(r => r.Number).Order());
        var first = (await store.GetRevisionAsync(pickup.Id, 1)).Value!;
        Assert.Equal(CanonicalDesignJson.Serialize(DemoScenario.PickupConversion), first.InputJson);
        Assert.Equal(DemoLoader.CreatedBy, first.CreatedBy);
        Assert.Equal(cells.Single(c => c.Name == DemoScenario.CellName).Id, pickup.CellId);
    }

    [Fact]
    public async Task HomePage_OffersTheDemoUntilADesignExists_AndThePageLoadsItOnce()
    {
        using var factory = new PackDesignerFactory();
        var client = factory.CreateClient();

        var home = await HtmlPage.OpenAsync(client, "/");
        Assert.NotNull(home.ByTestId("demo-offer"));

        var loaded = await home.SubmitAsync(client, "demo-offer-form");
        var counts = await CountRowsAsync(factory);
        var again = await loaded.SubmitAsync(client, "demo-form");

        Assert.Equal("/demo", loaded.Address.AbsolutePath);
        Assert.Contains("Loaded: 3 customer(s)", loaded.Text("demo-summary"));
        Assert.Contains("already loaded", again.Text("demo-summary"));
        Assert.Equal(counts, await CountRowsAsync(factory));
        Assert.Null((await HtmlPage.OpenAsync(client, "/")).ByTestId("demo-offer"));
    }

    [Fact]
    public async Task PostDemo_WithoutAntiforgeryToken_IsRefused()
    {
        using var factory = new PackDesignerFactory();
        var client = factory.CreateClient();
        var page = await HtmlPage.OpenAsync(client, "/demo");

        var result = await page.SubmitAsync(client, "demo-form", withToken: false);

        Assert.Equal(400, result.Status);
        Assert.Equal((0, 0, 0, 0, 0), await CountRowsAsync(factory));
    }

    private static async Task<DemoLoadSummary> LoadAsync(PackDesignerFactory factory)
    {
        using var scope = factory.Services.CreateScope();
        return await scope.ServiceProvider.GetRequiredService<DemoLoader>().LoadAsync();
    }

    private static async Task<(int Customers, int Jobs, int Cells, int Designs, int Revisions)> CountRowsAsync(PackDesignerFactory factory)
    {
        using var scope = factory.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        return (await db.Customers.CountAsync(), await db.Jobs.CountAsync(), await db.Cells.CountAsync(), await db.Designs.CountAsync(), await db.DesignRevisions.CountAsync());
    }
}
