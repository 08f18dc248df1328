using PackDesigner.Web;

var builder = WebApplication.CreateBuilder(args);
builder.Services.AddPackDesignerWeb();

var app = builder.Build();
app.UsePackDesignerWeb();
app.Run();

/// <summary>Entry point; public so that tests can start the app with WebApplicationFactory.</summary>
public partial class Program
{
}
