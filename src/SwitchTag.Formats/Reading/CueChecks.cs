using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats.Text;

namespace SwitchTag.Formats.Reading;

/// <summary>Time rules every reader shares (FORMATS.md, "Time rules").</summary>
internal static class CueChecks
{
    /// <summary>A cue's range; an end before the start is kept as a zero-length cue at the start, with a warning.</summary>
    public static TimeRange Range(Timecode start, Timecode end, int line, Diagnostics diagnostics)
    {
        if (end >= start) return new TimeRange(start, end);
        diagnostics.Warn(line, $"cue ends ({end}) before it starts ({start}); end set to the start");
        return new TimeRange(start, start);
    }

    /// <summary>Brings each cue's text to NFC (offsets in it moved along), drops cues with no text
    /// (warning: there is nothing to lose but the time), then warns on cues that start before the one
    /// above (file order is kept) and, where the format has no reason to overlap, on cues that start
    /// before the one above has ended.</summary>
    public static ImmutableArray<Cue> Finish(IEnumerable<Cue> cues, bool overlapAllowed, Diagnostics diagnostics)
    {
        var kept = ImmutableArray.CreateBuilder<Cue>();
        foreach (var read in cues)
        {
            var cue = Nfc(read);
            if (string.IsNullOrWhiteSpace(cue.Text))
            {
                diagnostics.Warn(cue.At.Line, $"cue {cue.Time} has no text; skipped");
                continue;
            }
            if (kept.Count > 0)
            {
                var previous = kept[^1];
                if (cue.Time.Start < previous.Time.Start)
                    diagnostics.Warn(cue.At.Line, $"cue starts at {cue.Time.Start}, before the cue above (line {previous.At.Line}, {previous.Time.Start}); kept in file order");
                else if (!overlapAllowed && cue.Time.Start < previous.Time.End)
                    diagnostics.Warn(cue.At.Line, $"cue starts at {cue.Time.Start}, before the cue above (line {previous.At.Line}) ends at {previous.Time.End}; both kept");
            }
            kept.Add(cue);
        }
        return kept.ToImmutable();
    }

    /// <summary>The cue with its text in NFC (FORMATS.md, "Unicode normalisation"): the original form
    /// stays in the file's text at RawStart..RawEnd.</summary>
    private static Cue Nfc(Cue cue)
    {
        string text = NfcText.Normalize(cue.Text, out var map);
        if (map is null) return cue;
        return cue with
        {
            Text = text,
            WordTimes = cue.WordTimes.IsDefault ? cue.WordTimes : [.. cue.WordTimes.Select(w => w with { CharOffset = map[Math.Clamp(w.CharOffset, 0, map.Length - 1)] })],
        };
    }
}
