using System.Security.Cryptography;
using System.Text;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// PDFsharp 6.2.4 draws two things from <see cref="Guid.NewGuid"/> on every save: the six-letter tag of each
/// embedded font subset (/BaseFont and /FontName "ABCDEF+DejaVu Sans") and the XMP DocumentID/InstanceID. Both sit
/// in uncompressed objects. This overwrites them in place with values derived from a seed, each with one of the
/// same length, so every byte offset (and with it the cross-reference table) stays valid.
/// </summary>
internal static class Deterministic
{
    private static readonly byte[][] FontKeys = [Encoding.ASCII.GetBytes("/BaseFont/"), Encoding.ASCII.GetBytes("/FontName/")];
    private static readonly byte[][] XmpKeys = [Encoding.ASCII.GetBytes("<xmpMM:DocumentID>uuid:"), Encoding.ASCII.GetBytes("<xmpMM:InstanceID>uuid:")];
    private const int UuidLength = 36;

    /// <summary>Rewrites <paramref name="pdf"/> in place.</summary>
    public static void Stabilise(Span<byte> pdf, string seed)
    {
        foreach (var key in FontKeys)
        {
            for (var at = pdf.IndexOf(key); at >= 0;)
            {
                var tag = at + key.Length;
                if (IsSubsetTag(pdf, tag))
                {
                    var nameEnd = tag + 7;
                    while (nameEnd < pdf.Length && !IsDelimiter(pdf[nameEnd]))
                    {
                        nameEnd++;
                    }

                    var name = Encoding.Latin1.GetString(pdf[(tag + 7)..nameEnd]);
                    Letters(seed + "|font|" + name).CopyTo(pdf[tag..]);
                }

                var next = pdf[(at + 1)..].IndexOf(key);
                at = next < 0 ? -1 : at + 1 + next;
            }
        }

        foreach (var key in XmpKeys)
        {
            var at = pdf.IndexOf(key);
            if (at >= 0 && at + key.Length + UuidLength <= pdf.Length)
            {
                Encoding.ASCII.GetBytes(Uuid(seed + "|" + Encoding.ASCII.GetString(key))).CopyTo(pdf[(at + key.Length)..]);
            }
        }
    }

    private static bool IsSubsetTag(ReadOnlySpan<byte> pdf, int at)
    {
        if (at + 7 > pdf.Length || pdf[at + 6] != (byte)'+')
        {
            return false;
        }

        foreach (var b in pdf.Slice(at, 6))
        {
            if (b is < (byte)'A' or > (byte)'Z')
            {
                return false;
            }
        }

        return true;
    }

    private static bool IsDelimiter(byte b) => b is (byte)'/' or (byte)'<' or (byte)'>' or (byte)'[' or (byte)']' or (byte)'(' or (byte)')' or (byte)' ' or (byte)'\r' or (byte)'\n';

    private static byte[] Letters(string seed)
    {
        var hash = SHA256.HashData(Encoding.UTF8.GetBytes(seed));
        var tag = new byte[6];
        for (var i = 0; i < 6; i++)
        {
            tag[i] = (byte)('A' + hash[i] % 26);
        }

        return tag;
    }

    private static string Uuid(string seed) => new Guid(SHA256.HashData(Encoding.UTF8.GetBytes(seed)).AsSpan(0, 16)).ToString("D");
}
