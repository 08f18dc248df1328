using System.Globalization;
using PdfSharp.Drawing;
using PdfSharp.Pdf;
using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// The flow layout the sections write into: headings, paragraphs, lists, tables and images, laid top to bottom and
/// broken across pages. Page headers and footers (with "page x of y" and the sign-off marking) are drawn once every
/// page exists. Units are PDF points (1/72 in).
/// </summary>
public sealed class SheetLayout : IDisposable
{
    private const double Margin = 42;
    private const double HeaderHeight = 66;
    private const double FooterHeight = 30;
    private const double CellPadX = 4;
    private const double CellPadY = 3;

    private static readonly XPdfFontOptions Unicode = new(PdfFontEncoding.Unicode);
    private static readonly XColor Ink = XColor.FromArgb(26, 26, 26);
    private static readonly XColor Muted = XColor.FromArgb(90, 96, 102);
    private static readonly XColor Accent = XColor.FromArgb(31, 78, 121);
    private static readonly XColor Rule = XColor.FromArgb(192, 198, 204);
    private static readonly XColor HeadFill = XColor.FromArgb(226, 233, 240);
    private static readonly XColor GroupFill = XColor.FromArgb(243, 245, 247);
    private static readonly XColor DraftRed = XColor.FromArgb(176, 0, 32);
    private static readonly XColor SignedGreen = XColor.FromArgb(30, 110, 50);

    private readonly PdfDocument _document;
    private readonly PaperSize _paper;
    private readonly DesignSheetModel _model;
    private readonly Dictionary<(bool Bold, double Size), XFont> _fonts = [];
    private readonly List<PdfPage> _pages = [];
    private readonly PendingHeadings _pending = new();
    private XGraphics? _gfx;
    private double _y;
    private int _sectionNumber;

    internal SheetLayout(PdfDocument document, PaperSize paper, DesignSheetModel model)
    {
        _document = document;
        _paper = paper;
        _model = model;
        NewPage();
    }

    /// <summary>Width of the text column, points.</summary>
    public double ContentWidth => PageWidth - 2 * Margin;

    /// <summary>Height available for content on one page, points.</summary>
    public double ContentHeight => Bottom - Top;

    private double PageWidth => _paper == PaperSize.A4 ? 595.276 : 612;

    private double PageHeight => _paper == PaperSize.A4 ? 841.89 : 792;

    private double Top => Margin / 2 + HeaderHeight;

    private double Bottom => PageHeight - FooterHeight - 12;

    private double Left => Margin;

    private XGraphics G => _gfx ?? throw new InvalidOperationException("The layout is finished.");

    /// <summary>A numbered section heading, kept on one page with the start of what follows it (the renderer's).</summary>
    internal void SectionHeading(string title)
    {
        _sectionNumber++;
        var text = _sectionNumber.ToString(CultureInfo.InvariantCulture) + "  " + title;
        var first = _sectionNumber == 1;
        _pending.Add((_sectionNumber == 1 ? 0 : 10) + 27, () =>
        {
            if (!first && _y > Top + 0.5)
            {
                _y += 10;
            }

            G.DrawString(text, Font(true, 13), new XSolidBrush(Accent), new XPoint(Left, _y + 13 * 0.93));
            _y += 19;
            G.DrawLine(new XPen(Accent, 0.8), Left, _y, Left + ContentWidth, _y);
            _y += 8;
        });
    }

    /// <summary>A smaller heading inside a section, kept on one page with the start of what follows it.</summary>
    public void SubHeading(string title)
    {
        var font = Font(true, 10);
        var lines = Wrap(title, font, ContentWidth);
        _pending.Add(6 + lines.Count * LineHeight(font), () =>
        {
            _y += 4;
            DrawLines(lines, font, Left, Accent);
            _y += 2;
        });
    }

