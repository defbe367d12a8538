using System.Collections.Immutable;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats.Reading;

/// <summary>Collects the diagnostics of one read, each tied to a line of the file. Messages pass
/// through <see cref="DisplayText.Neutralise"/> (they quote input and end up on a terminal), and
/// warnings are capped so one broken file cannot bury the rest of a run's report: at most
/// <see cref="SameKindLimit"/> of one kind (the message with its quotes and numbers left out) and
/// <see cref="WarningLimit"/> in all, then one warning counting what was left out. Warnings that quote
/// text not read into any cue are held only by the total cap.</summary>
public sealed class Diagnostics(string path)
{
    /// <summary>Quoted input is cut here so one enormous line cannot swamp a report; the file:line
    /// still leads to the whole text.</summary>
    public const int QuoteLimit = 2000;

    public const int SameKindLimit = 20;
    public const int WarningLimit = 500;

    private readonly List<Diagnostic> items = [];
    private readonly Dictionary<string, int> kinds = new(StringComparer.Ordinal);
    private readonly Dictionary<string, (int Line, int Count)> withheld = new(StringComparer.Ordinal);
    private int warnings;

    public string Path { get; } = path;

    public void Warn(int line, string message)
    {
        string kind = Kind(message);
        int seen = kinds.GetValueOrDefault(kind);
        kinds[kind] = seen + 1;
        // Text a reader could not place is quoted in its warning and nowhere else: only the total cap applies.
        bool capped = seen >= SameKindLimit && !message.Contains("not read", StringComparison.Ordinal);
        if (capped || warnings >= WarningLimit)
        {
            string key = capped ? kind : "";
            var (first, count) = withheld.GetValueOrDefault(key, (line, 0));
            withheld[key] = (first, count + 1);
            return;
        }
        warnings++;
        items.Add(new Diagnostic(new SourceLine(Path, line), Severity.Warning, DisplayText.Neutralise(message)));
    }

    public void Error(int line, string message) => items.Add(new Diagnostic(new SourceLine(Path, line), Severity.Error, DisplayText.Neutralise(message)));

    public ImmutableArray<Diagnostic> ToImmutable()
    {
        var all = ImmutableArray.CreateBuilder<Diagnostic>(items.Count + withheld.Count);
        all.AddRange(items);
        foreach (var (kind, (line, count)) in withheld.OrderBy(w => w.Value.Line))
            all.Add(new Diagnostic(new SourceLine(Path, line), Severity.Warning, kind.Length == 0
                ? $"{count} more warnings not shown (at most {WarningLimit} per file), the first at this line"
                : $"{count} more warnings like \"{DisplayText.Neutralise(kind)}\" not shown (at most {SameKindLimit} of a kind per file), the first at this line"));
        return all.ToImmutable();
    }

    /// <summary>A message's kind: its text without quoted input and with each number as '#'.</summary>
    private static string Kind(string message)
    {
        var sb = new StringBuilder(Math.Min(message.Length, 200));
        bool quoted = false, number = false;
        foreach (char c in message)
        {
            if (c == '"') { quoted = !quoted; if (!quoted) sb.Append("\"…\""); continue; }
            if (quoted) continue;
            if (char.IsAsciiDigit(c)) { if (!number) sb.Append('#'); number = true; continue; }
            number = false;
            sb.Append(c);
        }
        return sb.ToString();
    }

    /// <summary>Input text for a message, in quotes, whitespace runs shown as one space.</summary>
    public static string Quote(ReadOnlySpan<char> text)
    {
        var trimmed = text.Trim();
        int keep = Math.Min(trimmed.Length, QuoteLimit);
        if (keep < trimmed.Length && char.IsHighSurrogate(trimmed[keep - 1])) keep--;
        var sb = new StringBuilder(keep + 40).Append('"');
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
