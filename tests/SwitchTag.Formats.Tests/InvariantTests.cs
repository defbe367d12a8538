using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Offset invariants the later stages rely on (DESIGN.md: offsets always point into the
/// original text; a turn's text is its cues' plain texts joined by one space).</summary>
public class InvariantTests
{
    public static TheoryData<string> Names() => Samples.Names();

    [Theory]
    [MemberData(nameof(Names))]
    public void Raw_ranges_lie_inside_the_original_text_at_the_cue_line(string name) => CheckCues(Samples.ReadWithText(name));

    [Theory]
    [MemberData(nameof(Names))]
    public void Turn_text_holds_each_cue_text_at_its_offsets(string name) => CheckTurns(Samples.Read(name));

    [Fact]
    public void Demo_transcripts_keep_the_invariants()
    {
        foreach (var file in DemoTranscripts.Files())
        {
            var read = TranscriptFile.Read(file);
            CheckCues(read);
            CheckTurns(read.Transcript!);
        }
    }

    internal static void CheckCues(ReadResult read)
    {
        var t = read.Transcript!;
        string text = read.Text!;
        int lastStart = -1;
        foreach (var cue in t.Cues)
        {
            Assert.InRange(cue.RawStart, 0, text.Length);
            Assert.InRange(cue.RawEnd, cue.RawStart, text.Length);
            Assert.True(cue.RawStart >= lastStart, $"{cue.At}: raw ranges out of file order");
            lastStart = cue.RawStart;
            // The raw range starts at the beginning of the line the cue names.
            int line = 1 + text.AsSpan(0, cue.RawStart).Count('\n');
            if (!text.Contains('\r')) Assert.Equal(cue.At.Line, line);
            Assert.True(cue.RawStart == 0 || text[cue.RawStart - 1] is '\n' or '\r', $"{cue.At}: raw start not at a line start");
            Assert.True(cue.Time.End >= cue.Time.Start);
            foreach (var w in cue.WordTimes) Assert.InRange(w.CharOffset, 0, cue.Text.Length);
            Assert.Equal(SpeakerLabels.Normalise(cue.SpeakerLabel), cue.Speaker);
        }
    }

    internal static void CheckTurns(Transcript t)
    {
        var turns = TurnBuilder.Build(t);
        Assert.Equal(t.Cues.Length, turns.Sum(x => x.Cues.Length));
        foreach (var turn in turns)
        {
            foreach (var c in turn.Cues)
                Assert.Equal(t.Cues[c.CueIndex].Text, turn.Text[c.CharStart..c.CharEnd]);
            Assert.Equal(string.Join(' ', turn.Cues.Select(c => t.Cues[c.CueIndex].Text)), turn.Text);
            Assert.All(turn.Cues, c => Assert.Equal(turn.Speaker, t.Cues[c.CueIndex].Speaker));
        }
    }
}
