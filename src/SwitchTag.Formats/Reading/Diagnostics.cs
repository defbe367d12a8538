using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Formats.Reading;

/// <summary>Collects the diagnostics of one read, each tied to a line of the file.</summary>
public sealed class Diagnostics(string path)
{
    /// <summary>Quoted input is cut here so one enormous line cannot swamp a report; the file:line
    /// still leads to the whole text.</summary>
    public const int QuoteLimit = 2000;

    private readonly List<Diagnostic> items = [];

    public string Path { get; } = path;

    public void Warn(int line, string message) => items.Add(new Diagnostic(new SourceLine(Path, line), Severity.Warning, message));

    public void Error(int line, string message) => items.Add(new Diagnostic(new SourceLine(Path, line), Severity.Error, message));

    public ImmutableArray<Diagnostic> ToImmutable() => [.. items];

    /// <summary>Input text for a message, in quotes, whitespace runs shown as one space.</summary>
    public static string Quote(ReadOnlySpan<char> text)
    {
        var trimmed = text.Trim();
        int keep = Math.Min(trimmed.Length, QuoteLimit);
        if (keep < trimmed.Length && char.IsHighSurrogate(trimmed[keep - 1])) keep--;
        var sb = new System.Text.StringBuilder(keep + 40).Append('"');
        bool space = false;
        foreach (char c in trimmed[..keep])
        {
            if (char.IsWhiteSpace(c)) { space = true; continue; }
            if (space) sb.Append(' ');
            space = false;
            sb.Append(c);
        }
        sb.Append('"');
        if (trimmed.Length > keep) sb.Append(" (").Append(trimmed.Length - keep).Append(" more characters)");
        return sb.ToString();
    }
}
