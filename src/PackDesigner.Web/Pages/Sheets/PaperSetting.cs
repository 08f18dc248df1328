using PackDesigner.Reports;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>Which paper a sheet is laid out for, and where that choice came from.</summary>
public readonly record struct PaperChoice(PaperSize Paper, bool FromQuery, string? Error)
{
    public bool IsValid => Error is null;
}

/// <summary>
/// The user's paper setting for design sheets: A4 or US Letter. A <c>paper</c> query value (<c>a4</c> or
/// <c>letter</c>) overrides the <c>pd-paper</c> cookie that the print view's settings form sets; without either
/// the sheet is A4. A query value that is neither is the user's mistake and is reported; a cookie value that is
/// neither is ignored (the cookie is ours, so it can only be stale or tampered with).
/// </summary>
public static class PaperSetting
{
    public const string QueryName = "paper";
    public const string CookieName = "pd-paper";
    public const PaperSize Default = PaperSize.A4;
    public const string ChoiceMessage = "Choose a4 or letter.";

    /// <summary>The cookie is kept for a year.</summary>
    public static readonly TimeSpan CookieLifetime = TimeSpan.FromDays(365);

    public static IReadOnlyList<PaperSize> All { get; } = [PaperSize.A4, PaperSize.Letter];

    /// <summary>The setting's value in queries, cookies and forms: <c>a4</c> or <c>letter</c>.</summary>
    public static string Name(PaperSize paper) => paper == PaperSize.Letter ? "letter" : "a4";

    /// <summary>For people: "A4 (210 × 297 mm)" or "US Letter (8.5 × 11 in)".</summary>
    public static string Label(PaperSize paper) => paper == PaperSize.Letter ? "US Letter (8.5 × 11 in)" : "A4 (210 × 297 mm)";

    /// <summary>The CSS <c>@page size</c> keyword.</summary>
    public static string CssSize(PaperSize paper) => paper == PaperSize.Letter ? "letter" : "A4";

    /// <summary>Reads <c>a4</c> or <c>letter</c>, any case, surrounding spaces ignored.</summary>
    public static bool TryParse(string? text, out PaperSize paper)
    {
        switch (text?.Trim().ToLowerInvariant())
        {
            case "a4":
                paper = PaperSize.A4;
                return true;
            case "letter":
                paper = PaperSize.Letter;
                return true;
            default:
                paper = Default;
                return false;
        }
    }

    /// <summary>The query's paper if there is one, else the cookie's, else A4.</summary>
    public static PaperChoice Resolve(HttpRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (request.Query.TryGetValue(QueryName, out var values))
        {
            return values.Count == 1 && TryParse(values[0], out var asked)
                ? new PaperChoice(asked, FromQuery: true, null)
                : new PaperChoice(Default, FromQuery: true, ChoiceMessage);
        }

        return request.Cookies.TryGetValue(CookieName, out var saved) && TryParse(saved, out var paper)
            ? new PaperChoice(paper, FromQuery: false, null)
            : new PaperChoice(Default, FromQuery: false, null);
    }

    /// <summary>Saves the setting in the <c>pd-paper</c> cookie (site-wide, a year, not readable by scripts).</summary>
    public static void Remember(HttpResponse response, PaperSize paper)
    {
        ArgumentNullException.ThrowIfNull(response);
        response.Cookies.Append(CookieName, Name(paper), new CookieOptions
        {
            Path = "/",
            MaxAge = CookieLifetime,
            HttpOnly = true,
            IsEssential = true,
            SameSite = SameSiteMode.Lax,
            Secure = response.HttpContext.Request.IsHttps,
        });
    }
}
