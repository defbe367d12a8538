using System.Collections.Immutable;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Core.Text;

namespace SwitchTag.Core.Pipeline;

/// <summary>Groups consecutive cues of one speaker into turns. Readers decide, per format, whether a
/// cue with no label continues the previous speaker (they copy the label onto the cue); here equal
/// normalised labels, null included, simply run together.</summary>
public static class TurnBuilder
{
    public static ImmutableArray<Turn> Build(Transcript transcript)
    {
        var turns = ImmutableArray.CreateBuilder<Turn>();
        var cues = transcript.Cues;
        int i = 0;
        while (i < cues.Length)
        {
            int first = i;
            string? speaker = cues[i].Speaker;
            while (i + 1 < cues.Length && string.Equals(cues[i + 1].Speaker, speaker, StringComparison.Ordinal))
                i++;
            turns.Add(Join(new TurnId(turns.Count), cues, first, i));
            i++;
        }
        return turns.ToImmutable();
    }

    private static Turn Join(TurnId id, ImmutableArray<Cue> cues, int first, int last)
    {
        var text = new StringBuilder();
        var parts = ImmutableArray.CreateBuilder<TurnCue>(last - first + 1);
        Timecode start = cues[first].Time.Start, end = cues[first].Time.End;
        for (int c = first; c <= last; c++)
        {
            if (c > first) text.Append(' ');
            int charStart = text.Length;
            text.Append(cues[c].Text);
            parts.Add(new TurnCue(c, new CharSpan(charStart, text.Length)));
            start = Timecode.Min(start, cues[c].Time.Start);
            end = Timecode.Max(end, cues[c].Time.End);
        }
        var head = cues[first];
        return new Turn(id, head.Speaker, head.SpeakerLabel, new TimeRange(start, end), text.ToString(), parts.MoveToImmutable());
    }
}