    /// <summary>
    /// A wrapped paragraph; it may continue on the next page, two lines at least on each side. With
    /// <paramref name="keepWithNext"/> it stays on one page with the start of the block after it (for an
    /// introduction of a table).
    /// </summary>
    public void Paragraph(string text, bool bold = false, double size = 9, bool muted = false, bool keepWithNext = false)
    {
        var font = Font(bold, size);
        var lines = Wrap(text, font, ContentWidth);
        var lineHeight = LineHeight(font);
        var color = muted ? Muted : Ink;
        if (keepWithNext)
        {
            _pending.Add(lines.Count * lineHeight + 4, () =>
            {
                DrawLines(lines, font, Left, color);
                _y += 4;
            });
            return;
        }

        Begin(Math.Min(lines.Count, 2) * lineHeight);
        for (var i = 0; i < lines.Count; i++)
        {
            var left = lines.Count - i;
            // Widow control: never leave a single last line alone at the top of the next page.
            if (_y + lineHeight > Bottom || (left == 2 && i > 0 && _y + 2 * lineHeight > Bottom))
            {
                NewPage();
            }

            DrawLines([lines[i]], font, Left, color);
        }

        _y += 4;
    }

    /// <summary>A numbered list; each item is kept on one page.</summary>
    public void Steps(IReadOnlyList<string> items) => List(items, i => (i + 1).ToString(CultureInfo.InvariantCulture) + ".");

    /// <summary>A bulleted list; each item is kept on one page.</summary>
    public void Bullets(IReadOnlyList<string> items) => List(items, _ => "•");

    /// <summary>A titled block (bold title over a wrapped paragraph, a red rule beside it) kept on one page.</summary>
    public void Block(string title, string text)
    {
        var titleFont = Font(true, 9);
        var font = Font(false, 9);
        var titleLines = Wrap(title, titleFont, ContentWidth - 8);
        var lines = Wrap(text, font, ContentWidth - 8);
        var height = titleLines.Count * LineHeight(titleFont) + lines.Count * LineHeight(font);
        Begin(height + 6);
        G.DrawRectangle(new XSolidBrush(DraftRed), Left, _y + 1, 2.2, height - 2);
        DrawLines(titleLines, titleFont, Left + 8, Ink);
        DrawLines(lines, font, Left + 8, Ink);
        _y += 6;
    }

    /// <summary>Vertical space, points.</summary>
    public void Space(double points) => _y = Math.Min(_y + points, Bottom);

    /// <summary>Starts a new page unless at least <paramref name="height"/> points are left (pending headings included).</summary>
    public void EnsureSpace(double height)
    {
        if (_y + PendingHeight + height > Bottom && _y > Top + 0.5)
        {
            NewPage();
        }
    }

    /// <summary>A PNG or JPEG image across the content width, with a caption under it, kept on one page.</summary>
    public void Image(byte[] image, double heightPoints, string? caption = null)
    {
        var captionFont = Font(false, 8);
        var captionLines = caption is null ? [] : Wrap(caption, captionFont, ContentWidth);
        Begin(heightPoints + captionLines.Count * LineHeight(captionFont) + 8);
        using (var stream = new MemoryStream(image, writable: false))
        using (var picture = XImage.FromStream(stream))
        {
            G.DrawImage(picture, Left, _y, ContentWidth, heightPoints);
        }

        _y += heightPoints + 3;
        DrawLines(captionLines, captionFont, Left, Muted);
        _y += 8;
    }

