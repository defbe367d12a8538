using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;

namespace SwitchTag.Formats.Timestamped;

/// <summary>Reads a typed transcript: every line goes through the <see cref="EntryCollector"/>.</summary>
internal static class TimestampedTextReader
{
    public static ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        var collector = new EntryCollector(src, diagnostics);
        foreach (var line in src.Lines) collector.Add(line.Number, src.Span(line));
        return CueChecks.Finish(collector.Build(), overlapAllowed: false, diagnostics);
    }
}
