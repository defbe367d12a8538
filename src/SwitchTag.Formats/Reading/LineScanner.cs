namespace SwitchTag.Formats.Reading;

/// <summary>Line splitting (CRLF, CR, LF) over a span, without allocating.</summary>
internal ref struct LineScanner(ReadOnlySpan<char> text)
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

/// <summary>How far content detection looks: enough for any real header, bounded so a huge file
/// costs little.</summary>
internal static class DetectionWindow
{
    public const int Lines = 400;

    /// <summary>The text without a leading byte order mark.</summary>
    public static ReadOnlySpan<char> Body(string? text)
    {
        var s = (text ?? "").AsSpan();
        return s.Length > 0 && s[0] == '\uFEFF' ? s[1..] : s;
    }
}