    /// <summary>
    /// A table; see <see cref="SheetTable"/>. A table that fits in a third of a page is kept on one page; a longer
    /// one breaks between rows, never leaving fewer than two rows on either side of a break.
    /// </summary>
    public void Table(SheetTable table)
    {
        var widths = ColumnWidths(table.Columns);
        var headFont = Font(true, 8);
        var bodyFont = Font(false, 8.5);
        var boldFont = Font(true, 8.5);
        var head = table.Columns.Select((c, i) => Wrap(c.Title, headFont, widths[i] - 2 * CellPadX)).ToList();
        var headHeight = head.Max(l => l.Count) * LineHeight(headFont) + 2 * CellPadY;
        var rows = table.Rows.Select(r => Measure(r, table.Columns, widths, bodyFont, boldFont, headFont)).ToList();
        var continuedFont = Font(true, 8);
        var total = headHeight + rows.Sum(r => r.Height);

        var keepTogether = total <= ContentHeight / 3;
        Begin(keepTogether ? total : headHeight + rows.Take(2).Sum(r => r.Height));
        DrawHead();
        for (var i = 0; i < rows.Count; i++)
        {
            // The rows that must go with this one: a group heading takes its first row along, and the last two
            // rows stay together so the next page never starts with a lone row.
            var needed = rows[i].Height;
            if (table.Rows[i].IsGroupHeading && i + 1 < rows.Count)
            {
                needed += rows[i + 1].Height;
            }

            if (i == rows.Count - 2)
            {
                needed = rows[i].Height + rows[i + 1].Height;
            }

            if (_y + needed > Bottom)
            {
                NewPage();
                if (table.Title is { } title)
                {
                    DrawLines([title + " (continued)"], continuedFont, Left, Muted);
                    _y += 2;
                }

                DrawHead();
            }

            DrawRow(table.Rows[i], rows[i], table.Columns, widths);
        }

        _y += 8;

        void DrawHead()
        {
            G.DrawRectangle(new XSolidBrush(HeadFill), Left, _y, ContentWidth, headHeight);
            var x = Left;
            for (var c = 0; c < widths.Length; c++)
            {
                DrawCell(head[c], headFont, x, widths[c], table.Columns[c].Align, Ink, _y + CellPadY);
                x += widths[c];
            }

            _y += headHeight;
            G.DrawLine(new XPen(Muted, 0.6), Left, _y, Left + ContentWidth, _y);
        }
    }

    /// <summary>The sign-off block: one box per role with lines for the name, the date and the signature.</summary>
    internal void SignOffBlock(IReadOnlyList<SignOffLine> lines)
    {
        const double boxHeight = 58;
        var height = lines.Count * (boxHeight + 6);
        Begin(height);
        var labelFont = Font(true, 9);
        var valueFont = Font(false, 9.5);
        var smallFont = Font(false, 7);
        var pen = new XPen(Rule, 0.7);
        var linePen = new XPen(Muted, 0.6);
        var nameX = Left + 100;
        var dateX = Left + 100 + (ContentWidth - 100) * 0.42;
        var signX = Left + 100 + (ContentWidth - 100) * 0.64;
        var right = Left + ContentWidth - 8;
        foreach (var line in lines)
        {
            G.DrawRectangle(pen, Left, _y, ContentWidth, boxHeight);
            G.DrawString(line.Role, labelFont, new XSolidBrush(Ink), new XPoint(Left + 8, _y + 18));
            if (!line.Recorded)
            {
                G.DrawString("not signed", smallFont, new XSolidBrush(DraftRed), new XPoint(Left + 8, _y + 30));
            }

            var lineY = _y + 36;
            var ink = new XSolidBrush(Ink);
            G.DrawString(Ellipsize(line.Name, valueFont, dateX - nameX - 14), valueFont, ink, new XPoint(nameX, lineY - 4));
            G.DrawString(line.Date, valueFont, ink, new XPoint(dateX, lineY - 4));
            G.DrawLine(linePen, nameX, lineY, dateX - 12, lineY);
            G.DrawLine(linePen, dateX, lineY, signX - 12, lineY);
            G.DrawLine(linePen, signX, lineY, right, lineY);
            var muted = new XSolidBrush(Muted);
            G.DrawString("Name", smallFont, muted, new XPoint(nameX, lineY + 10));
            G.DrawString("Date (UTC)", smallFont, muted, new XPoint(dateX, lineY + 10));
            G.DrawString("Signature", smallFont, muted, new XPoint(signX, lineY + 10));
            _y += boxHeight + 6;
        }
    }

