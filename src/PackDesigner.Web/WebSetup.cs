using System.Globalization;
using Microsoft.AspNetCore.Http.Features;
using Microsoft.AspNetCore.Localization;
using Microsoft.AspNetCore.Server.Kestrel.Core;
using PackDesigner.Web.Api;

namespace PackDesigner.Web;

/// <summary>The web project's composition root: services and the request pipeline.</summary>
public static class WebSetup
{
    /// <summary>Largest request body for any request, bytes (the API caps its JSON lower, see <see cref="JsonBody.MaxBytes"/>).</summary>
    public const long MaxRequestBodyBytes = 1024 * 1024;

    public static IServiceCollection AddPackDesignerWeb(this IServiceCollection services)
    {
        services.AddRazorPages()
            .AddMvcOptions(o => o.SuppressImplicitRequiredAttributeForNonNullableReferenceTypes = true);
        services.ConfigureHttpJsonOptions(o => ApiJson.Configure(o.SerializerOptions));
        services.AddProblemDetails();
        services.AddExceptionHandler<ApiExceptionHandler>();
        services.AddScoped<Demo.DemoLoader>();

        // Numbers are read and written with the invariant culture whatever the client or the server's locale is.
        services.AddRequestLocalization(o =>
        {
            var invariant = CultureInfo.InvariantCulture;
            o.DefaultRequestCulture = new RequestCulture(invariant);
            o.SupportedCultures = [invariant];
            o.SupportedUICultures = [invariant];
            o.RequestCultureProviders.Clear();
        });

        services.Configure<KestrelServerOptions>(o => o.Limits.MaxRequestBodySize = MaxRequestBodyBytes);
        services.Configure<FormOptions>(o =>
        {
            o.ValueCountLimit = 256;
            o.ValueLengthLimit = 64 * 1024;
            o.MultipartBodyLengthLimit = MaxRequestBodyBytes;
        });
        return services;
    }

    public static WebApplication UsePackDesignerWeb(this WebApplication app)
    {
        app.UseExceptionHandler(new ExceptionHandlerOptions
        {
            ExceptionHandlingPath = "/Error",
            StatusCodeSelector = ApiExceptionHandler.StatusOf,
        });
        app.UseWhen(ApiEndpoints.IsApiRequest, api => api.UseStatusCodePages());
        app.UseWhen(c => !ApiEndpoints.IsApiRequest(c), pages => pages.UseStatusCodePagesWithReExecute("/Error", "?statusCode={0}"));
        app.UseRequestLocalization();
        app.UseRouting();
        app.MapStaticAssets();
        app.MapRazorPages().WithStaticAssets();
        app.MapPackDesignerApi();
        return app;
    }
}
