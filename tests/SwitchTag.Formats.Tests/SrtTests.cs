using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

public class SrtTests
{
    [Fact]
    public void Reads_counters_timings_multiline_text_tags_and_speakers()
    {
        // SubRip layout (counter, "HH:MM:SS,mmm --> HH:MM:SS,mmm", text, blank line), from memory of the
        // de-facto format; <i>/<b>/<u>/<font> and {\an8} codes are styling, not text.
        var t = Samples.Read("srt");
        Assert.Equal(TranscriptFormat.Srt, t.Source.Format);
        Assert.Equal(4, t.Cues.Length);
        Assert.Equal(new TimeRange(Timecode.FromParts(0, 0, 1, 0), Timecode.FromParts(0, 0, 3, 500)), t.Cues[0].Time);
        Assert.Equal("Where were you born?", t.Cues[0].Text);
        Assert.Equal("INTERVIEWER", t.Cues[0].SpeakerLabel);
        Assert.Equal("Interviewer", t.Cues[0].Speaker);
        Assert.Equal("In Sevilla,\nin nineteen thirty.", t.Cues[1].Text);
        Assert.Equal("Maria De La Cruz", t.Cues[1].Speaker);
        // A cue without NAME: continues the speaker before it (SubRip names a speaker when it changes).
        Assert.Equal("And then we left.", t.Cues[2].Text);
        Assert.Equal("Maria De La Cruz", t.Cues[2].Speaker);
        Assert.Equal("MARIA DE LA CRUZ", t.Cues[2].SpeakerLabel);
        Assert.Equal("Interviewer", t.Cues[3].Speaker);
        Assert.Equal("Interviewer", t.Cues[3].SpeakerLabel);
        Assert.Equal("1", t.Cues[0].Identifier);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Missing_counters_and_missing_blank_lines_are_tolerated()
    {
        var t = Reads.Accepted("loose.srt", "00:00:01,000 --> 00:00:02,000\nfirst\n2\n00:00:02,000 --> 00:00:03,000\nsecond\n");
        Assert.Equal(["first", "second"], t.Cues.Select(c => c.Text));
    }

    [Fact]
    public void Overlapping_cues_are_kept_with_a_warning()
    {
        var result = TranscriptFile.Parse("overlap.srt", "1\n00:00:01,000 --> 00:00:05,000\none\n\n2\n00:00:04,000 --> 00:00:06,000\ntwo\n");
        Assert.Equal(2, result.Transcript!.Cues.Length);
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(new SourceLine("overlap.srt", 5), w.At);
        Assert.Contains("before the cue above (line 1) ends", w.Message);
    }

    [Fact]
    public void Non_tag_angle_brackets_stay_as_text()
    {
        var t = Reads.Accepted("lt.srt", "1\n00:00:01,000 --> 00:00:02,000\nI <3 Lisboa, 2 < 3\n");
        Assert.Equal("I <3 Lisboa, 2 < 3", t.Cues[0].Text);
    }
}
