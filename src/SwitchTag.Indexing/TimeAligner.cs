using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing;

/// <summary>Places a char range of a turn in the recording.
/// Rule: the range's first char falls in some cue of the turn and its last char in some (maybe later)
/// cue. Inside a cue, if the file gives word timings (<see cref="Cue.WordTimes"/>), a start is the time
/// of the last timing at or before the start char (the cue start if none), and an end is the time of the
/// first timing at or after the end char (the cue end if none). Without word timings the time is
/// interpolated linearly by character position: <c>cueStart + (cueEnd - cueStart) * offset / cueLength</c>,
/// rounded to the millisecond. A position on the space joining two cues belongs to the later cue.</summary>
public sealed class TimeAligner(Transcript transcript)
{
    public TimeRange Align(Turn turn, int charStart, int charEnd)
    {
        if (turn.Cues.IsEmpty) return turn.Time;
        charEnd = Math.Max(charEnd, charStart);
        var first = CueAtStart(turn, charStart);
        var last = CueAtEnd(turn, charEnd);
        if (last.CueIndex < first.CueIndex) last = first;
        var start = StartTime(first, charStart - first.CharStart);
        var end = EndTime(last, charEnd - last.CharStart);
        return new TimeRange(start, Timecode.Max(start, end));
    }

    // Binary searches: a turn's cues are in text order, and a long turn (one speaker for hours) has
    // hundreds of thousands of them, so a scan per mention would make alignment quadratic.
    private static TurnCue CueAtStart(Turn turn, int charStart)
    {
        // The first cue that ends after charStart.
        var cues = turn.Cues;
        int lo = 0, hi = cues.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (charStart < cues[mid].CharEnd) hi = mid; else lo = mid + 1;
        }
        return lo < cues.Length ? cues[lo] : cues[^1];
    }

    private static TurnCue CueAtEnd(Turn turn, int charEnd)
    {
        // The last cue that starts before charEnd.
        var cues = turn.Cues;
        int lo = 0, hi = cues.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (charEnd > cues[mid].CharStart) lo = mid + 1; else hi = mid;
        }
        return lo > 0 ? cues[lo - 1] : cues[0];
    }

    private Timecode StartTime(TurnCue part, int local)
    {
        var cue = transcript.Cues[part.CueIndex];
        int length = part.CharEnd - part.CharStart;
        local = Math.Clamp(local, 0, length);
        if (!cue.WordTimes.IsDefaultOrEmpty)
        {
            var time = cue.Time.Start;
            foreach (var w in cue.WordTimes)
                if (w.CharOffset <= local) time = w.Time; else break;
            return Clamp(cue, time);
        }
        return length == 0 ? cue.Time.Start : cue.Time.At((double)local / length);
    }

    private Timecode EndTime(TurnCue part, int local)
    {
        var cue = transcript.Cues[part.CueIndex];
        int length = part.CharEnd - part.CharStart;
        local = Math.Clamp(local, 0, length);
        if (!cue.WordTimes.IsDefaultOrEmpty)
        {
            foreach (var w in cue.WordTimes)
                if (w.CharOffset >= local) return Clamp(cue, w.Time);
            return cue.Time.End;
        }
        return length == 0 ? cue.Time.End : cue.Time.At((double)local / length);
    }

    // A stray inline timestamp outside its cue must not move a mention out of the cue.
    private static Timecode Clamp(Cue cue, Timecode t) => Timecode.Min(cue.Time.End, Timecode.Max(cue.Time.Start, t));
}
