using System.Globalization;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The addresses of the design pages and API, shared by the app and its tests.</summary>
public static class DesignRoutes
{
    public const string List = "/designs";
    public const string New = "/designs/new";
    public const string Import = "/designs/import";
    /// <summary>The Razor page that edits a design; it also answers <see cref="New"/>.</summary>
    public const string EditorPage = "/Designs/Editor";

    public const string Api = "/api/v1/designs";

    public static string View(int id) => I($"/designs/{id}");

    public static string View(int id, int revision) => I($"/designs/{id}?revision={revision}");

    /// <summary>The cell-to-cell spread analysis of the design's latest revision.</summary>
    public static string Spread(int id) => I($"/designs/{id}/spread");

    /// <summary>The editor for a new design with the series and parallel counts filled in (from the finder).</summary>
    public static string NewWith(int series, int parallel) => I($"/designs/new?series={series}&parallel={parallel}");

    public static string Edit(int id) => I($"/designs/{id}/edit");

    public static string Compare(int id, int a, int b) => I($"/designs/{id}/compare?a={a}&b={b}");

    public static string Export(int id, int revision) => I($"/designs/{id}/revisions/{revision}/export.json");

    /// <summary>The editor for a new design that starts as a copy of design <paramref name="id"/>.</summary>
    public static string Duplicate(int id) => I($"/designs/new?from={id}");

    public static string Duplicate(int id, int revision) => I($"/designs/new?from={id}&revision={revision}");

    public static string ApiDesign(int id) => I($"{Api}/{id}");

    public static string ApiRevisions(int id) => I($"{Api}/{id}/revisions");

    public static string ApiRevision(int id, int number) => I($"{Api}/{id}/revisions/{number}");

    private static string I(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
