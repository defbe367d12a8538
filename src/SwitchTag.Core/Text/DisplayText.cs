using System.Text;

namespace SwitchTag.Core.Text;

/// <summary>Text from a transcript made safe to show in a report or on a terminal: control characters
/// other than tab and line breaks become their Unicode Control Pictures (ESC shows as ␛, so it cannot
/// start a terminal escape sequence), and the bidirectional embedding, override and isolate controls
/// (U+202A-U+202E, U+2066-U+2069) become a visible <c>[U+202E]</c>, so they cannot reorder what
/// follows them on the line ("Trojan Source", CVE-2021-42574). Marks that only hint a direction (LRM,
/// RLM, ALM) are kept: right-to-left text needs them and they reorder nothing around them.</summary>
public static class DisplayText
{
    public static string Neutralise(string? text)
    {
        if (string.IsNullOrEmpty(text)) return text ?? "";
        int first = 0;
        while (first < text.Length && !NeedsChange(text[first])) first++;
        if (first == text.Length) return text;
        var sb = new StringBuilder(text.Length + 16).Append(text, 0, first);
        for (int i = first; i < text.Length; i++)
        {
            char c = text[i];
            if (!NeedsChange(c)) sb.Append(c);
            else if (c < 0x20) sb.Append((char)(0x2400 + c));
            else if (c == 0x7F) sb.Append('\u2421');
            else sb.Append("[U+").Append(((int)c).ToString("X4")).Append(']');
        }
        return sb.ToString();
    }

    /// <summary>True for the characters <see cref="Neutralise"/> replaces.</summary>
    public static bool NeedsChange(char c) =>
        (c < 0x20 && c is not '\t' and not '\n' and not '\r') || c is >= '\u007F' and <= '\u009F'
        || c is >= '\u202A' and <= '\u202E' || c is >= '\u2066' and <= '\u2069';
}
