using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;

namespace PackDesigner.Web.Tests;

/// <summary>The app in memory. Each test class gets its own instance through <see cref="IClassFixture{TFixture}"/>.</summary>
public sealed class PackDesignerFactory : WebApplicationFactory<Program>
{
    /// <summary>The JSON options the API itself uses, to serialize Core results for comparison.</summary>
    public JsonSerializerOptions ApiJsonOptions =>
        Services.GetRequiredService<IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions>>().Value.SerializerOptions;
}
