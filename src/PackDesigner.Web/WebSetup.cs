using System.Globalization;
using Microsoft.AspNetCore.Http.Features;
using Microsoft.AspNetCore.Localization;
using Microsoft.AspNetCore.Server.Kestrel.Core;
using PackDesigner.Web.Api;
using PackDesigner.Web.Pages.Sheets;
using PackDesigner.Web.Pages.Designs;
using PackDesigner.Web.Storage;

namespace PackDesigner.Web;

/// <summary>The web project's composition root: services and the request pipeline.</summary>
public static class WebSetup
{
    /// <summary>Largest request body for any request, bytes (the API caps its JSON lower, see <see cref="JsonBody.MaxBytes"/>).</summary>
    public const long MaxRequestBodyBytes = 1024 * 1024;

    public static IServiceCollection AddPackDesignerWeb(this IServiceCollection services)
    {
        services.AddRazorPages(o => o.Conventions.AddPageRoute(DesignRoutes.EditorPage, DesignRoutes.New))
            .AddMvcOptions(o => o.SuppressImplicitRequiredAttributeForNonNullableReferenceTypes = true);
        services.ConfigureHttpJsonOptions(o => ApiJson.Configure(o.SerializerOptions));
        services.AddProblemDetails();
        // Exception handlers run in this order: the observer only clears connection pools after an outage.
        services.AddExceptionHandler<StorageOutageObserver>();
        services.AddExceptionHandler<ApiExceptionHandler>();
        services.AddScoped<RevisionSheetService>();
        services.AddSingleton<StorageGate>();
        services.AddPackDesignerHealth();
        services.AddOpenApi();
        services.AddScoped<DesignLinkChoices>();
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
        app.Use(async (context, next) =>
        {
            if (StorageGate.Needs(context))
            {
                await context.RequestServices.GetRequiredService<StorageGate>().EnsureOpenAsync(context.RequestAborted);
            }

            await next(context);
        });
        app.MapStaticAssets().WithMetadata(StorageFreeAttribute.Instance);
        app.MapRazorPages().WithStaticAssets();
        app.MapOpenApi().WithMetadata(StorageFreeAttribute.Instance);
        app.MapPackDesignerHealth();
        app.MapPackDesignerApi();
        app.MapSheetEndpoints();
        app.MapDesignApi();
        app.MapDesignExport();
        return app;
    }
}
