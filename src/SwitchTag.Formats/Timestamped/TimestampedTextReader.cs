using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;

namespace SwitchTag.Formats.Timestamped;

/// <summary>Reads a typed transcript: every line goes through the <see cref="EntryCollector"/>.</summary>
public sealed class TimestampedTextReader : ITranscriptReader
{
    public TranscriptFormat Format => TranscriptFormat.Text;
    public IReadOnlyList<string> Aliases { get; } = ["txt"];
    public IReadOnlyList<string> Extensions { get; } = [".txt"];
    public bool ClaimsExtensions => false;
    public string? MissingSignature => null;

    /// <summary>Lines opening with a timestamp, and nothing that makes them Markdown.</summary>
    public bool Detects(string text, string extension)
    {
        var scan = EntryScan.Of(text);
        return scan.Entries && !EntryScan.IsMarkdown(scan, extension);
    }

    public ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        var collector = new EntryCollector(src, diagnostics);
        foreach (var line in src.Lines) collector.Add(line.Number, src.Span(line));
        return CueChecks.Finish(collector.Build(), overlapAllowed: false, diagnostics);
    }
}
