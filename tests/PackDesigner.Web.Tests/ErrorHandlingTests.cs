using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Web.Tests.Pages;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests;

/// <summary>An unexpected exception: a generic ProblemDetails for the API, the error page for pages, no details to the client.</summary>
public sealed class ErrorHandlingTests(ErrorHandlingTests.FailingAppFactory factory) : IClassFixture<ErrorHandlingTests.FailingAppFactory>
{
    public const string Secret = "secret detail that must stay in the log";

    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task ApiException_BecomesAGeneric500ProblemDetails()
    {
        var answer = await _client.GetAnswerAsync("/api/v1/fail");

        Assert.Equal(500, answer.Status);
        Assert.Equal("application/problem+json", answer.MediaType);
        Assert.Equal(500, answer.Body.GetProperty("status").GetInt32());
        Assert.DoesNotContain(Secret, answer.Body.GetRawText());
        Assert.DoesNotContain("InvalidOperationException", answer.Body.GetRawText());
    }

    [Fact]
    public async Task PageException_ShowsTheErrorPage()
    {
        var page = await DesignPage.OpenAsync(_client, "/fail");

        Assert.Equal(500, page.Status);
        Assert.NotNull(page.ByTestId("error-page"));
        Assert.DoesNotContain(Secret, page.Document.Body!.TextContent);
    }

    /// <summary>The app with one more middleware at the end of its pipeline that throws for the paths ending in /fail.</summary>
    public sealed class FailingAppFactory : IsolatedAppFactory
    {
        protected override void ConfigureTestHost(IWebHostBuilder builder) =>
            builder.ConfigureServices(s => s.AddTransient<IStartupFilter, FailingStartupFilter>());
    }

    private sealed class FailingStartupFilter : IStartupFilter
    {
        public Action<IApplicationBuilder> Configure(Action<IApplicationBuilder> next) => app =>
        {
            next(app);
            app.Use((context, following) => context.Request.Path.Value?.EndsWith("/fail", StringComparison.Ordinal) == true
                ? throw new InvalidOperationException(Secret)
                : following(context));
        };
    }
}
