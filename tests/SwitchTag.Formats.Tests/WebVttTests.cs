using SwitchTag.Core.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

public class WebVttTests
{
    private static Timecode T(int h, int m, int s, int ms) => Timecode.FromParts(h, m, s, ms);

    [Fact]
    public void Introduction_example_reads_voices_times_and_settings()
    {
        // (from memory of the W3C WebVTT spec, section 1.1: 13 cues, two voices, settings on four cues)
        var t = Samples.Read("spec-introduction");
        Assert.Equal(TranscriptFormat.WebVtt, t.Source.Format);
        Assert.Equal(13, t.Cues.Length);
        Assert.Equal(new TimeRange(T(0, 0, 11, 0), T(0, 0, 13, 0)), t.Cues[0].Time);
        Assert.Equal("We are in New York City", t.Cues[0].Text);
        Assert.Equal("Roger Bingham", t.Cues[0].SpeakerLabel);
        Assert.Equal("Roger Bingham", t.Cues[0].Speaker);
        Assert.Equal("Neil Degrasse Tyson", t.Cues[8].Speaker);
        Assert.Equal("Neil deGrasse Tyson", t.Cues[8].SpeakerLabel);
        Assert.Equal("When we e-mailed—", t.Cues[8].Text);
        Assert.Equal("align:right size:50%", t.Cues[8].Settings);
        Assert.Equal("Laughs", t.Cues[11].Text);
        // WebVTT allows overlapping cues (the spec's example overlaps two voices): no warning.
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Comments_example_skips_notes_and_keeps_identifiers()
    {
        // (from memory of the W3C WebVTT spec, section 1.3: NOTE blocks are comments; "1" and "2" are cue identifiers)
        var t = Samples.Read("spec-comments");
        Assert.Equal(2, t.Cues.Length);
        Assert.Equal("1", t.Cues[0].Identifier);
        Assert.Equal("Never drink liquid nitrogen.", t.Cues[0].Text);
        Assert.Equal("2", t.Cues[1].Identifier);
        Assert.Equal("— It will perforate your stomach.\n— You could die.", t.Cues[1].Text);
        Assert.Equal(new TimeRange(T(0, 0, 5, 0), T(0, 0, 9, 0)), t.Cues[1].Time);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Styling_example_skips_style_blocks_and_strips_bold()
    {
        // (from memory of the W3C WebVTT spec, section 1.4)
        var t = Samples.Read("spec-styling");
        var cue = Assert.Single(t.Cues);
        Assert.Equal("- Hello world.", cue.Text);
        Assert.Null(cue.Speaker);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Regions_example_skips_region_blocks_and_keeps_settings()
    {
        // (from memory of the W3C WebVTT spec, section 1.5: two REGION blocks, six cues)
        var t = Samples.Read("spec-regions");
        Assert.Equal(6, t.Cues.Length);
        Assert.Equal("region:fred align:left", t.Cues[0].Settings);
        Assert.Equal(["Fred", "Bill", "Fred", "Bill", "Fred", "Bill"], t.Cues.Select(c => c.Speaker));
        Assert.Equal("Hi, I’m Bill", t.Cues[1].Text);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Karaoke_example_keeps_inline_timestamps_as_word_times()
    {
        // (from memory of the W3C WebVTT spec, section 1.5: inline timestamps mark when each word starts)
        var t = Samples.Read("spec-karaoke");
        Assert.Equal(3, t.Cues.Length);
        var first = t.Cues[0];
        Assert.Equal("When the moon hits your eye", first.Text);
        var word = Assert.Single(first.WordTimes);
        Assert.Equal(T(0, 0, 17, 500), word.Time);
        Assert.StartsWith("hits", first.Text[word.CharOffset..]);

        var second = t.Cues[1];
        Assert.Equal("Like a big-a pizza pie", second.Text);
        Assert.Equal(["big-a", "pizza", "pie"], second.WordTimes.Select(w => second.Text[w.CharOffset..].Split(' ')[0]));
        Assert.Equal([T(0, 0, 19, 0), T(0, 0, 19, 500), T(0, 0, 20, 0)], second.WordTimes.Select(w => w.Time));
        Assert.Equal("That's amore", t.Cues[2].Text);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Voice_classes_example_takes_the_first_voice_and_warns_about_the_others()
    {
        // (from memory of the W3C WebVTT spec: "<v.first.loud Esme>": the classes are not part of the name)
        var result = TranscriptFile.Parse("voices.vtt", Samples.SpecVoiceClasses);
        var cue = Assert.Single(result.Transcript!.Cues);
        Assert.Equal("Esme", cue.SpeakerLabel);
        Assert.Equal("It’s a blue apple tree!\nNo way!\nHee! laughter\nThat’s awesome!", cue.Text);
        var warning = Assert.Single(result.Diagnostics);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal(new SourceLine("voices.vtt", 5), warning.At);
        Assert.Contains("more than one voice", warning.Message);
    }

    [Fact]
    public void All_span_types_and_character_references_reduce_to_plain_text()
    {
        // (W3C WebVTT, from memory: <c>, <i>, <b>, <u>, <v>, <lang>, <ruby>/<rt> spans; &amp; &lt; &gt;
        // &nbsp; &lrm; &rlm; and numeric references; header text after "WEBVTT" and header lines)
        var t = Samples.Read("webvtt-all-markup");
        Assert.Equal(2, t.Cues.Length);
        var a = t.Cues[0];
        Assert.Equal("intro-1", a.Identifier);
        Assert.Equal("line:90% align:center", a.Settings);
        Assert.Equal("Anna Nowak", a.SpeakerLabel);
        Assert.Equal("I was born in Krakowie, you know,\nnear the river & the <castle>\u00A0hill.", a.Text);

        var b = t.Cues[1];
        // Ruby text is kept in parentheses after its base (FORMATS.md).
        Assert.Equal("漢(kan)字(ji) and \U0001F600 été\u200E\u200F", b.Text);
        Assert.Equal(new SourceLine("all-markup.vtt", 4), a.At);
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Lang_span_left_open_is_closed_at_the_end_of_the_cue()
    {
        // (W3C WebVTT cue text parsing, from memory: open spans are closed at the end of the cue)
        var result = TranscriptFile.Parse("lang.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\nSo I said <lang de>Guten Tag\nund tschüss");
        Assert.Equal("So I said Guten Tag\nund tschüss", Assert.Single(result.Transcript!.Cues).Text);
        Assert.Empty(result.Diagnostics);
    }

    [Fact]
    public void Cue_without_identifier_timing_on_first_line_and_hours_over_99()
    {
        // (W3C WebVTT timestamp grammar, from memory: hours are two or more digits)
        var t = Reads.Accepted("long.vtt", "WEBVTT\n\n100:00:00.000 --> 100:00:01.250\nlate");
        Assert.Equal(new TimeRange(T(100, 0, 0, 0), T(100, 0, 1, 250)), t.Cues[0].Time);
        Assert.Null(t.Cues[0].Identifier);
    }

    [Theory]
    [InlineData("\r\n")]
    [InlineData("\r")]
    [InlineData("\n")]
    public void Line_terminators_CRLF_CR_and_LF_read_alike(string newline)
    {
        // (W3C WebVTT, from memory: a line ends at CRLF, LF or CR)
        string text = Samples.SpecComments.ReplaceLineEndings(newline);
        var read = Reads.AcceptedRead("nl.vtt", text);
        var t = read.Transcript!;
        Assert.Equal(2, t.Cues.Length);
        Assert.Equal("— It will perforate your stomach.\n— You could die.", t.Cues[1].Text);
        Assert.Equal(text, read.Text);
        Assert.Equal(12, t.Cues[0].At.Line);
    }

    [Fact]
    public void Blank_lines_before_the_signature_are_tolerated_with_a_warning()
    {
        // (W3C WebVTT, from memory: the signature must be the first line; this reader is lenient and says so)
        var result = TranscriptFile.Parse("late.vtt", "\n\nWEBVTT\n\n00:01.000 --> 00:02.000\nhi");
        Assert.Equal("hi", Assert.Single(result.Transcript!.Cues).Text);
        Assert.Equal(1, Assert.Single(result.Diagnostics).At.Line);
    }

    [Fact]
    public void Utf8_byte_order_mark_is_dropped()
    {
        var bytes = new byte[] { 0xEF, 0xBB, 0xBF }.Concat(System.Text.Encoding.UTF8.GetBytes(Samples.SpecKaraoke)).ToArray();
        var result = TranscriptFile.Read(Reads.TempFile(bytes, ".vtt"));
        Assert.NotNull(result.Transcript);
        Assert.Equal(Samples.SpecKaraoke, result.Text);
        Assert.Equal(3, result.Transcript.Cues.Length);
    }

    [Fact]
    public void Cue_without_voice_in_a_voiced_file_has_no_speaker()
    {
        var t = Reads.Accepted("mixed.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n<v Ana>Hola\n\n00:02.000 --> 00:03.000\nmusic plays");
        Assert.Equal("Ana", t.Cues[0].Speaker);
        Assert.Null(t.Cues[1].Speaker);
    }

    [Fact]
    public void File_without_voices_reads_name_prefixes_and_continues_the_speaker()
    {
        var t = Reads.Accepted("prefix.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\nANA: Hola <00:01.500>amigo\n\n00:02.000 --> 00:03.000\nque tal");
        Assert.Equal("Ana", t.Cues[0].Speaker);
        Assert.Equal("ANA", t.Cues[0].SpeakerLabel);
        Assert.Equal("Hola amigo", t.Cues[0].Text);
        Assert.Equal("amigo", t.Cues[0].Text[t.Cues[0].WordTimes[0].CharOffset..]);
        Assert.Equal("Ana", t.Cues[1].Speaker);
    }

    [Fact]
    public void Escape_makes_text_that_reads_back_unchanged()
    {
        string plain = "Ben & Jerry <3 --> fin";
        Assert.Equal("Ben &amp; Jerry &lt;3 --&gt; fin", WebVttText.Escape(plain));
        var t = Reads.Accepted("esc.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n" + WebVttText.Escape(plain));
        Assert.Equal(plain, t.Cues[0].Text);
    }
}
