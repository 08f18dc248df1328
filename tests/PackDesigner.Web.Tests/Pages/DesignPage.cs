using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>
/// The design page as a browser sees it: the form's fields (antiforgery token included) as the HTML gives them,
/// posted back with overrides, like a user who changed some fields.
/// </summary>
public sealed class DesignPage
{
    private static readonly HtmlParser Parser = new();

    private DesignPage(int status, IHtmlDocument document, Uri? location, string html)
    {
        Status = status;
        Document = document;
        Location = location;
        Html = html;
    }

    public int Status { get; }

    /// <summary>Where a redirect points (the client does not follow redirects in these tests).</summary>
    public Uri? Location { get; }

    /// <summary>The page's HTML as sent.</summary>
    public string Html { get; }

    public IHtmlDocument Document { get; }

    public IElement Form => Document.QuerySelector($"[data-testid='{_formTestId}']") ?? throw new InvalidOperationException($"The page has no form '{_formTestId}'.");

    public static async Task<DesignPage> OpenAsync(HttpClient client, string path = "/")
    {
        using var response = await client.GetAsync(path);
        return await ReadAsync(response);
    }

    /// <summary>The value the form shows for a field, by its form name (for example Input.Cell.CapacityAh).</summary>
    public string? Value(string name) => Fields().FirstOrDefault(f => f.Key == name).Value;

    /// <summary>Every successful control of the form, in document order, as a browser would post it.</summary>
    public List<KeyValuePair<string, string>> Fields()
    {
        var fields = new List<KeyValuePair<string, string>>();
        foreach (var element in Form.QuerySelectorAll("input[name], select[name], textarea[name]"))
        {
            var name = element.GetAttribute("name")!;
            switch (element)
            {
                case IHtmlInputElement { Type: "checkbox" } box when !box.IsChecked:
                    break;
                case IHtmlInputElement input:
                    fields.Add(new(name, input.Value));
                    break;
                case IHtmlSelectElement select:
                    fields.Add(new(name, select.Value ?? string.Empty));
                    break;
                case IHtmlTextAreaElement area:
                    fields.Add(new(name, area.Value));
                    break;
            }
        }

        return fields;
    }

    /// <summary>Posts the form with some fields replaced (all values of a replaced name are dropped first).</summary>
    public async Task<DesignPage> SubmitAsync(HttpClient client, IReadOnlyDictionary<string, string>? overrides = null, bool withToken = true)
    {
        var fields = Fields()
            .Where(f => overrides is null || !overrides.ContainsKey(f.Key))
            .Where(f => withToken || f.Key != "__RequestVerificationToken")
            .Concat(overrides ?? new Dictionary<string, string>())
            .ToList();
        using var content = new FormUrlEncodedContent(fields);
        using var response = await client.PostAsync(Form.GetAttribute("action") is { Length: > 0 } action ? action : "/", content);
        return await ReadAsync(response);
    }

    /// <summary>
    /// Presses a submit button of the form (by its data-testid), as a browser does: the form's fields with some
    /// replaced, the button's own name and value, posted to the button's formaction (or the form's action).
    /// </summary>
    public async Task<DesignPage> PressAsync(HttpClient client, string buttonTestId, IReadOnlyDictionary<string, string>? overrides = null)
    {
        var button = ByTestId(buttonTestId) ?? throw new InvalidOperationException($"The page has no button '{buttonTestId}'.");
        var fields = Fields()
            .Where(f => overrides is null || !overrides.ContainsKey(f.Key))
            .Concat(overrides ?? new Dictionary<string, string>())
            .ToList();
        if (button.GetAttribute("name") is { Length: > 0 } name)
        {
            fields.Add(new(name, button.GetAttribute("value") ?? string.Empty));
        }

        var action = button.GetAttribute("formaction") is { Length: > 0 } formAction ? formAction
            : Form.GetAttribute("action") is { Length: > 0 } a ? a : "/";
        using var content = new FormUrlEncodedContent(fields);
        using var response = await client.PostAsync(System.Net.WebUtility.HtmlDecode(action), content);
        return await ReadAsync(response);
    }

    /// <summary>Posts the form to <paramref name="action"/> with some fields replaced (for a page handler no button names).</summary>
    public async Task<DesignPage> PostToAsync(HttpClient client, string action, IReadOnlyDictionary<string, string>? overrides = null)
    {
        var fields = Fields()
            .Where(f => overrides is null || !overrides.ContainsKey(f.Key))
            .Concat(overrides ?? new Dictionary<string, string>())
            .ToList();
        using var content = new FormUrlEncodedContent(fields);
        using var response = await client.PostAsync(action, content);
        return await ReadAsync(response);
    }

    public IElement? ByTestId(string testId) => Document.QuerySelector($"[data-testid='{testId}']");

    public IReadOnlyList<IElement> Findings => Document.QuerySelectorAll("[data-testid='finding']").ToList();

    public static async Task<DesignPage> ReadAsync(HttpResponseMessage response)
    {
        var html = await response.Content.ReadAsStringAsync();
        return new DesignPage((int)response.StatusCode, await Parser.ParseDocumentAsync(html), response.Headers.Location, html);
    }

    /// <summary>A page with another form as "the form" (for example the import or restore form).</summary>
    public DesignPage WithForm(string formTestId) => new(Status, Document, Location, Html) { _formTestId = formTestId };

    private string _formTestId = "design-form";
}
