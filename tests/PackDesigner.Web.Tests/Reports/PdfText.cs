using System.Text.RegularExpressions;
using UglyToad.PdfPig.Content;
using UglyToad.PdfPig.Tokens;
using PigPdf = UglyToad.PdfPig.PdfDocument;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>A rendered sheet read back with PdfPig: the text of each page as lines, and its images and fonts.</summary>
internal sealed partial class PdfText
{
    private readonly IReadOnlyList<IReadOnlyList<(string Text, double Left, double Bottom)>> _words;

    private PdfText(IReadOnlyList<IReadOnlyList<(string, double, double)>> words, IReadOnlyList<IReadOnlyList<string>> lines, IReadOnlyList<(double Width, double Height)> sizes, IReadOnlyList<int> images, IReadOnlyList<(string Name, bool Embedded)> fonts, DateTimeOffset? created, DateTimeOffset? modified)
    {
        _words = words;
        PageLines = lines;
        PageSizes = sizes;
        ImagesPerPage = images;
        Fonts = fonts;
        Created = created;
        Modified = modified;
    }

    /// <summary>Each page's lines: words on one baseline, left to right, joined by single spaces.</summary>
    public IReadOnlyList<IReadOnlyList<string>> PageLines { get; }

    public IReadOnlyList<(double Width, double Height)> PageSizes { get; }

    public IReadOnlyList<int> ImagesPerPage { get; }

    public IReadOnlyList<(string Name, bool Embedded)> Fonts { get; }

    public DateTimeOffset? Created { get; }

    public DateTimeOffset? Modified { get; }

    public int PageCount => PageLines.Count;

    public IEnumerable<string> AllLines => PageLines.SelectMany(l => l);

    /// <summary>All text as one string with single spaces, for phrases that wrap across lines.</summary>
    public string Flat => Spaces().Replace(string.Join(" ", AllLines), " ");

    public static PdfText Read(byte[] pdf)
    {
        using var document = PigPdf.Open(pdf);
        var words = new List<IReadOnlyList<(string, double, double)>>();
        var lines = new List<IReadOnlyList<string>>();
        var sizes = new List<(double, double)>();
        var images = new List<int>();
        var fonts = new Dictionary<string, bool>();
        foreach (var page in document.GetPages())
        {
            words.Add(page.GetWords().Select(w => (w.Text, w.BoundingBox.Left, Baseline(w))).ToList());
            lines.Add(Lines(page));
            sizes.Add((page.Width, page.Height));
            images.Add(page.GetImages().Count());
            CollectFonts(document, page, fonts);
        }

        return new PdfText(words, lines, sizes, images, fonts.Select(f => (f.Key, f.Value)).ToList(),
            document.Information.GetCreatedDateTimeOffset(), document.Information.GetModifiedDateTimeOffset());
    }

    /// <summary>
    /// The text of one table column on every page: the words below a heading row that holds both
    /// <paramref name="heading"/> and <paramref name="nextHeading"/>, left of the next column's heading.
    /// </summary>
    public string ColumnText(string heading, string nextHeading)
    {
        var parts = new List<string>();
        foreach (var page in _words)
        {
            foreach (var head in page.Where(w => w.Text == heading))
            {
                var next = page.FirstOrDefault(w => w.Text == nextHeading && w.Bottom == head.Bottom && w.Left > head.Left);
                if (next.Text is null)
                {
                    continue;
                }

                parts.AddRange(page
                    .Where(w => w.Bottom < head.Bottom && w.Left >= head.Left - 2 && w.Left < next.Left - 2)
                    .OrderByDescending(w => w.Bottom).ThenBy(w => w.Left)
                    .Select(w => w.Text));
            }
        }

        return string.Join(" ", parts);
    }

    /// <summary>The lines holding <paramref name="label"/> (the start of a table row).</summary>
    public IEnumerable<string> LinesStartingWith(string label) => AllLines.Where(l => l.StartsWith(label + " ", StringComparison.Ordinal) || l == label);

    private static List<string> Lines(Page page) =>
        page.GetWords()
            .GroupBy(Baseline)
            .OrderByDescending(g => g.Key)
            .Select(g => string.Join(" ", g.OrderBy(w => w.BoundingBox.Left).Select(w => w.Text)))
            .ToList();

    /// <summary>The word's baseline, to half a point: words of one line share it whatever their descenders.</summary>
    private static double Baseline(Word word) => Math.Round(word.Letters[0].StartBaseLine.Y * 2) / 2;

    private static void CollectFonts(PigPdf document, Page page, Dictionary<string, bool> fonts)
    {
        IToken? Resolve(IToken? token) => token is IndirectReferenceToken r ? document.Structure.GetObject(r.Data).Data : token;
        if (Resolve(page.Dictionary.Data.GetValueOrDefault("Resources")) is not DictionaryToken resources
            || Resolve(resources.Data.GetValueOrDefault("Font")) is not DictionaryToken fontTable)
        {
            return;
        }

        foreach (var entry in fontTable.Data.Values)
        {
            if (Resolve(entry) is not DictionaryToken font)
            {
                continue;
            }

            var name = (Resolve(font.Data.GetValueOrDefault("BaseFont")) as NameToken)?.Data ?? "?";
            var described = font;
            if (Resolve(font.Data.GetValueOrDefault("DescendantFonts")) is ArrayToken descendants && descendants.Data.Count > 0
                && Resolve(descendants.Data[0]) is DictionaryToken descendant)
            {
                described = descendant;
            }

            var embedded = Resolve(described.Data.GetValueOrDefault("FontDescriptor")) is DictionaryToken descriptor
                && (descriptor.Data.ContainsKey("FontFile2") || descriptor.Data.ContainsKey("FontFile") || descriptor.Data.ContainsKey("FontFile3"));
            fonts[name] = embedded;
        }
    }

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();
}
