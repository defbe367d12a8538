using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;
using SwitchTag.Formats.Timestamped;

namespace SwitchTag.Formats;

/// <summary>Decides a transcript's format from its content (FORMATS.md, "Detection"); the file
/// extension only breaks a tie between timestamped text and Markdown.</summary>
public static class FormatDetector
{
    /// <summary>Lines looked at: enough for any real header, bounded so a huge file costs little.</summary>
    private const int ScanLines = 400;

    public static TranscriptFormat? Detect(string text, string? extensionHint)
    {
        var s = (text ?? "").AsSpan();
        if (s.Length > 0 && s[0] == '\uFEFF') s = s[1..];
        var lines = new LineScanner(s);
        ReadOnlySpan<char> first = default;
        while (lines.Next(out var line))
        {
            if (line.IsWhiteSpace()) continue;
            first = line;
            break;
        }
        if (first.IsEmpty) return null;
        if (first.StartsWith("WEBVTT", StringComparison.Ordinal) && (first.Length == 6 || first[6] is ' ' or '\t'))
            return TranscriptFormat.WebVtt;

        lines = new LineScanner(s);
        bool timing = false, entries = false, markdown = false;
        for (int n = 0; n < ScanLines && lines.Next(out var line); n++)
        {
            if (!timing && line.Contains("-->", StringComparison.Ordinal) && IsTimingLine(line)) timing = true;
            var body = line.TrimStart();
            if (IsAtxHeading(body)) { markdown = true; continue; }
            var unwrapped = Unwrap(body, out bool marked);
            if (EntryStamp.TryMatch(body, out _)) entries = true;
            else if (marked && EntryStamp.TryMatch(unwrapped, out _)) entries = markdown = true;
        }
        if (timing) return TranscriptFormat.Srt;
        if (!entries) return null;
        string hint = (extensionHint ?? "").TrimStart('.').ToLowerInvariant();
        return markdown || hint is "md" or "markdown" ? TranscriptFormat.Markdown : TranscriptFormat.Text;
    }

    private static bool IsTimingLine(ReadOnlySpan<char> line)
    {
        int p = 0;
        while (p < line.Length && char.IsWhiteSpace(line[p])) p++;
        int q = p;
        return Timestamps.TrySrt(line, ref p, out _) || Timestamps.TryWebVtt(line, ref q, out _);
    }

    private static bool IsAtxHeading(ReadOnlySpan<char> body)
    {
        int h = 0;
        while (h < body.Length && body[h] == '#') h++;
        return h is >= 1 and <= 6 && h < body.Length && body[h] == ' ';
    }

    /// <summary>The line without a list marker (<c>- * +</c> or <c>1.</c>) and emphasis, code or
    /// backslash-escape marks in its head; <paramref name="marked"/> says whether there was any such Markdown. Only a timestamp
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
        for (int i = 0; i < head.Length; i++)
        {
            char c = head[i];
            if (c is '*' or '_' or '`') marked = true;
            // A backslash before ASCII punctuation is a CommonMark escape ("\[00:00:00\]", as Markdown
            // editors save a bracketed stamp); only Markdown writes it.
            else if (c == '\\' && i + 1 < head.Length && head[i + 1] is >= '!' and <= '/' or >= ':' and <= '@' or >= '[' and <= '`' or >= '{' and <= '~') marked = true;
            else sb.Append(c);
        }
        return sb.ToString();
    }

    /// <summary>Line splitting (CRLF, CR, LF) over a span, without allocating.</summary>
    private ref struct LineScanner(ReadOnlySpan<char> text)
    {
        private ReadOnlySpan<char> rest = text;
        private bool done = text.IsEmpty;

        public bool Next(out ReadOnlySpan<char> line)
        {
            if (done) { line = default; return false; }
            int end = rest.IndexOfAny('\r', '\n');
            if (end < 0) { line = rest; done = true; return true; }
            line = rest[..end];
            int skip = rest[end] == '\r' && end + 1 < rest.Length && rest[end + 1] == '\n' ? 2 : 1;
            rest = rest[(end + skip)..];
            done = rest.IsEmpty;
            return true;
        }
    }
}
