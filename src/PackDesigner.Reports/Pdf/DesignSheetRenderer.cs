using System.Security.Cryptography;
using System.Text;
using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf.Sections;
using PdfSharp.Pdf;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// Renders the design sheet as PDF with PDFsharp. The output depends only on the model: the document's creation
/// and modification dates are the revision's time and its file identifier is derived from the input hash, so the
/// same revision gives the same bytes.
/// </summary>
public static class DesignSheetRenderer
{
    /// <summary>The sections of the standard sheet, in order.</summary>
    public static IReadOnlyList<ISheetSection> DefaultSections { get; } =
    [
        new SummarySection(),
        new InputsSection(),
        new BmsSection(),
        new ChargerSection(),
        new ProtectionSection(),
        new ChartsSection(),
        new SpreadSection(),
        new FindingsSection(),
        new BuildNotesSection(),
        new CautionsSection(),
        new SignOffSection(),
    ];

    /// <summary>The standard sheet.</summary>
    public static byte[] RenderPdf(DesignSheetModel model, PaperSize paper) => RenderPdf(model, paper, DefaultSections);

    /// <summary>A sheet with the given sections, in order.</summary>
    public static byte[] RenderPdf(DesignSheetModel model, PaperSize paper, IReadOnlyList<ISheetSection> sections)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(sections);
        SheetFonts.EnsurePdfResolver();

        using var document = new PdfDocument();
        var created = DateTime.SpecifyKind(model.Header.CreatedAtUtc, DateTimeKind.Utc);
        document.Info.Title = $"{DesignSheetModel.SheetTitle}: {model.DesignName}, {model.RevisionText}";
        document.Info.Subject = model.MetaLine;
        document.Info.Creator = "PackDesigner";
        document.Info.CreationDate = created;
        document.Info.ModificationDate = created;
        document.Language = "en";
        var id = DocumentId(model);
        document.Internals.FirstDocumentID = id;
        document.Internals.SecondDocumentID = id;

        using (var layout = new SheetLayout(document, paper, model))
        {
            foreach (var section in sections)
            {
                if (!section.Prints(model))
                {
                    continue;
                }

                layout.SectionHeading(section.Title);
                section.Render(model, layout);
            }

            layout.Finish();
        }

        using var output = new MemoryStream(512 * 1024);
        document.Save(output, closeStream: false);
        var bytes = output.ToArray();
        Deterministic.Stabilise(bytes, id);
        return bytes;
    }

    /// <summary>16 bytes from the input hash, revision and time: equal for equal revisions, different otherwise.</summary>
    private static string DocumentId(DesignSheetModel model)
    {
        var seed = $"{model.Header.InputHash.Trim().ToLowerInvariant()}|{model.Header.RevisionNumber}|{model.DateText}|{model.Header.CalculationVersion}";
        var bytes = SHA256.HashData(Encoding.UTF8.GetBytes(seed));
        return Encoding.Latin1.GetString(bytes, 0, 16);
    }
}
