namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// Remembers in a cookie the name a person saved under, so the next form starts with it. There are no accounts
/// yet: the name is what the revision history shows as "by".
/// </summary>
public static class SaverCookie
{
    public const string Name = "pd-saved-by";

    public static string? Read(HttpRequest request) =>
        request.Cookies.TryGetValue(Name, out var value) && !string.IsNullOrWhiteSpace(value) ? value : null;

    public static void Write(HttpResponse response, string savedBy) =>
        response.Cookies.Append(Name, savedBy.Trim(), new CookieOptions
        {
            HttpOnly = true,
            SameSite = SameSiteMode.Lax,
            IsEssential = true,
            MaxAge = TimeSpan.FromDays(365),
        });
}
