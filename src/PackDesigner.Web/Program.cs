using PackDesigner.Data.DependencyInjection;
using PackDesigner.Web;

var builder = WebApplication.CreateBuilder(args);
builder.Services.AddPackDesignerWeb();
builder.Services.AddPackDesignerData(builder.Configuration, builder.Environment.ContentRootPath);

var app = builder.Build();
await app.Services.MigratePackDesignerDatabaseAsync();
app.UsePackDesignerWeb();
await app.RunAsync();

/// <summary>Entry point; public so that tests can start the app with WebApplicationFactory.</summary>
public partial class Program
{
}
