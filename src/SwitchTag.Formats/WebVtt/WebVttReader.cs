using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats.Reading;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats.WebVtt;

/// <summary>Reads WebVTT as the W3C WebVTT spec's parsing algorithm does: the WEBVTT signature line,
/// header lines up to the first empty line, then blocks each ended by an empty line ("collect a WebVTT
/// block": only a line that is the empty string breaks out of its loop, so a line of spaces or tabs is
/// cue text). A block whose first
/// or second line holds "-->" is a cue (the line before the timing line is its identifier); NOTE,
/// STYLE and REGION blocks are skipped; any other block is reported, its text quoted.</summary>
public sealed class WebVttReader : ITranscriptReader
{
    public TranscriptFormat Format => TranscriptFormat.WebVtt;
    public IReadOnlyList<string> Aliases { get; } = ["vtt"];
    public IReadOnlyList<string> Extensions { get; } = [".vtt"];
    public bool ClaimsExtensions => true;
    public string? MissingSignature => "no WEBVTT header line";

    /// <summary>The first non-blank line is the WEBVTT signature.</summary>
    public bool Detects(string text, string extension)
    {
        var lines = new LineScanner(DetectionWindow.Body(text));
        while (lines.Next(out var line))
        {
            if (line.IsWhiteSpace()) continue;
            return line.StartsWith("WEBVTT", StringComparison.Ordinal) && (line.Length == 6 || line[6] is ' ' or '\t');
        }
        return false;
    }

    public ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        int signature = 0;
        while (signature < src.LineCount && SourceText.IsBlank(src.Span(src[signature]))) signature++;
        if (signature >= src.LineCount || !IsSignature(src.Span(src[signature])))
        {
            diagnostics.Error(1, "not WebVTT: the first line must be \"WEBVTT\" (optionally followed by a space or tab and header text)");
            return null;
        }
        if (signature > 0)
            diagnostics.Warn(1, "blank lines before the WEBVTT signature (WebVTT wants it on the first line); read anyway");
        var cues = new List<Cue>();
        int i = signature + 1;
        while (i < src.LineCount && !src.Span(src[i]).IsEmpty && !src.Span(src[i]).Contains("-->", StringComparison.Ordinal))
            i++;

