using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// PDFsharp 6.2.4 draws two things from <see cref="Guid.NewGuid"/> on every save: the six-letter tag of each
/// embedded font subset (/BaseFont and /FontName "ABCDEF+DejaVu Sans") and the XMP DocumentID/InstanceID. Both sit
/// in uncompressed objects. This replaces them with values derived from a seed, each with one of the same length,
/// so every byte offset (and with it the cross-reference table) stays valid.
/// </summary>
internal static partial class Deterministic
{
    public static byte[] Stabilise(byte[] pdf, string seed)
    {
        var text = Encoding.Latin1.GetString(pdf);
        var tags = new Dictionary<string, string>(StringComparer.Ordinal);
        text = SubsetTag().Replace(text, m =>
        {
            var key = m.Groups["tag"].Value + "+" + m.Groups["name"].Value;
            if (!tags.TryGetValue(key, out var tag))
            {
                tag = Letters(seed + "|font|" + m.Groups["name"].Value);
                tags[key] = tag;
            }

            return m.Groups["key"].Value + tag + "+" + m.Groups["name"].Value;
        });
        text = XmpId().Replace(text, m => m.Groups["open"].Value + "uuid:" + Uuid(seed + "|" + m.Groups["kind"].Value));
        return Encoding.Latin1.GetBytes(text);
    }

    private static string Letters(string seed)
    {
        var hash = SHA256.HashData(Encoding.UTF8.GetBytes(seed));
        var tag = new StringBuilder(6);
        for (var i = 0; i < 6; i++)
        {
            tag.Append((char)('A' + hash[i] % 26));
        }

        return tag.ToString();
    }

    private static string Uuid(string seed)
    {
        var hash = SHA256.HashData(Encoding.UTF8.GetBytes(seed));
        return new Guid(hash.AsSpan(0, 16)).ToString("D");
    }

    [GeneratedRegex(@"(?<key>/(?:BaseFont|FontName)\s*/)(?<tag>[A-Z]{6})\+(?<name>[^\s/<>\[\]()]+)")]
    private static partial Regex SubsetTag();

    [GeneratedRegex(@"(?<open><xmpMM:(?<kind>DocumentID|InstanceID)>)uuid:[0-9a-fA-F]{8}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{12}")]
    private static partial Regex XmpId();
}
