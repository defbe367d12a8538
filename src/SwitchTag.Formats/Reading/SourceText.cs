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

    /// <summary>Counted first, then filled: a growing list and its copy took three times the lines'
    /// size for a file of 800k lines.</summary>
    private static TextLine[] Split(string text)
    {
        var result = new TextLine[Ends(text, null)];
        Ends(text, result);
        return result;
    }

    /// <summary>The number of lines; with <paramref name="into"/>, each line written there too.</summary>
    private static int Ends(string text, TextLine[]? into)
    {
        int start = 0, count = 0;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (c != '\n' && c != '\r') continue;
            if (into is not null) into[count] = new TextLine(count + 1, start, i);
            count++;
            if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n') i++;
            start = i + 1;
        }
        if (start < text.Length)
        {
            if (into is not null) into[count] = new TextLine(count + 1, start, text.Length);
            count++;
        }
        return count;
    }
}
