using System.Text;
using Markdig.Helpers;

namespace SwitchTag.Formats.Text;

/// <summary>HTML character references as WebVTT cue text uses them: named (the HTML entity table, via
/// Markdig's copy of it: &amp;amp; &amp;lt; &amp;gt; &amp;nbsp; &amp;lrm; &amp;rlm; ...), decimal
/// <c>&amp;#NN;</c> and hexadecimal <c>&amp;#xHH;</c>. An unrecognised reference stays as written.</summary>
internal static class CharacterReferences
{
    /// <summary>Longest name looked for, so a stray '&amp;' on a huge line costs a bounded scan.</summary>
    private const int MaxNameLength = 32;

    /// <summary>At <paramref name="pos"/> (an '&amp;'), appends the decoded text and returns the chars
    /// consumed, or 0 when this is no reference (the caller keeps the '&amp;' literally).</summary>
    public static int TryDecode(ReadOnlySpan<char> s, int pos, StringBuilder into)
    {
        int limit = Math.Min(s.Length, pos + MaxNameLength + 2);
        int semi = s[pos..limit].IndexOf(';');
        if (semi < 2) return 0;
        var body = s.Slice(pos + 1, semi - 1);
        if (body[0] == '#')
        {
            bool hex = body.Length > 1 && (body[1] == 'x' || body[1] == 'X');
            var digits = body[(hex ? 2 : 1)..];
            if (digits.IsEmpty) return 0;
            int value = 0;
            foreach (char c in digits)
            {
                int d = char.IsAsciiDigit(c) ? c - '0' : hex && char.IsAsciiHexDigit(c) ? (c | 0x20) - 'a' + 10 : -1;
                if (d < 0) return 0;
                value = Math.Min(value * (hex ? 16 : 10) + d, 0x110000);
            }
            into.Append(Rune.IsValid(value) && value != 0 ? new Rune(value).ToString() : "\uFFFD");
            return semi + 1;
        }
        foreach (char c in body) if (!char.IsAsciiLetterOrDigit(c)) return 0;
        var decoded = EntityHelper.DecodeEntity(body);
        if (decoded is null) return 0;
        into.Append(decoded);
        return semi + 1;
    }
}
