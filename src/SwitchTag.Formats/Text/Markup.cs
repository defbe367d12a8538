using System.Text;

namespace SwitchTag.Formats.Text;

/// <summary>Formatting markup of plain caption formats, removed to leave the spoken text.</summary>
internal static class Markup
{
    /// <summary>Longest tag looked for, so a stray '&lt;' on a huge line costs a bounded scan.</summary>
    private const int MaxTagLength = 200;

    /// <summary>SubRip styling: <c>&lt;i&gt; &lt;b&gt; &lt;u&gt; &lt;s&gt; &lt;font ...&gt;</c> and their end tags,
    /// and <c>{\an8}</c>-style override codes. Other '&lt;' (e.g. "&lt;3", "a &lt; b") stay as text.</summary>
    public static string StripSrtTags(ReadOnlySpan<char> line)
    {
        if (line.IndexOfAny('<', '{') < 0) return line.ToString();
        var sb = new StringBuilder(line.Length);
        int i = 0;
        while (i < line.Length)
        {
            char c = line[i];
            if (c == '<' || (c == '{' && i + 1 < line.Length && line[i + 1] == '\\'))
            {
                int limit = Math.Min(line.Length, i + MaxTagLength);
                int close = line[(i + 1)..limit].IndexOf(c == '<' ? '>' : '}');
                if (close >= 0 && (c == '{' || IsTag(line.Slice(i + 1, close))))
                {
                    i += close + 2;
                    continue;
                }
            }
            sb.Append(c);
            i++;
        }
        return sb.ToString();
    }

    private static bool IsTag(ReadOnlySpan<char> body)
    {
        if (body.Length > 0 && body[0] == '/') body = body[1..];
        int n = 0;
        while (n < body.Length && char.IsAsciiLetter(body[n])) n++;
        if (n == 0) return false;
        var name = body[..n].ToString().ToLowerInvariant();
        return name is "i" or "b" or "u" or "s" or "font" && (n == body.Length || char.IsWhiteSpace(body[n]));
    }
}
