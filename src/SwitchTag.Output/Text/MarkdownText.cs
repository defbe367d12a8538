using System.Text;
using SwitchTag.Core.Text;

namespace SwitchTag.Output.Text;

/// <summary>Transcript text made inert in Markdown: the ASCII punctuation that can start inline syntax
/// (emphasis, code, links, images, raw HTML, entities, table cells, escapes) is backslash-escaped
/// (CommonMark 0.31 section 2.4 allows it for any ASCII punctuation). Values never start a line, so
/// block markers (#, -, digits) are harmless and stay readable. Line breaks become spaces so a value
/// stays in its table cell. Control and bidi-override characters show as visible marks
/// (<see cref="DisplayText"/>), so a transcript cannot reorder or hide what a reader sees.</summary>
public static class MarkdownText
{
    private const string Active = "\\`*_[]<>&|!~";

    public static string Escape(string? text)
    {
        if (string.IsNullOrEmpty(text)) return "";
        text = DisplayText.Neutralise(text);
        var sb = new StringBuilder(text.Length + 8);
        foreach (char c in text)
        {
            if (c is '\r' or '\n' or '\t') { sb.Append(' '); continue; }
            if (Active.Contains(c)) sb.Append('\\');
            sb.Append(c);
        }
        return sb.ToString();
    }
}