    /// <summary>Draws every page's header and footer; call once, after the last section.</summary>
    internal void Finish()
    {
        if (_pending.Count > 0)
        {
            Begin(0);
        }

        _gfx?.Dispose();
        _gfx = null;
        for (var i = 0; i < _pages.Count; i++)
        {
            using var gfx = XGraphics.FromPdfPage(_pages[i], XGraphicsPdfPageOptions.Append);
            DrawHeader(gfx, i + 1, _pages.Count);
            DrawFooter(gfx);
        }
    }

    public void Dispose()
    {
        _gfx?.Dispose();
        _gfx = null;
    }

    private double PendingHeight => _pending.Height;

    /// <summary>
    /// Starts a block whose first unbreakable part is <paramref name="firstPart"/> points high: the pending headings
    /// and that part go on one page, then the headings are drawn.
    /// </summary>
    private void Begin(double firstPart)
    {
        if (_y + _pending.Height + firstPart > Bottom && _y > Top + 0.5)
        {
            NewPage();
        }

        _pending.Draw();
    }

    private void NewPage()
    {
        _gfx?.Dispose();
        var page = _document.AddPage();
        page.Width = XUnit.FromPoint(PageWidth);
        page.Height = XUnit.FromPoint(PageHeight);
        _pages.Add(page);
        _gfx = XGraphics.FromPdfPage(page);
        _y = Top;
    }

    private void DrawHeader(XGraphics gfx, int page, int pageCount)
    {
        var m = _model;
        var top = Margin / 2;
        var right = Left + ContentWidth;
        var titleFont = Font(true, 11);
        var small = Font(false, 8);
        var smallBold = Font(true, 8);
        var ink = new XSolidBrush(Ink);
        var muted = new XSolidBrush(Muted);

        var revision = m.RevisionText;
        var revisionWidth = gfx.MeasureString(revision, titleFont).Width;
        gfx.DrawString(Ellipsize(m.DesignName, titleFont, ContentWidth - revisionWidth - 16, gfx), titleFont, ink, new XPoint(Left, top + 12));
        gfx.DrawString(revision, titleFont, ink, new XPoint(right - revisionWidth, top + 12));

        var marking = m.SignOffMarking;
        var markingFont = Font(true, 8.5);
        var markingWidth = gfx.MeasureString(marking, markingFont).Width + 12;
        gfx.DrawString(Ellipsize(m.CustomerLine, small, ContentWidth - markingWidth - 16, gfx), small, muted, new XPoint(Left, top + 27));
        var color = m.IsDraft ? DraftRed : SignedGreen;
        gfx.DrawRectangle(new XSolidBrush(color), right - markingWidth, top + 17, markingWidth, 14);
        gfx.DrawString(marking, markingFont, XBrushes.White, new XPoint(right - markingWidth + 6, top + 27));

        var pageLabel = DesignSheetModel.PageLabel(page, pageCount);
        var pageWidth = gfx.MeasureString(pageLabel, smallBold).Width;
        gfx.DrawString(Ellipsize(m.MetaLine, small, ContentWidth - pageWidth - 16, gfx), small, muted, new XPoint(Left, top + 41));
        gfx.DrawString(pageLabel, smallBold, ink, new XPoint(right - pageWidth, top + 41));
        gfx.DrawLine(new XPen(Accent, 1.2), Left, top + 48, right, top + 48);
    }

    private void DrawFooter(XGraphics gfx)
    {
        var font = Font(false, 7);
        var y = PageHeight - FooterHeight + 6;
        gfx.DrawLine(new XPen(Rule, 0.6), Left, y - 9, Left + ContentWidth, y - 9);
        var text = DesignSheetModel.SheetTitle + " · design estimates: the cell maker's datasheet, local codes and the authority having jurisdiction govern (see Cautions).";
        gfx.DrawString(Ellipsize(text, font, ContentWidth, gfx), font, new XSolidBrush(Muted), new XPoint(Left, y));
    }

