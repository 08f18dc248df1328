using PackDesigner.Data.DependencyInjection;
using PackDesigner.Web;
using PackDesigner.Web.Storage;

var builder = WebApplication.CreateBuilder(args);
builder.Services.AddPackDesignerWeb();
builder.Services.AddPackDesignerData(builder.Configuration, builder.Environment.ContentRootPath);

var app = builder.Build();
// A database that is down at start-up does not stop the app: the gate retries on the next request that needs it.
await app.Services.GetRequiredService<StorageGate>().TryOpenAsync();
app.UsePackDesignerWeb();
await app.RunAsync();

/// <summary>Entry point; public so that tests can start the app with WebApplicationFactory.</summary>
public partial class Program
{
}
