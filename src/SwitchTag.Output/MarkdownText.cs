using System.Text;

namespace SwitchTag.Output;

/// <summary>Transcript text made inert in Markdown: every ASCII punctuation char is backslash-escaped
/// (CommonMark 0.31 section 2.4: any ASCII punctuation may be), so no text can open emphasis, a link,
/// a table cell or raw HTML; line breaks become spaces so a value stays in its table cell.</summary>
public static class MarkdownText
{
    public static string Escape(string? text)
    {
        if (string.IsNullOrEmpty(text)) return "";
        var sb = new StringBuilder(text.Length + 8);
        foreach (char c in text)
        {
            if (c is '\r' or '\n' or '\t') { sb.Append(' '); continue; }
            if (char.IsAsciiLetterOrDigit(c) || c == ' ' || c > 0x7E || c < 0x21) { sb.Append(c); continue; }
            sb.Append('\\').Append(c);
        }
        return sb.ToString();
    }
}
