using SwitchTag.Formats.Reading;

namespace SwitchTag.Formats.Timestamped;

/// <summary>What the first lines of a typed transcript show: lines opening with a timestamp
/// (<see cref="EntryStamp"/>), and whether Markdown marks them (an ATX heading, or a timestamp behind
/// a list marker or emphasis). Shared by the plain-text and Markdown readers' detection.</summary>
internal static class EntryScan
{
    public readonly record struct Result(bool Entries, bool Markdown);

    public static Result Of(string text)
    {
        var lines = new LineScanner(DetectionWindow.Body(text));
        bool entries = false, markdown = false;
        for (int n = 0; n < DetectionWindow.Lines && lines.Next(out var line); n++)
        {
            var body = line.TrimStart();
            if (IsAtxHeading(body)) { markdown = true; continue; }
            var unwrapped = Unwrap(body, out bool marked);
            if (EntryStamp.TryMatch(body, out _)) entries = true;
            else if (marked && EntryStamp.TryMatch(unwrapped, out _)) entries = markdown = true;
        }
        return new Result(entries, markdown);
    }

    /// <summary>Entries that read as Markdown: marked so, or in a file named .md or .markdown.</summary>
    public static bool IsMarkdown(Result scan, string extension) =>
        scan.Markdown || extension.TrimStart('.').ToLowerInvariant() is "md" or "markdown";

    private static bool IsAtxHeading(ReadOnlySpan<char> body)
    {
        int h = 0;
        while (h < body.Length && body[h] == '#') h++;
        return h is >= 1 and <= 6 && h < body.Length && body[h] == ' ';
    }

    /// <summary>The line without a list marker (<c>- * +</c> or <c>1.</c>) and emphasis or code marks
    /// in its head; <paramref name="marked"/> says whether there was any such Markdown. Only a timestamp
    /// behind such marks counts as a Markdown signal: a line "1987. We left" in a typed transcript is
    /// not a numbered list.</summary>
    private static string Unwrap(ReadOnlySpan<char> body, out bool marked)
    {
        marked = false;
        if (body.Length > 1 && body[0] is '-' or '*' or '+' && body[1] == ' ') { body = body[2..].TrimStart(); marked = true; }
        else
        {
            int d = 0;
            while (d < body.Length && d < 9 && char.IsAsciiDigit(body[d])) d++;
            if (d > 0 && d + 1 < body.Length && body[d] is '.' or ')' && body[d + 1] == ' ') { body = body[(d + 2)..].TrimStart(); marked = true; }
        }
        var head = body[..Math.Min(body.Length, 120)];
        var sb = new System.Text.StringBuilder(head.Length);
        foreach (char c in head)
        {
            if (c is '*' or '_' or '`') marked = true;
            else sb.Append(c);
        }
        return sb.ToString();
    }
}
