using Microsoft.Playwright;

namespace PackDesigner.Browser.Tests.Infrastructure;

/// <summary>One app and one headless Chromium per test class.</summary>
public sealed class BrowserFixture : IAsyncLifetime
{
    private IPlaywright? _playwright;

    public KestrelAppFactory App { get; } = new();

    public IBrowser? Browser { get; private set; }

    public string BaseUrl { get; private set; } = string.Empty;

    public string ScreenshotDir { get; } = Path.Combine(AppContext.BaseDirectory, "screenshots");

    public async Task InitializeAsync()
    {
        BaseUrl = App.BaseAddress;
        var exe = ChromiumLocator.ExecutablePath;
        if (exe is null)
        {
            if (ChromiumLocator.IsCi)
            {
                throw new InvalidOperationException(ChromiumLocator.MissingReason);
            }

            return;
        }

        Directory.CreateDirectory(ScreenshotDir);
        _playwright = await Playwright.CreateAsync();
        Browser = await _playwright.Chromium.LaunchAsync(new()
        {
            ExecutablePath = exe,
            Headless = true,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
        });
    }

    /// <summary>A fresh page; skips the test when no browser could be had (never under CI).</summary>
    public async Task<IPage> NewPageAsync()
    {
        Skip.If(Browser is null, ChromiumLocator.MissingReason);
        var context = await Browser!.NewContextAsync(new() { BaseURL = BaseUrl, ViewportSize = new() { Width = 1280, Height = 900 } });
        return await context.NewPageAsync();
    }

    public async Task DisposeAsync()
    {
        if (Browser is not null)
        {
            await Browser.CloseAsync();
        }

        _playwright?.Dispose();
        await App.DisposeAsync();
    }
}
