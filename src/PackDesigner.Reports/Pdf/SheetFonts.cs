using System.Security.Cryptography;
using PdfSharp.Fonts;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// The sheet's fonts, DejaVu Sans regular and bold, shipped in this assembly as embedded resources (Bitstream Vera
/// licence, Fonts/LICENSE-DejaVu.txt) so the sheet looks the same on a machine without any font installed.
/// PDFsharp takes them through an <see cref="IFontResolver"/> that can be set only once per process; ScottPlot
/// takes them from files, written once to the temporary folder.
/// </summary>
internal static class SheetFonts
{
    public const string Family = "DejaVu Sans";
    public const string RegularFace = "DejaVuSans";
    public const string BoldFace = "DejaVuSans-Bold";

    private static readonly Lazy<byte[]> Regular = new(() => Load("PackDesigner.Reports.Fonts.DejaVuSans.ttf"));
    private static readonly Lazy<byte[]> Bold = new(() => Load("PackDesigner.Reports.Fonts.DejaVuSans-Bold.ttf"));
    private static readonly Lazy<(string Regular, string Bold)> Files = new(WriteFiles);
    private static readonly object Gate = new();
    private static bool _resolverInstalled;

    public static byte[] RegularBytes => Regular.Value;

    public static byte[] BoldBytes => Bold.Value;

    /// <summary>Paths of the two font files on disk, for libraries that read fonts only from files.</summary>
    public static (string Regular, string Bold) FilePaths => Files.Value;

    /// <summary>Installs the resolver into PDFsharp once; safe to call from many threads.</summary>
    /// <exception cref="InvalidOperationException">Another font resolver was installed into PDFsharp before.</exception>
    public static void EnsurePdfResolver()
    {
        if (Volatile.Read(ref _resolverInstalled))
        {
            return;
        }

        lock (Gate)
        {
            if (_resolverInstalled)
            {
                return;
            }

            var current = GlobalFontSettings.FontResolver;
            if (current is null)
            {
                GlobalFontSettings.FontResolver = new EmbeddedFontResolver();
            }
            else if (current is not EmbeddedFontResolver)
            {
                throw new InvalidOperationException(
                    "A different PDFsharp font resolver is installed in this process; the design sheet needs its own embedded fonts.");
            }

            Volatile.Write(ref _resolverInstalled, true);
        }
    }

    private static byte[] Load(string name)
    {
        using var stream = typeof(SheetFonts).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"The font resource {name} is missing from the assembly.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }

    private static (string, string) WriteFiles()
    {
        // One folder per font content, so a different font version never reuses a stale file.
        var hash = Convert.ToHexStringLower(SHA256.HashData(RegularBytes.Concat(BoldBytes).ToArray()))[..12];
        var folder = Path.Combine(Path.GetTempPath(), "packdesigner-fonts-" + hash);
        Directory.CreateDirectory(folder);
        return (Write(folder, "DejaVuSans.ttf", RegularBytes), Write(folder, "DejaVuSans-Bold.ttf", BoldBytes));
    }

    private static string Write(string folder, string name, byte[] bytes)
    {
        var path = Path.Combine(folder, name);
        if (File.Exists(path) && new FileInfo(path).Length == bytes.Length)
        {
            return path;
        }

        // Write to a private file, then move it into place: another process may be doing the same.
        var temp = Path.Combine(folder, name + "." + Guid.NewGuid().ToString("N") + ".tmp");
        File.WriteAllBytes(temp, bytes);
        try
        {
            File.Move(temp, path, overwrite: true);
        }
        catch (IOException) when (File.Exists(path) && new FileInfo(path).Length == bytes.Length)
        {
            File.Delete(temp);
        }

        return path;
    }

    private sealed class EmbeddedFontResolver : IFontResolver
    {
        public FontResolverInfo? ResolveTypeface(string familyName, bool bold, bool italic) =>
            // Every family maps onto DejaVu Sans: the sheet asks for no other, and a stray request must not fail.
            new(bold ? BoldFace : RegularFace, mustSimulateBold: false, mustSimulateItalic: italic);

        public byte[]? GetFont(string faceName) => faceName == BoldFace ? BoldBytes : RegularBytes;
    }
}
