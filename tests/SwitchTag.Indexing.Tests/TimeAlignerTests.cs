using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Time;
using SwitchTag.Indexing;
using Xunit;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing.Tests;

public class TimeAlignerTests
{
    private static (TimeAligner, Turn) One(string text, long start, long end, params (int, long)[] words)
    {
        var cue = new Cue(new TimeRange(new Timecode(start), new Timecode(end)), "a", "A", text,
            words.Select(w => new WordTime(w.Item1, new Timecode(w.Item2))).ToImmutableArray(), new SourceLine("t.vtt", 1), new CharSpan(0, 0));
        var transcript = new Transcript(new SourceInfo("t.vtt", TranscriptFormat.WebVtt, ""), [cue], []);
        return (new TimeAligner(transcript), TurnBuilder.Build(transcript)[0]);
    }

    [Fact]
    public void Interpolates_by_character_position_hand_computed()
    {
        // Cue 10.000-20.000 s, 21 chars; "Warsaw" is chars [14, 20).
        // Hand computed: start = 10 + 10 * 14/21 = 16.6667 -> 16.667 s; end = 10 + 10 * 20/21 = 19.5238 -> 19.524 s.
        var (aligner, turn) = One("I was born in Warsaw.", 10_000, 20_000);
        var time = aligner.Align(turn, 14, 20);
        Assert.Equal(new Timecode(16_667), time.Start);
        Assert.Equal(new Timecode(19_524), time.End);
    }

    [Fact]
    public void Uses_word_timings_when_the_cue_has_them()
    {
        // Inline timestamps as in the W3C WebVTT karaoke example: each one gives the start of the text after it.
        // "I was born in Warsaw, in May." word times at 'born' (6) = 12 s, 'Warsaw' (14) = 13.5 s, 'in' (22) = 15 s.
        var (aligner, turn) = One("I was born in Warsaw, in May.", 10_000, 20_000, (6, 12_000), (14, 13_500), (22, 15_000));
        var time = aligner.Align(turn, 14, 20);
        Assert.Equal(new Timecode(13_500), time.Start);
        Assert.Equal(new Timecode(15_000), time.End);
        // Before the first timing a name starts with the cue; after the last one it ends with the cue.
        Assert.Equal(new Timecode(10_000), aligner.Align(turn, 0, 1).Start);
        Assert.Equal(new Timecode(20_000), aligner.Align(turn, 25, 28).End);
    }

    [Fact]
    public void A_range_across_two_cues_starts_in_the_first_and_ends_in_the_second()
    {
        var c1 = new Cue(new TimeRange(new Timecode(0), new Timecode(4_000)), "a", "A", "abcd", [], new SourceLine("t", 1), new CharSpan(0, 0));
        var c2 = new Cue(new TimeRange(new Timecode(5_000), new Timecode(9_000)), "a", "A", "efgh", [], new SourceLine("t", 4), new CharSpan(0, 0));
        var transcript = new Transcript(new SourceInfo("t", TranscriptFormat.Srt, ""), [c1, c2], []);
        var turn = TurnBuilder.Build(transcript)[0]; // "abcd efgh": cue 2 holds chars [5, 9)
        var time = new TimeAligner(transcript).Align(turn, 2, 7);
        Assert.Equal(new Timecode(2_000), time.Start); // 0 + 4 s * 2/4
        Assert.Equal(new Timecode(7_000), time.End);   // 5 + 4 s * (7-5)/4
        // The joining space belongs to the later cue.
        Assert.Equal(new Timecode(5_000), new TimeAligner(transcript).Align(turn, 4, 5).Start);
    }

    [Fact]
    public void Every_fixture_mention_lies_inside_its_cues()
    {
        var index = Fakes.Fixture.Run();
        Assert.NotEmpty(index.Mentions);
        foreach (var m in index.Mentions)
        {
            var turn = index.TurnAt(m.Mention.Turn);
            Assert.True(turn.Time.Contains(m.Time.Start) && turn.Time.Contains(m.Time.End), $"{m.Mention.Text} {m.Time}");
            var cue = turn.Cues.First(c => m.Mention.CharStart < c.CharEnd);
            var cueTime = index.Transcript.Cues[cue.CueIndex].Time;
            Assert.True(cueTime.Contains(m.Time.Start), $"{m.Mention.Text} starts at {m.Time.Start}, outside its cue {cueTime}");
            Assert.True(m.Time.Start <= m.Time.End);
        }
    }
}