    private void List(IReadOnlyList<string> items, Func<int, string> marker)
    {
        var font = Font(false, 9);
        const double indent = 16;
        for (var i = 0; i < items.Count; i++)
        {
            var lines = Wrap(items[i], font, ContentWidth - indent);
            Begin(lines.Count * LineHeight(font) + 3);
            G.DrawString(marker(i), font, new XSolidBrush(Ink), new XPoint(Left, _y + Ascent(font)));
            DrawLines(lines, font, Left + indent, Ink);
            _y += 3;
        }

        _y += 3;
    }

    private (double Height, List<string>[] Cells) Measure(SheetTableRow row, IReadOnlyList<SheetColumn> columns, double[] widths, XFont body, XFont bold, XFont group)
    {
        if (row.IsGroupHeading)
        {
            var lines = Wrap(row.Cells.Count > 0 ? row.Cells[0] : "", group, ContentWidth - 2 * CellPadX);
            return (lines.Count * LineHeight(group) + 2 * CellPadY, [lines]);
        }

        var cells = new List<string>[columns.Count];
        var height = 0.0;
        for (var c = 0; c < columns.Count; c++)
        {
            var text = c < row.Cells.Count ? row.Cells[c] : "";
            var font = columns[c].Bold ? bold : body;
            cells[c] = Wrap(text, font, widths[c] - 2 * CellPadX);
            height = Math.Max(height, cells[c].Count * LineHeight(font));
        }

        return (height + 2 * CellPadY, cells);
    }

    private void DrawRow(SheetTableRow row, (double Height, List<string>[] Cells) measured, IReadOnlyList<SheetColumn> columns, double[] widths)
    {
        if (row.IsGroupHeading)
        {
            G.DrawRectangle(new XSolidBrush(GroupFill), Left, _y, ContentWidth, measured.Height);
            DrawCell(measured.Cells[0], Font(true, 8), Left, ContentWidth, ColumnAlign.Left, Accent, _y + CellPadY);
        }
        else
        {
            var x = Left;
            for (var c = 0; c < columns.Count; c++)
            {
                var font = columns[c].Bold ? Font(true, 8.5) : Font(false, 8.5);
                DrawCell(measured.Cells[c], font, x, widths[c], columns[c].Align, Ink, _y + CellPadY);
                x += widths[c];
            }
        }

        _y += measured.Height;
        G.DrawLine(new XPen(Rule, 0.4), Left, _y, Left + ContentWidth, _y);
    }

    private void DrawCell(List<string> lines, XFont font, double x, double width, ColumnAlign align, XColor color, double top)
    {
        var brush = new XSolidBrush(color);
        var y = top;
        foreach (var line in lines)
        {
            var lineX = align == ColumnAlign.Right ? x + width - CellPadX - G.MeasureString(line, font).Width : x + CellPadX;
            G.DrawString(line, font, brush, new XPoint(lineX, y + Ascent(font)));
            y += LineHeight(font);
        }
    }

    private double[] ColumnWidths(IReadOnlyList<SheetColumn> columns)
    {
        var total = columns.Sum(c => c.Weight);
        return columns.Select(c => ContentWidth * c.Weight / total).ToArray();
    }

    private void DrawLines(IEnumerable<string> lines, XFont font, double x, XColor color)
    {
        var brush = new XSolidBrush(color);
        foreach (var line in lines)
        {
            G.DrawString(line, font, brush, new XPoint(x, _y + Ascent(font)));
            _y += LineHeight(font);
        }
    }

    internal XFont Font(bool bold, double size)
    {
        if (!_fonts.TryGetValue((bold, size), out var font))
        {
            font = new XFont(SheetFonts.Family, size, bold ? XFontStyleEx.Bold : XFontStyleEx.Regular, Unicode);
            _fonts[(bold, size)] = font;
        }

        return font;
    }

