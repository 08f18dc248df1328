using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Data;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The customer and job pages, used as a browser would: real form posts with the antiforgery token.</summary>
public sealed class CustomerPagesTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task PostNew_ValidForm_SavesAndShowsTheCustomerEncoded()
    {
        var name = "Kunde Ω-Ü 顧客 <b>x</b> " + Guid.NewGuid().ToString("N")[..6];
        var page = await HtmlPage.OpenAsync(_client, "/customers/new");

        var saved = await page.SubmitAsync(_client, "customer-form", new Dictionary<string, string>
        {
            ["Input.Name"] = name,
            ["Input.Contact"] = "kunde@example.invalid",
        });

        Assert.Matches(@"/customers/\d+$", saved.Address.AbsolutePath);
        Assert.Equal(name, saved.Text("customer-name"));
        Assert.Equal("kunde@example.invalid", saved.Text("customer-contact"));
        Assert.DoesNotContain("<b>x</b>", saved.Html, StringComparison.Ordinal);
        Assert.Equal(name, (await FindAsync(name)).Name);
    }

    [Fact]
    public async Task PostNew_BlankName_ShowsTheMessageBesideTheFieldAndSavesNothing()
    {
        var before = await CountAsync();
        var page = await HtmlPage.OpenAsync(_client, "/customers/new");

        var result = await page.SubmitAsync(_client, "customer-form", new Dictionary<string, string> { ["Input.Name"] = " ", ["Input.Notes"] = "kept" });

        Assert.Equal(200, result.Status);
        Assert.Contains("Enter the customer's name", result.Text("error-name"));
        Assert.Equal("kept", result.Value("customer-form", "Input.Notes"));
        Assert.Contains("Nothing was saved", result.Text("error-summary"));
        Assert.Equal(before, await CountAsync());
    }

    [Fact]
    public async Task Jobs_AddAndEdit_ShowOnTheCustomersPage()
    {
        var customer = await CreateAsync("Jobs " + Guid.NewGuid());
        var newJob = await HtmlPage.OpenAsync(_client, $"/customers/{customer.Id}/jobs/new");

        var added = await newJob.SubmitAsync(_client, "job-form", new Dictionary<string, string>
        {
            ["Input.Title"] = "Harbour launch",
            ["Input.VehicleOrSystem"] = "6 m launch",
        });
        var edit = await HtmlPage.OpenAsync(_client, added.AllByTestId("edit-job").Single().GetAttribute("href")!);
        var edited = await edit.SubmitAsync(_client, "job-form", new Dictionary<string, string> { ["Input.Title"] = "Harbour launch repower" });
        var blank = await edit.SubmitAsync(_client, "job-form", new Dictionary<string, string> { ["Input.Title"] = "" });

        Assert.Equal($"/customers/{customer.Id}", added.Address.AbsolutePath);
        Assert.Contains("6 m launch", Assert.Single(added.AllByTestId("job-row")).TextContent);
        Assert.Contains("Harbour launch repower", Assert.Single(edited.AllByTestId("job-row")).TextContent);
        Assert.NotNull(blank.Text("error-title"));
        Assert.Equal("Harbour launch repower", (await GetAsync(customer.Id)).Jobs.Single().Title);
    }

    [Fact]
    public async Task Edit_ChangedContact_IsSaved()
    {
        var customer = await CreateAsync("Edit " + Guid.NewGuid());
        var page = await HtmlPage.OpenAsync(_client, $"/customers/{customer.Id}/edit");

        var saved = await page.SubmitAsync(_client, "customer-form", new Dictionary<string, string> { ["Input.Contact"] = "new contact" });

        Assert.Equal($"/customers/{customer.Id}", saved.Address.AbsolutePath);
        Assert.Equal("new contact", (await GetAsync(customer.Id)).Contact);
    }

    [Fact]
    public async Task Delete_WhileJobsOrDesignsReferToIt_IsRefusedWithTheReason()
    {
        var withJob = await CreateAsync("With job " + Guid.NewGuid());
        var withDesign = await CreateAsync("With design " + Guid.NewGuid());
        int jobId;
        using (var scope = factory.Services.CreateScope())
        {
            var customers = scope.ServiceProvider.GetRequiredService<CustomerService>();
            jobId = (await customers.CreateJobAsync(withJob.Id, new JobData("Pickup"))).Value!.Id;
            await scope.ServiceProvider.GetRequiredService<DesignStore>().CreateDesignAsync("Kept " + Guid.NewGuid(), withDesign.Id, null, null, TestDesigns.Valid(), "test");
            await scope.ServiceProvider.GetRequiredService<DesignStore>().CreateDesignAsync("On the job " + Guid.NewGuid(), null, jobId, null, TestDesigns.Valid(), "test");
        }

        var jobPage = await HtmlPage.OpenAsync(_client, $"/customers/{withJob.Id}/delete");
        var designPage = await HtmlPage.OpenAsync(_client, $"/customers/{withDesign.Id}/delete");
        // The page offers no button; a post made anyway (with a valid token from another form) is refused too.
        var token = (await HtmlPage.OpenAsync(_client, "/customers/new")).Value("customer-form", "__RequestVerificationToken")!;
        var forced = await _client.PostAsync($"/customers/{withDesign.Id}/delete", new FormUrlEncodedContent([new("__RequestVerificationToken", token)]));
        var editJob = await HtmlPage.OpenAsync(_client, $"/customers/{withJob.Id}/jobs/{jobId}/edit");
        var jobDelete = await editJob.SubmitAsync(_client, "delete-job-form");

        Assert.Contains("1 job", jobPage.Text("delete-refused"));
        Assert.Null(jobPage.ByTestId("confirm-delete"));
        Assert.Contains("1 design", designPage.Text("delete-refused"));
        Assert.Equal(System.Net.HttpStatusCode.OK, forced.StatusCode);
        Assert.Equal($"/customers/{withDesign.Id}/delete", forced.RequestMessage!.RequestUri!.AbsolutePath);
        Assert.Contains("1 design(s)", await forced.Content.ReadAsStringAsync());
        Assert.Contains("design(s) belong to this job", jobDelete.Text("delete-refused"));
        Assert.Equal("Pickup", jobDelete.Value("job-form", "Input.Title"));
        Assert.NotNull(await GetAsync(withJob.Id));
        Assert.NotNull(await GetAsync(withDesign.Id));
        Assert.Single((await GetAsync(withJob.Id)).Jobs);
    }

    [Fact]
    public async Task Delete_Unreferenced_RemovesTheCustomer()
    {
        var customer = await CreateAsync("Unreferenced " + Guid.NewGuid());
        var confirm = await HtmlPage.OpenAsync(_client, $"/customers/{customer.Id}/delete");

        var deleted = await confirm.SubmitAsync(_client, "delete-form");

        Assert.Equal("/customers", deleted.Address.AbsolutePath);
        Assert.Contains("deleted", deleted.Text("saved-message"));
        Assert.Equal(404, (await HtmlPage.OpenAsync(_client, $"/customers/{customer.Id}")).Status);
    }

    [Fact]
    public async Task Details_ListsTheCustomersDesignsOnly()
    {
        var token = Guid.NewGuid().ToString("N")[..8];
        var mine = await CreateAsync("Mine " + token);
        var other = await CreateAsync("Other " + token);
        using (var scope = factory.Services.CreateScope())
        {
            var store = scope.ServiceProvider.GetRequiredService<DesignStore>();
            await store.CreateDesignAsync($"Mine A {token}", mine.Id, null, null, TestDesigns.Valid(), "test");
            await store.CreateDesignAsync($"Mine B {token}", mine.Id, null, null, TestDesigns.Default().WithSeries(15).Build(), "test");
            await store.CreateDesignAsync($"Theirs {token}", other.Id, null, null, TestDesigns.Valid(), "test");
        }

        var page = await HtmlPage.OpenAsync(_client, $"/customers/{mine.Id}");

        var rows = page.AllByTestId("customer-design-row");
        Assert.Equal([$"Mine B {token}", $"Mine A {token}"], rows.Select(r => r.QuerySelector("a")!.TextContent));
        Assert.Contains("15S2P", rows[0].TextContent);
        Assert.StartsWith("/designs/", rows[0].QuerySelector("a")!.GetAttribute("href"), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Index_Search_ListsOnlyMatchingCustomers()
    {
        var token = Guid.NewGuid().ToString("N")[..8];
        await CreateAsync($"Harbour {token}");
        await CreateAsync($"Cabin {token}");

        var page = await HtmlPage.OpenAsync(_client, $"/customers?q=HARBOUR+{token}");

        Assert.Equal($"Harbour {token}", Assert.Single(page.AllByTestId("customer-row")).QuerySelector("a")!.TextContent);
    }

    private async Task<CustomerDetails> CreateAsync(string name)
    {
        using var scope = factory.Services.CreateScope();
        return (await scope.ServiceProvider.GetRequiredService<CustomerService>().CreateAsync(new CustomerData(name))).Value!;
    }

    private async Task<CustomerDetails> GetAsync(int id)
    {
        using var scope = factory.Services.CreateScope();
        return (await scope.ServiceProvider.GetRequiredService<CustomerService>().GetAsync(id)).Value!;
    }

    private async Task<CustomerDetails> FindAsync(string name)
    {
        using var scope = factory.Services.CreateScope();
        var id = await scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>().Customers.Where(c => c.Name == name).Select(c => c.Id).SingleAsync();
        return await GetAsync(id);
    }

    private async Task<int> CountAsync()
    {
        using var scope = factory.Services.CreateScope();
        return await scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>().Customers.CountAsync();
    }
}
