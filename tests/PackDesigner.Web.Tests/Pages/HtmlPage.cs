using System.Net.Http.Headers;
using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>A file a test puts in a form's file input.</summary>
public sealed record FormFile(string Field, string FileName, byte[] Content, string ContentType = "text/csv");

/// <summary>
/// Any page of the app as a browser sees it: its forms (found by <c>data-testid</c>) with the fields the HTML gives
/// them, antiforgery token included, posted back the way a browser posts them (URL-encoded, or multipart when the
/// form says so, a submit button's <c>formaction</c> honoured).
/// </summary>
public sealed class HtmlPage
{
    private static readonly HtmlParser Parser = new();

    private HtmlPage(int status, Uri address, string html, IHtmlDocument document)
    {
        Status = status;
        Address = address;
        Html = html;
        Document = document;
    }

    public int Status { get; }

    /// <summary>Where the page was finally read from (after redirects).</summary>
    public Uri Address { get; }

    public string Html { get; }

    public IHtmlDocument Document { get; }

    public static async Task<HtmlPage> OpenAsync(HttpClient client, string path)
    {
        using var response = await client.GetAsync(path);
        return await ReadAsync(response);
    }

    public IElement Form(string testId) =>
        Document.QuerySelector($"form[data-testid='{testId}']") ?? throw new InvalidOperationException($"The page {Address} has no form '{testId}'.");

    public IElement? ByTestId(string testId) => Document.QuerySelector($"[data-testid='{testId}']");

    public IReadOnlyList<IElement> AllByTestId(string testId) => Document.QuerySelectorAll($"[data-testid='{testId}']").ToList();

    /// <summary>The text of the element with the test id, or null when there is none.</summary>
    public string? Text(string testId) => ByTestId(testId)?.TextContent;

    /// <summary>The value a form shows for a field (the first control of that name).</summary>
    public string? Value(string formTestId, string name) => Fields(formTestId).FirstOrDefault(f => f.Key == name).Value;

    /// <summary>Every successful control of a form, in document order, as a browser would post it.</summary>
    public List<KeyValuePair<string, string>> Fields(string formTestId)
    {
        var fields = new List<KeyValuePair<string, string>>();
        foreach (var element in Form(formTestId).QuerySelectorAll("input[name], select[name], textarea[name]"))
        {
            var name = element.GetAttribute("name")!;
            switch (element)
            {
                case IHtmlInputElement { Type: "checkbox" } box when !box.IsChecked:
                case IHtmlInputElement { Type: "file" }:
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

    /// <summary>
    /// Posts a form with some fields replaced, as if the submit button <paramref name="button"/> (a test id; the
    /// form's action when null) was pressed.
    /// </summary>
    public async Task<HtmlPage> SubmitAsync(HttpClient client, string formTestId, IReadOnlyDictionary<string, string>? overrides = null,
        string? button = null, FormFile? file = null, bool withToken = true)
    {
        var form = Form(formTestId);
        var fields = Fields(formTestId)
            .Where(f => overrides is null || !overrides.ContainsKey(f.Key))
            .Where(f => withToken || f.Key != "__RequestVerificationToken")
            .Concat(overrides ?? new Dictionary<string, string>())
            .ToList();
        var action = button is null
            ? form.GetAttribute("action")
            : form.QuerySelector($"[data-testid='{button}']")?.GetAttribute("formaction") ?? form.GetAttribute("action");
        var target = string.IsNullOrEmpty(action) ? Address : new Uri(Address, action);

        using HttpContent content = form.GetAttribute("enctype") == "multipart/form-data" ? Multipart(fields, file) : new FormUrlEncodedContent(fields);
        using var response = await client.PostAsync(target, content);
        return await ReadAsync(response);
    }

    private static MultipartFormDataContent Multipart(List<KeyValuePair<string, string>> fields, FormFile? file)
    {
        var content = new MultipartFormDataContent();
        foreach (var (name, value) in fields)
        {
            content.Add(new StringContent(value), name);
        }

        if (file is not null)
        {
            var part = new ByteArrayContent(file.Content);
            part.Headers.ContentType = new MediaTypeHeaderValue(file.ContentType);
            content.Add(part, file.Field, file.FileName);
        }

        return content;
    }

    private static async Task<HtmlPage> ReadAsync(HttpResponseMessage response)
    {
        var html = await response.Content.ReadAsStringAsync();
        return new HtmlPage((int)response.StatusCode, response.RequestMessage!.RequestUri!, html, await Parser.ParseDocumentAsync(html));
    }
}