    private static double LineHeight(XFont font) => font.Size * 1.3;

    private static double Ascent(XFont font) => font.Size * 1.0;

    private double Width(string text, XFont font, XGraphics? gfx = null) => (gfx ?? G).MeasureString(text, font).Width;

    private string Ellipsize(string text, XFont font, double width, XGraphics? gfx = null)
    {
        if (Width(text, font, gfx) <= width)
        {
            return text;
        }

        var elements = TextElements(text);
        var count = elements.Count;
        while (count > 0 && Width(string.Concat(elements.Take(count)) + "…", font, gfx) > width)
        {
            count--;
        }

        return string.Concat(elements.Take(count)).TrimEnd() + "…";
    }

    /// <summary>Greedy word wrap; a word wider than the line is broken between characters. Explicit newlines are kept.</summary>
    internal List<string> Wrap(string text, XFont font, double width)
    {
        var result = new List<string>();
        var space = Width(" ", font);
        foreach (var paragraph in text.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n'))
        {
            var line = new System.Text.StringBuilder();
            var lineWidth = 0.0;
            foreach (var word in paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                var wordWidth = Width(word, font);
                if (wordWidth > width)
                {
                    foreach (var piece in BreakWord(word, font, width, width - (line.Length == 0 ? 0 : lineWidth + space)))
                    {
                        if (line.Length > 0 && lineWidth + space + Width(piece, font) > width)
                        {
                            result.Add(line.ToString());
                            line.Clear();
                            lineWidth = 0;
                        }

                        if (line.Length > 0)
                        {
                            line.Append(' ');
                            lineWidth += space;
                        }

                        line.Append(piece);
                        lineWidth += Width(piece, font);
                    }

                    continue;
                }

                if (line.Length > 0 && lineWidth + space + wordWidth > width)
                {
                    result.Add(line.ToString());
                    line.Clear();
                    lineWidth = 0;
                }

                if (line.Length > 0)
                {
                    line.Append(' ');
                    lineWidth += space;
                }

                line.Append(word);
                lineWidth += wordWidth;
            }

            result.Add(line.ToString());
        }

        return result;
    }

    /// <summary>Breaks a word wider than a line, preferring a break after '.', '-', '/', '_' or ','.</summary>
    private List<string> BreakWord(string word, XFont font, double width, double firstWidth)
    {
        var pieces = new List<string>();
        var current = new List<string>();
        var limit = firstWidth > font.Size * 3 ? firstWidth : width;
        foreach (var element in TextElements(word))
        {
            if (current.Count > 0 && Width(string.Concat(current) + element, font) > limit)
            {
                var cut = current.FindLastIndex(e => e is "." or "-" or "/" or "_" or ",") + 1;
                if (cut <= 0 || cut < current.Count / 3)
                {
                    cut = current.Count;
                }

                pieces.Add(string.Concat(current.Take(cut)));
                current.RemoveRange(0, cut);
                limit = width;
            }

            current.Add(element);
        }

        if (current.Count > 0)
        {
            pieces.Add(string.Concat(current));
        }

        return pieces;
    }

    private static List<string> TextElements(string text)
    {
        var list = new List<string>();
        var e = StringInfo.GetTextElementEnumerator(text);
        while (e.MoveNext())
        {
            list.Add((string)e.Current);
        }

        return list;
    }

    /// <summary>Headings waiting for the block they belong to, with the height they will take.</summary>
    private sealed class PendingHeadings
    {
        private readonly List<(double Height, Action Draw)> _items = [];

        public double Height => _items.Sum(i => i.Height);

        public int Count => _items.Count;

        public void Add(double height, Action draw) => _items.Add((height, draw));

        public void Draw()
        {
            foreach (var item in _items)
            {
                item.Draw();
            }

            _items.Clear();
        }
    }
}
