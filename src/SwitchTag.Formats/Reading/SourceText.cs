using SwitchTag.Core.Documents;

namespace SwitchTag.Formats.Reading;

/// <summary>One line of the input: 1-based number and its char range without the line terminator.</summary>
public readonly record struct TextLine(int Number, int Start, int End)
{
    public int Length => End - Start;
}

/// <summary>The decoded text of one file split into lines (CRLF, CR and LF all end a line), so every
/// reader can name a file:line and keep offsets into the original text.</summary>
public sealed class SourceText
{
    private readonly TextLine[] lines;

    public SourceText(string path, string text)
    {
        Path = path;
        Text = text;
        lines = Split(text);
    }

    public string Path { get; }
    public string Text { get; }
    public IReadOnlyList<TextLine> Lines => lines;
    public int LineCount => lines.Length;

    public TextLine this[int index] => lines[index];

    public ReadOnlySpan<char> Span(TextLine line) => Text.AsSpan(line.Start, line.Length);

    public string Str(TextLine line) => Text.Substring(line.Start, line.Length);

    public SourceLine At(int lineNumber) => new(Path, lineNumber);

    /// <summary>The line (1-based) holding char <paramref name="offset"/>.</summary>
    public int LineOf(int offset)
    {
        int lo = 0, hi = lines.Length - 1;
        while (lo < hi)
        {
            int mid = (lo + hi + 1) / 2;
            if (lines[mid].Start <= offset) lo = mid; else hi = mid - 1;
        }
        return lines.Length == 0 ? 1 : lines[lo].Number;
    }

    public static bool IsBlank(ReadOnlySpan<char> s) => s.IsWhiteSpace();

    private static TextLine[] Split(string text)
    {
        var result = new List<TextLine>();
        int start = 0, number = 1;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (c != '\n' && c != '\r') continue;
            result.Add(new TextLine(number++, start, i));
            if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n') i++;
            start = i + 1;
        }
        if (start < text.Length) result.Add(new TextLine(number, start, text.Length));
        return result.ToArray();
    }
}
