using SwitchTag.Indexing.Tests.Fakes;
using Xunit;

namespace SwitchTag.Indexing.Tests;

/// <summary>An index holds each cue's text once, in its turn: the index's transcript has the cues
/// without their texts, and every text read is still there at the cue's place in its turn.</summary>
public class CueTextTests
{
    [Fact]
    public void The_index_keeps_each_cue_text_only_in_its_turn()
    {
        var read = Fixture.Transcript();
        var index = Fixture.Run();

        Assert.All(index.Transcript.Cues, c => Assert.Equal("", c.Text));
        var placed = index.Turns.SelectMany(t => t.Cues.Select(c => (c.CueIndex, Text: t.Text[c.CharStart..c.CharEnd]))).OrderBy(x => x.CueIndex);
        Assert.Equal(read.Cues.Select((c, i) => (i, c.Text)), placed);
        // Everything else of each cue stays as read (word times compared by value: each read makes new arrays).
        Assert.Equal(read.Cues.Select(c => c with { Text = "", WordTimes = [] }), index.Transcript.Cues.Select(c => c with { WordTimes = [] }));
        Assert.Equal(read.Cues.SelectMany(c => c.WordTimes), index.Transcript.Cues.SelectMany(c => c.WordTimes));
        Assert.Equal(read.Id, index.Transcript.Id);
    }
}
