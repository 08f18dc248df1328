using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.Hosting.StaticWebAssets;
using System.Net;

namespace PackDesigner.Browser.Tests.Infrastructure;

/// <summary>The web app on a real Kestrel at a free loopback port, with its own SQLite file.</summary>
public sealed class KestrelAppFactory : WebApplicationFactory<Program>
{
    private readonly string _dataDir = Path.Combine(Path.GetTempPath(), "pd-browser-" + Guid.NewGuid().ToString("N"));

    public KestrelAppFactory()
    {
        UseKestrel(o => o.Listen(IPAddress.Loopback, 0));
    }

    public string BaseAddress
    {
        get
        {
            StartServer();
            var server = Services.GetService(typeof(IServer)) as IServer
                ?? throw new InvalidOperationException("No server.");
            return server.Features.Get<IServerAddressesFeature>()!.Addresses.First().TrimEnd('/');
        }
    }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(_dataDir);
        builder.UseEnvironment("Testing");
        builder.UseSetting("Storage:SqlitePath", Path.Combine(_dataDir, "browser.db"));
        builder.ConfigureAppConfiguration((ctx, config) => StaticWebAssetsLoader.UseStaticWebAssets(ctx.HostingEnvironment, ctx.Configuration));
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        try
        {
            Directory.Delete(_dataDir, recursive: true);
        }
        catch (IOException)
        {
            // A file may still be held by a pooled connection; the folder is under TMPDIR.
        }
    }
}
