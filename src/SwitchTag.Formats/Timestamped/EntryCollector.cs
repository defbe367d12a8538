using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats.Reading;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats.Timestamped;

/// <summary>Turns the lines of a typed transcript (plain text, or the plain text of Markdown lines) into
/// cues. A line opening with a timestamp starts an entry; lines without one continue the entry above;
/// an entry ends where the next begins. A line holding only a timestamp, with no text after it before
/// the next entry, is a closing stamp: it ends the entry above and makes no cue. The last entry with
/// no closing stamp gets a speaking-rate estimate. Text before the first entry (or between a heading
/// and the first entry under it), and an entry whose stamp is no valid time, are in no cue and are
/// reported. A stamp that repeats an earlier entry's start followed by a continuation mark resumes
/// that entry's speaker after an interruption.</summary>
internal sealed class EntryCollector(SourceText src, Diagnostics diagnostics)
{
    /// <summary>How many entries back a resumed stamp is looked for: an interruption is a few lines.</summary>
    private const int ResumeWindow = 16;

    private sealed record EntryLine(int Line, string Text);

    private sealed class Entry(Timecode start, Timecode? end, int line, Entry? resumes)
    {
        public Timecode Start { get; } = start;
        public Timecode? End { get; } = end;
        public int Line { get; } = line;
        public Entry? Resumes { get; } = resumes;
        public List<EntryLine> Lines { get; } = [];
        /// <summary>The speaker in force at the entry's end, once built.</summary>
        public string? EndLabel { get; set; }
    }

    private readonly List<Entry> entries = [];
    private readonly List<EntryLine> unplaced = [];
    private Entry? open;
    private string? section;
    private (int Line, string Stamp)? invalid;

    /// <summary>A heading: later entries sit under it, and it closes the entry above to continuation.</summary>
    public void Heading(string? text)
    {
        FlushUnplaced();
        section = text;
        open = null;
    }

    /// <summary>One line of text at file line <paramref name="line"/>.</summary>
    public void Add(int line, ReadOnlySpan<char> text)
    {
        if (EntryStamp.TryMatch(text, out var stamp))
        {
            FlushUnplaced();
            var rest = text[stamp.TextStart..].Trim();
            if (!stamp.Valid)
            {
                open = null;
                invalid = (line, text[..stamp.TextStart].Trim().ToString());
                if (!rest.IsEmpty) unplaced.Add(new EntryLine(line, rest.ToString()));
                return;
            }
            if (stamp.Resumes && stamp.End is null && open is not null && open.Start == stamp.Start)
            {
                // The same stamp again, as on each page of a typed transcript: the entry goes on.
                open.Lines.Add(new EntryLine(line, rest.ToString()));
                return;
            }
            var resumes = stamp.Resumes ? entries.TakeLast(ResumeWindow).LastOrDefault(e => e.Start == stamp.Start && e.Lines.Count > 0) : null;
            open = new Entry(stamp.Start, stamp.End, line, resumes);
            entries.Add(open);
            if (!rest.IsEmpty) open.Lines.Add(new EntryLine(line, rest.ToString()));
            return;
        }
        var trimmed = text.Trim();
        if (trimmed.IsEmpty) return;
        if (open is null) unplaced.Add(new EntryLine(line, trimmed.ToString()));
        else open.Lines.Add(new EntryLine(line, trimmed.ToString()));
    }

    public List<Cue> Build()
    {
        FlushUnplaced();
        var votes = SpeakerVotes.Trusting;
        var cues = new List<Cue>();
        string? label = null;
        for (int k = 0; k < entries.Count; k++)
        {
            var entry = entries[k];
            if (entry.Lines.Count == 0) continue;
            var next = k + 1 < entries.Count ? entries[k + 1] : null;
            int chars = entry.Lines.Sum(l => SpokenLength(votes, l));
            // A resumed utterance is spoken after the interruption above it, whatever its stamp says.
            var start = entry.Resumes is not null && cues.Count > 0 ? Timecode.Max(entry.Start, cues[^1].Time.End) : entry.Start;
            if (entry.Resumes is not null) label = entry.Resumes.EndLabel;
            Timecode end = entry.End
                ?? (next is not null && next.Start >= start ? next.Start : SpeakingRate.EstimateEnd(start, chars));
            var range = CueChecks.Range(start, end, entry.Line, diagnostics);
            label = entry.EndLabel = Segment(votes, entry, range, label, cues);
        }
        return cues;
    }

    /// <summary>Splits an entry where a line starts with a new <c>NAME:</c> (an untimed speaker change);
    /// the parts share the entry's time in proportion to their characters. Returns the speaker in force
    /// at the end, which an unlabelled entry after it continues.</summary>
    private string? Segment(SpeakerVotes votes, Entry entry, TimeRange range, string? label, List<Cue> cues)
    {
        var parts = new List<(string? Label, List<EntryLine> Lines)>();
        foreach (var line in entry.Lines)
        {
            if (votes.TryMatch(line.Text, out int ls, out int le, out int ts))
            {
                label = line.Text[ls..le];
                parts.Add((label, [line with { Text = line.Text[ts..] }]));
            }
            else if (parts.Count == 0) parts.Add((label, [line]));
            else parts[^1].Lines.Add(line);
        }
        int total = Math.Max(1, parts.Sum(p => p.Lines.Sum(l => l.Text.Length)));
        int done = 0;
        for (int p = 0; p < parts.Count; p++)
        {
            var (partLabel, lines) = parts[p];
            int length = lines.Sum(l => l.Text.Length);
            var time = parts.Count == 1 ? range : new TimeRange(range.At(done / (double)total), range.At((done + length) / (double)total));
            done += length;
            var text = new StringBuilder();
            foreach (var l in lines)
            {
                if (l.Text.Length == 0) continue;
                if (text.Length > 0) text.Append('\n');
                text.Append(l.Text);
            }
            int firstLine = p == 0 ? entry.Line : lines[0].Line;
            cues.Add(new Cue(time, SpeakerLabels.Normalise(partLabel), partLabel is null ? null : SharedStrings.Of(partLabel), text.ToString(), [],
                src.At(firstLine), new CharSpan(src[firstLine - 1].Start, src[lines[^1].Line - 1].End)));
        }
        return label;
    }

    /// <summary>A line's length without its speaker prefix: the label is not spoken.</summary>
    private static int SpokenLength(SpeakerVotes votes, EntryLine line) =>
        votes.TryMatch(line.Text, out _, out _, out int textStart) ? line.Text.Length - textStart : line.Text.Length;

    private void FlushUnplaced()
    {
        if (invalid is var (line, stamp))
        {
            invalid = null;
            var lost = string.Join(' ', unplaced.Select(l => l.Text));
            unplaced.Clear();
            diagnostics.Warn(line, $"timestamp {Diagnostics.Quote(stamp)} is not a valid time (minutes and seconds run from 00 to 59); entry not read: {Diagnostics.Quote(lost)}");
            return;
        }
        if (unplaced.Count == 0) return;
        string where = entries.Count == 0 && section is null ? "before the first timestamp" : "after a heading, before the first timestamp under it";
        var text = string.Join(' ', unplaced.Select(l => l.Text));
        diagnostics.Warn(unplaced[0].Line, $"text {where} belongs to no cue; not read: {Diagnostics.Quote(text)}");
        unplaced.Clear();
    }
}
