using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

public class TimestampedTextTests
{
    private static Timecode S(double seconds) => Timecode.FromSeconds(seconds);

    [Fact]
    public void Reads_every_stamp_form_continuations_and_the_closing_stamp()
    {
        var t = Samples.Read("text");
        Assert.Equal(TranscriptFormat.Text, t.Source.Format);
        Assert.Equal(["Where were you born?", "In Sevilla.\nWe left in 1936.\nThen Lisboa.", "And later Brazil.", "When?", "In the winter.", "Which year?"],
            t.Cues.Select(c => c.Text));
        // An entry ends where the next begins; [00:00:40] alone on the last line closes the last entry,
        // and the untimed speaker change inside it shares its time by characters.
        Assert.Equal(new TimeRange(S(1), S(4)), t.Cues[0].Time);
        Assert.Equal(new TimeRange(S(4), S(20)), t.Cues[1].Time);
        Assert.Equal(new TimeRange(S(20), S(30)), t.Cues[2].Time);
        Assert.Equal(new TimeRange(S(30), S(35.5)), t.Cues[3].Time);
        Assert.Equal(S(35.5), t.Cues[4].Time.Start);
        Assert.Equal(t.Cues[4].Time.End, t.Cues[5].Time.Start);
        Assert.Equal(S(40), t.Cues[5].Time.End);
        Assert.Equal(["Interviewer", "Maria", "Maria", "Interviewer", "Maria", "Interviewer"], t.Cues.Select(c => c.Speaker));
        Assert.Equal([1, 2, 5, 6, 7, 8], t.Cues.Select(c => c.At.Line));
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Last_entry_without_closing_stamp_gets_the_speaking_rate_estimate()
    {
        // 15 characters a second, at least one second (FORMATS.md).
        var t = Reads.Accepted("rate.txt", "[00:01:00] A: short\n[00:01:10] B: " + new string('x', 45));
        Assert.Equal(new TimeRange(S(60), S(70)), t.Cues[0].Time);
        Assert.Equal(new TimeRange(S(70), S(73)), t.Cues[1].Time);
        var single = Reads.Accepted("rate1.txt", "[00:01:00] A: hi");
        Assert.Equal(new TimeRange(S(60), S(61)), single.Cues[0].Time);
    }

    [Fact]
    public void Stamp_ranges_give_explicit_ends()
    {
        var t = Reads.Accepted("range.txt", "[00:01 - 00:03] Hello\n[00:05 – 00:09] World");
        Assert.Equal(new TimeRange(S(1), S(3)), t.Cues[0].Time);
        Assert.Equal(new TimeRange(S(5), S(9)), t.Cues[1].Time);
    }

    [Fact]
    public void Stamp_alone_on_a_line_opens_an_entry_written_below_it()
    {
        var t = Reads.Accepted("below.txt", "[00:00:05]\nANNA: Good morning.\n[00:00:09]\nBEN: Morning.\n[00:00:12]\n");
        Assert.Equal(["Good morning.", "Morning."], t.Cues.Select(c => c.Text));
        Assert.Equal(new TimeRange(S(5), S(9)), t.Cues[0].Time);
        Assert.Equal(new TimeRange(S(9), S(12)), t.Cues[1].Time);
        Assert.Equal("Anna", t.Cues[0].Speaker);
    }

    [Fact]
    public void A_sentence_opening_with_a_clock_time_is_not_a_stamp()
    {
        var t = Reads.Accepted("clock.txt", "[00:00:05] ANNA: We got up early.\n10:30 in the morning we left.\n");
        Assert.Equal("We got up early.\n10:30 in the morning we left.", Assert.Single(t.Cues).Text);
    }

    [Fact]
    public void Text_before_the_first_stamp_is_reported_not_dropped()
    {
        var result = TranscriptFile.Parse("pre.txt", "Interview with Anna Berg\nrecorded 1990\n\n[00:00:05] ANNA: Hello.");
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(new SourceLine("pre.txt", 1), w.At);
        Assert.Contains("\"Interview with Anna Berg recorded 1990\"", w.Message);
    }
}
