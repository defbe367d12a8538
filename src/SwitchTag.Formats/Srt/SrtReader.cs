using System.Collections.Immutable;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats.Reading;
using SwitchTag.Formats.Text;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats.Srt;

/// <summary>Reads SubRip: blocks of a counter line, a <c>HH:MM:SS,mmm --> HH:MM:SS,mmm</c> timing line and
/// text lines, separated by blank lines. A missing counter is accepted; a counter followed by a timing
/// line starts a new cue even without the blank line before it. Formatting tags are stripped.</summary>
public sealed class SrtReader : ITranscriptReader
{
    public TranscriptFormat Format => TranscriptFormat.Srt;
    public IReadOnlyList<string> Aliases { get; } = [];
    public IReadOnlyList<string> Extensions { get; } = [".srt"];
    public bool ClaimsExtensions => true;
    public string? MissingSignature => null;

    /// <summary>A SubRip (or WebVTT) timing line among the first lines.</summary>
    public bool Detects(string text, string extension)
    {
        var lines = new LineScanner(DetectionWindow.Body(text));
        for (int n = 0; n < DetectionWindow.Lines && lines.Next(out var line); n++)
            if (line.Contains("-->", StringComparison.Ordinal) && IsTimingLine(line)) return true;
        return false;
    }

    private static bool IsTimingLine(ReadOnlySpan<char> line)
    {
        int p = 0;
        while (p < line.Length && char.IsWhiteSpace(line[p])) p++;
        int q = p;
        return Timestamps.TrySrt(line, ref p, out _) || Timestamps.TryWebVtt(line, ref q, out _);
    }

    public ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        var cues = new List<Cue>();
        int i = 0, n = src.LineCount;
        while (i < n)
        {
            while (i < n && SourceText.IsBlank(src.Span(src[i]))) i++;
            if (i >= n) break;
            int blockStart = i;
            int timing = IsCounter(src, i) && i + 1 < n && HasArrow(src, i + 1) ? i + 1 : HasArrow(src, i) ? i : -1;
            i = timing < 0 ? i + 1 : timing + 1;
            while (i < n && !SourceText.IsBlank(src.Span(src[i])) && !StartsCue(src, i)) i++;
            if (timing < 0)
            {
                diagnostics.Warn(src[blockStart].Number, $"text outside any cue (no timing line); not read: {Quote(src, blockStart, i)}");
                continue;
            }
            var line = src[timing];
            if (!TryTiming(src.Span(line), out var start, out var end, out var settings, out bool glued))
            {
                diagnostics.Warn(line.Number, $"malformed cue timing {Diagnostics.Quote(src.Span(line))} (SubRip wants HH:MM:SS,mmm --> HH:MM:SS,mmm); cue not read: {Quote(src, timing + 1, i)}");
                continue;
            }
            if (glued)
                diagnostics.Warn(line.Number, $"text right after the end time ({Diagnostics.Quote(settings)}); kept as the cue's settings");
            var range = CueChecks.Range(start, end, line.Number, diagnostics);
            var text = new StringBuilder();
            for (int k = timing + 1; k < i; k++)
            {
                if (k > timing + 1) text.Append('\n');
                text.Append(Markup.StripSrtTags(src.Span(src[k])));
            }
            cues.Add(new Cue(range, null, null, text.ToString(), [],
                src.At(src[blockStart].Number), new CharSpan(src[blockStart].Start, src[i - 1].End),
                Identifier: timing > blockStart ? src.Str(src[blockStart]).Trim() : null, Settings: settings));
        }
        return CueChecks.Finish(Speakers(cues), overlapAllowed: false, diagnostics);
    }

    /// <summary>A <c>NAME:</c> prefix the file uses as a speaker label (<see cref="SpeakerVotes"/>) names
    /// the speaker; a cue without one continues the speaker before it.</summary>
    private static IEnumerable<Cue> Speakers(List<Cue> cues)
    {
        var votes = new SpeakerVotes(cues.Select(c => c.Text));
        string? label = null;
        foreach (var cue in cues)
        {
            string plain = cue.Text;
            if (votes.TryMatch(plain, out int ls, out int le, out int ts))
            {
                label = SharedStrings.Of(plain.AsSpan(ls, le - ls));
                plain = plain[ts..];
            }
            yield return cue with { Speaker = SpeakerLabels.Normalise(label), SpeakerLabel = label, Text = plain };
        }
    }

    private static bool IsCounter(SourceText src, int i)
    {
        var s = src.Span(src[i]).Trim();
        if (s.IsEmpty || s.Length > 9) return false;
        foreach (char c in s) if (!char.IsAsciiDigit(c)) return false;
        return true;
    }

    private static bool HasArrow(SourceText src, int i) => src.Span(src[i]).Contains("-->", StringComparison.Ordinal);

    private static bool StartsCue(SourceText src, int i) =>
        (IsCounter(src, i) && i + 1 < src.LineCount && HasArrow(src, i + 1) && TryTiming(src.Span(src[i + 1]), out _, out _, out _, out _))
        || (HasArrow(src, i) && TryTiming(src.Span(src[i]), out _, out _, out _, out _));

    /// <summary>"start --> end [X1:.. Y2:..]"; anything after the end time is kept as the cue's settings,
    /// also when no space comes before it (<paramref name="glued"/>: "00:01:20,000?" should not cost the
    /// cue its text).</summary>
    private static bool TryTiming(ReadOnlySpan<char> line, out Timecode start, out Timecode end, out string? settings, out bool glued)
    {
        start = end = default;
        settings = null;
        glued = false;
        int p = Skip(line, 0);
        if (!Stamp(line, ref p, out start)) return false;
        p = Skip(line, p);
        if (!line[p..].StartsWith("-->")) return false;
        p = Skip(line, p + 3);
        if (!Stamp(line, ref p, out end)) return false;
        glued = p < line.Length && !char.IsWhiteSpace(line[p]);
        var rest = line[p..].Trim();
        settings = rest.IsEmpty ? null : rest.ToString();
        return true;
    }

    /// <summary>A SubRip timestamp, or a WebVTT one (a WebVTT file that lost its header reads here).</summary>
    private static bool Stamp(ReadOnlySpan<char> line, ref int p, out Timecode time) =>
        Timestamps.TrySrt(line, ref p, out time) || Timestamps.TryWebVtt(line, ref p, out time);

    private static int Skip(ReadOnlySpan<char> s, int p)
    {
        while (p < s.Length && (s[p] == ' ' || s[p] == '\t')) p++;
        return p;
    }

    private static string Quote(SourceText src, int start, int end) =>
        Diagnostics.Quote(start >= end ? "" : src.Text.AsSpan(src[start].Start, src[end - 1].End - src[start].Start));
}
