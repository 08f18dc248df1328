using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>The HTML print view of a sheet as a browser gets it, with its rows by test id and its paper form.</summary>
public sealed class PrintViewPage
{
    private static readonly HtmlParser Parser = new();

    private PrintViewPage(int status, IHtmlDocument document)
    {
        Status = status;
        Document = document;
    }

    public int Status { get; }

    public IHtmlDocument Document { get; }

    public static async Task<PrintViewPage> OpenAsync(HttpClient client, string path)
    {
        using var response = await client.GetAsync(path);
        return await ReadAsync(response);
    }

    public static async Task<PrintViewPage> ReadAsync(HttpResponseMessage response) =>
        new((int)response.StatusCode, await Parser.ParseDocumentAsync(await response.Content.ReadAsStringAsync()));

    public IElement? ByTestId(string testId) => Document.QuerySelector($"[data-testid='{testId}']");

    public IReadOnlyList<IElement> AllByTestId(string testId) => Document.QuerySelectorAll($"[data-testid='{testId}']").ToList();

    /// <summary>Rows of a kind (for example <c>bms-row</c>) by their <c>data-key</c>.</summary>
    public IReadOnlyDictionary<string, IElement> Rows(string testId) =>
        AllByTestId(testId).ToDictionary(e => e.GetAttribute("data-key")!, StringComparer.Ordinal);

    /// <summary>The text of the first element matching <paramref name="selector"/> inside <paramref name="row"/>, trimmed.</summary>
    public static string Text(IElement row, string selector) => row.QuerySelector(selector)?.TextContent.Trim() ?? throw new InvalidOperationException($"No {selector} in the row.");

    /// <summary>The CSS the page sets for printing, for example <c>@page { size: A4; }</c>.</summary>
    public string PageSizeCss => ByTestId("page-size")?.TextContent.Trim() ?? "";

    public IHtmlFormElement PaperForm => (IHtmlFormElement)(ByTestId("paper-form") ?? throw new InvalidOperationException("The page has no paper form."));

    /// <summary>Posts the paper form as a browser would, with the radio button <paramref name="paper"/> chosen.</summary>
    public async Task<HttpResponseMessage> SubmitPaperAsync(HttpClient client, string paper, bool withToken = true)
    {
        var fields = new List<KeyValuePair<string, string>>();
        foreach (var input in PaperForm.QuerySelectorAll("input[name]").OfType<IHtmlInputElement>())
        {
            if (input.Type == "radio")
            {
                continue;
            }

            if (withToken || input.Name != "__RequestVerificationToken")
            {
                fields.Add(new(input.Name!, input.Value));
            }
        }

        Assert.Contains(PaperForm.QuerySelectorAll("input[type='radio'][name='paper']").OfType<IHtmlInputElement>(), r => r.Value == paper);
        fields.Add(new("paper", paper));
        using var content = new FormUrlEncodedContent(fields);
        return await client.PostAsync(PaperForm.GetAttribute("action"), content);
    }
}