        while (i < src.LineCount)
        {
            // Between blocks a line of only spaces or tabs is skipped like an empty one (the spec would
            // make it the next cue's identifier); inside a block only an empty line ends it.
            while (i < src.LineCount && SourceText.IsBlank(src.Span(src[i]))) i++;
            if (i >= src.LineCount) break;
            int blockStart = i, timing = -1;
            while (i < src.LineCount && !src.Span(src[i]).IsEmpty)
            {
                if (src.Span(src[i]).Contains("-->", StringComparison.Ordinal))
                {
                    if (timing < 0 && i - blockStart <= 1) timing = i;
                    else break;
                }
                i++;
            }
            if (timing >= 0)
                ReadCue(src, blockStart, timing, i, cues, diagnostics);
            else
                OtherBlock(src, blockStart, i, cues.Count > 0, diagnostics);
        }
        return CueChecks.Finish(Speakers(cues), overlapAllowed: true, diagnostics);
    }

    private static bool IsSignature(ReadOnlySpan<char> line) =>
        line.StartsWith("WEBVTT", StringComparison.Ordinal) && (line.Length == 6 || line[6] is ' ' or '\t');

    private static void ReadCue(SourceText src, int blockStart, int timing, int blockEnd, List<Cue> cues, Diagnostics diagnostics)
    {
        var timingLine = src[timing];
        if (!TryTiming(src.Span(timingLine), out var start, out var end, out var settings))
        {
            diagnostics.Warn(timingLine.Number, $"malformed cue timing {Diagnostics.Quote(src.Span(timingLine))} (WebVTT wants HH:MM:SS.mmm --> HH:MM:SS.mmm); cue not read: {BlockText(src, timing + 1, blockEnd)}");
            return;
        }
        var range = CueChecks.Range(start, end, timingLine.Number, diagnostics);
        string raw = string.Join('\n', Enumerable.Range(timing + 1, blockEnd - timing - 1).Select(k => src.Str(src[k])));
        int firstText = timing + 1 < blockEnd ? src[timing + 1].Number : timingLine.Number;
        var text = CueTextParser.Parse(raw, range, firstText, diagnostics);
        string? identifier = timing > blockStart ? src.Str(src[blockStart]) : null;
        int rawEnd = src[blockEnd - 1].End;
        cues.Add(new Cue(range, text.Voice, text.Voice, text.Plain, text.WordTimes,
            src.At(src[blockStart].Number), new CharSpan(src[blockStart].Start, rawEnd), Identifier: identifier, Settings: settings));
    }

    /// <summary>"start --> end [settings]"; the settings are kept as written (not interpreted).</summary>
    private static bool TryTiming(ReadOnlySpan<char> line, out Timecode start, out Timecode end, out string? settings)
    {
        start = end = default;
        settings = null;
        int p = SkipSpace(line, 0);
        if (!Timestamps.TryWebVtt(line, ref p, out start)) return false;
        p = SkipSpace(line, p);
        if (!line[p..].StartsWith("-->")) return false;
        p = SkipSpace(line, p + 3);
        if (!Timestamps.TryWebVtt(line, ref p, out end)) return false;
        // The spec parses whatever follows the end time as settings, space before it or not
        // ("00:01.000line:40%"); a fourth fraction digit already failed the timestamp.
        var rest = line[p..].Trim();
        settings = rest.IsEmpty ? null : rest.ToString();
        return true;
    }

    /// <summary>The spec's "skip whitespace": space, tab and form feed (line breaks cannot occur here).</summary>
    private static int SkipSpace(ReadOnlySpan<char> s, int p)
    {
        while (p < s.Length && (s[p] is ' ' or '\t' or '\f')) p++;
        return p;
    }

    private static void OtherBlock(SourceText src, int start, int end, bool afterCues, Diagnostics diagnostics)
    {
        var first = src.Span(src[start]);
        if (IsKeyword(first, "NOTE")) return;
        if (IsKeyword(first, "STYLE") || IsKeyword(first, "REGION"))
        {
            if (afterCues)
                diagnostics.Warn(src[start].Number, $"{first.Trim().ToString()} block after the first cue (WebVTT allows it only before); ignored");
            return;
        }
        diagnostics.Warn(src[start].Number, $"text outside any cue (no timing line); not read: {BlockText(src, start, end)}");
    }

    private static bool IsKeyword(ReadOnlySpan<char> line, string keyword) =>
        line.StartsWith(keyword, StringComparison.Ordinal) && (line.Length == keyword.Length || line[keyword.Length] is ' ' or '\t');

    private static string BlockText(SourceText src, int start, int end) =>
        Diagnostics.Quote(start >= end ? "" : src.Text.AsSpan(src[start].Start, src[end - 1].End - src[start].Start));

    /// <summary>Speakers (FORMATS.md, "Speakers"): a file that uses voice spans names the speaker of
    /// every cue that has one and of no other (the spec ties a voice to its cue). A file with no voice
    /// span at all is read like SubRip: a "NAME:" prefix the file uses as a label (SpeakerVotes) names the
    /// speaker, and a cue without one continues the speaker before it.</summary>
    private static IEnumerable<Cue> Speakers(List<Cue> cues)
    {
        bool voices = cues.Exists(c => c.SpeakerLabel is not null);
        var votes = voices ? null : new SpeakerVotes(cues.Select(c => c.Text));
        string? label = null;
        foreach (var cue in cues)
        {
            if (voices)
            {
                yield return cue with { Speaker = SpeakerLabels.Normalise(cue.SpeakerLabel) };
                continue;
            }
            var (prefixed, text, shift) = CutPrefix(votes!, cue.Text);
            if (prefixed is not null) label = prefixed;
            yield return cue with
            {
                Speaker = SpeakerLabels.Normalise(label),
                SpeakerLabel = label,
                Text = text,
                WordTimes = [.. cue.WordTimes.Select(w => w with { CharOffset = Math.Max(0, w.CharOffset - shift) })],
            };
        }
    }

    private static (string? Label, string Text, int Shift) CutPrefix(SpeakerVotes votes, string text)
    {
        if (!votes.TryMatch(text, out int labelStart, out int labelEnd, out int textStart)) return (null, text, 0);
        return (SharedStrings.Of(text.AsSpan(labelStart, labelEnd - labelStart)), text[textStart..], textStart);
    }
}
