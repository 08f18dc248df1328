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

    private DesignPage(int status, IHtmlDocument document)
    {
        Status = status;
        Document = document;
    }

    public int Status { get; }

    public IHtmlDocument Document { get; }

    public IElement Form => Document.QuerySelector("[data-testid='design-form']") ?? throw new InvalidOperationException("The page has no design form.");

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

    public IElement? ByTestId(string testId) => Document.QuerySelector($"[data-testid='{testId}']");

    public IReadOnlyList<IElement> Findings => Document.QuerySelectorAll("[data-testid='finding']").ToList();

    private static async Task<DesignPage> ReadAsync(HttpResponseMessage response)
    {
        var html = await response.Content.ReadAsStringAsync();
        return new DesignPage((int)response.StatusCode, await Parser.ParseDocumentAsync(html));
    }
}
