using System.Text;
using System.Text.Unicode;

namespace SwitchTag.Formats.Text;

/// <summary>Bytes to text. UTF-8 (with or without BOM) is decoded strictly: an invalid sequence rejects
/// the file, naming its byte offset. UTF-16 and UTF-32 are accepted only with a BOM (LE or BE). Text
/// containing NUL is treated as binary, except a file that opens with the WEBVTT signature: the WebVTT
/// parser replaces NUL by U+FFFD (done after decoding, where the format is known).</summary>
internal static class TextDecoding
{
    public readonly record struct Decoded(string? Text, int ErrorLine, string? Error);

    public static Decoded Decode(ReadOnlySpan<byte> bytes)
    {
        // UTF-32 first: its little-endian BOM (FF FE 00 00) begins with UTF-16 LE's (FF FE).
        if (bytes.Length >= 4 && bytes[0] == 0xFF && bytes[1] == 0xFE && bytes[2] == 0 && bytes[3] == 0)
            return Wide(bytes[4..], new UTF32Encoding(bigEndian: false, byteOrderMark: false, throwOnInvalidCharacters: true), "UTF-32 LE", 4);
        if (bytes.Length >= 4 && bytes[0] == 0 && bytes[1] == 0 && bytes[2] == 0xFE && bytes[3] == 0xFF)
            return Wide(bytes[4..], new UTF32Encoding(bigEndian: true, byteOrderMark: false, throwOnInvalidCharacters: true), "UTF-32 BE", 4);
        if (bytes.Length >= 2 && bytes[0] == 0xFF && bytes[1] == 0xFE)
            return Wide(bytes[2..], new UnicodeEncoding(bigEndian: false, byteOrderMark: false, throwOnInvalidBytes: true), "UTF-16 LE", 2);
        if (bytes.Length >= 2 && bytes[0] == 0xFE && bytes[1] == 0xFF)
            return Wide(bytes[2..], new UnicodeEncoding(bigEndian: true, byteOrderMark: false, throwOnInvalidBytes: true), "UTF-16 BE", 2);
        int bom = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
        var body = bytes[bom..];

        int nul = body.IndexOf((byte)0);
        if (nul >= 0 && !body.StartsWith("WEBVTT"u8))
            return new Decoded(null, LineOfByte(body, nul), LooksLikeUtf16(body)
                ? $"binary or UTF-16 text without a byte-order mark (NUL byte at byte offset {nul + bom}); save it as UTF-8 or UTF-16 with a BOM"
                : $"binary file (NUL byte at byte offset {nul + bom})");

        // Valid text is decoded straight into its string: through a char buffer, a 20 MB file took
        // 40 MB more for the length of the read. Only a rejected file is decoded again, to say where.
        if (Utf8.IsValid(body)) return new Decoded(Encoding.UTF8.GetString(body), 0, null);
        Utf8.ToUtf16(body, new char[body.Length], out int read, out _, replaceInvalidSequences: false);
        return new Decoded(null, LineOfByte(body, read), $"invalid UTF-8 at byte offset {read + bom} (byte 0x{body[read]:X2}); the file must be UTF-8 or UTF-16 with a BOM");
    }

    private static Decoded Wide(ReadOnlySpan<byte> body, Encoding encoding, string name, int unit)
    {
        if (body.Length % unit != 0)
            return new Decoded(null, 1, $"{name} text with a byte count ({body.Length + unit}) that is not a multiple of {unit}; the file is cut short or not {name}");
        string text;
        try
        {
            text = encoding.GetString(body);
        }
        catch (DecoderFallbackException e)
        {
            return new Decoded(null, 1, $"invalid {name} at byte offset {e.Index + unit}: {e.Message}");
        }
        int nul = text.IndexOf('\0');
        if (nul >= 0 && !text.StartsWith("WEBVTT", StringComparison.Ordinal))
            return new Decoded(null, LineOfChar(text, nul), $"binary content in {name} text (NUL character at char offset {nul})");
        return new Decoded(text, 0, null);
    }

    /// <summary>Most odd or most even bytes NUL: ASCII-range text stored as UTF-16 with no BOM.</summary>
    private static bool LooksLikeUtf16(ReadOnlySpan<byte> body)
    {
        int n = Math.Min(body.Length, 4096) & ~1, half = n / 2, even = 0, odd = 0;
        for (int i = 0; i < n; i += 2)
        {
            if (body[i] == 0) even++;
            if (body[i + 1] == 0) odd++;
        }
        return half >= 2 && Math.Max(even, odd) * 10 >= half * 9 && Math.Min(even, odd) * 10 < half;
    }

    private static int LineOfByte(ReadOnlySpan<byte> body, int offset) => 1 + body[..offset].Count((byte)'\n');

    private static int LineOfChar(string text, int offset) => 1 + text.AsSpan(0, offset).Count('\n');
}
