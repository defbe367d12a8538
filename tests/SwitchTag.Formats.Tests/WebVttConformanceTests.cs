using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>A WebVTT conformance set written from the parsing rules of the W3C "WebVTT: The Web Video
/// Text Tracks Format" (written from memory of the spec; each case names the section and step it
/// checks). Where this reader departs from the spec on purpose, FORMATS.md says so and the case says
/// what the spec would do.</summary>
public class WebVttConformanceTests
{
    private static Timecode Ms(long ms) => new(ms);

    private static ReadResult Parse(string text) => TranscriptFile.Parse("conformance.vtt", text, TranscriptFormat.WebVtt);

    private static Cue Only(string text)
    {
        var r = Parse(text);
        Assert.True(r.Accepted, string.Join("; ", r.Diagnostics));
        return Assert.Single(r.Transcript!.Cues);
    }

    private static Cue CueText(string cueText) => Only("WEBVTT\n\n00:00.000 --> 00:01.000\n" + cueText + "\n");

    // --- "WebVTT file parsing" (the parser algorithm) ---

    [Theory]
    [InlineData("WEBVTT\n\n00:00.000 --> 00:01.000\nx\n")]             // signature alone on its line
    [InlineData("WEBVTT header text\n\n00:00.000 --> 00:01.000\nx\n")] // followed by a space and text
    [InlineData("WEBVTT\theader\n\n00:00.000 --> 00:01.000\nx\n")]     // followed by a tab
    [InlineData("WEBVTT\r\n\r\n00:00.000 --> 00:01.000\r\nx\r\n")]    // CRLF line terminators
    [InlineData("WEBVTT\r\r00:00.000 --> 00:01.000\rx\r")]             // CR line terminators
    public void Signature_followed_by_space_tab_or_line_terminator_is_accepted(string file) =>
        Assert.Equal("x", Only(file).Text);

    [Theory]
    [InlineData("WEBVTTX\n\n00:00.000 --> 00:01.000\nx\n")] // "WEBVTT" then a character that is not space, tab or a line break
    [InlineData("webvtt\n\n00:00.000 --> 00:01.000\nx\n")]  // the signature is case-sensitive
    public void Anything_else_after_the_signature_fails(string file) =>
        Assert.Contains("not WebVTT", Reads.SingleError(Parse(file)).Message);

    [Fact]
    public void Header_lines_run_to_the_first_blank_line_and_are_no_cue_text()
    {
        // File parsing: lines after the signature up to an empty line are the header.
        var cue = Only("WEBVTT\nKind: captions\nLanguage: en\n\n00:00.000 --> 00:01.000\nx\n");
        Assert.Equal("x", cue.Text);
    }

    [Theory]
    [InlineData("   ")]
    [InlineData("\t")]
    [InlineData(" \t ")]
    public void A_line_of_spaces_or_tabs_inside_a_cue_is_cue_text(string blankish)
    {
        // Collect a WebVTT block, loop: "Otherwise, if line is the empty string, break out of loop";
        // any other line without "-->" is appended to the buffer, so only an empty line ends the cue.
        var cue = Only("WEBVTT\n\n00:00.000 --> 00:01.000\nfirst\n" + blankish + "\nsecond\n\n");
        Assert.Equal("first\n" + blankish + "\nsecond", cue.Text);
    }

    [Fact]
    public void A_line_of_spaces_does_not_end_the_header()
    {
        // The header is collected as a block with "in header" set: it too ends only at an empty line.
        var cue = Only("WEBVTT\nKind: captions\n  \nLanguage: en\n\n00:00.000 --> 00:01.000\nx\n");
        Assert.Equal("x", cue.Text);
    }

    [Fact]
    public void A_timing_line_after_a_line_of_spaces_starts_the_next_cue()
    {
        // Collect a WebVTT block: "-->" on the third line or later ends the block before that line,
        // which begins the next block; the line of spaces stays in the first cue's text.
        var r = Parse("WEBVTT\n\n00:00.000 --> 00:01.000\nx\n  \n00:01.000 --> 00:02.000\ny\n");
        Assert.True(r.Accepted, string.Join("; ", r.Diagnostics));
        Assert.Equal(["x\n  ", "y"], r.Transcript!.Cues.Select(c => c.Text));
    }

    [Fact]
    public void Line_before_the_timing_line_is_the_identifier()
    {
        // Collect a WebVTT block: "-->" on the block's second line makes the first line the identifier.
        var cue = Only("WEBVTT\n\nintro-1\n00:00.000 --> 00:01.000\nx\n");
        Assert.Equal("intro-1", cue.Identifier);
        Assert.Equal("x", cue.Text);
    }

    [Fact]
    public void Arrow_on_a_blocks_third_line_starts_a_new_block()
    {
        // Collect a WebVTT block: an arrow is a timing line only at line 1 or 2 of a block; a later
        // line with "-->" ends the block before it, and the lines before it are no cue.
        var r = Parse("WEBVTT\n\nnot\nan identifier\n00:02.000 --> 00:03.000\ny\n");
        var cue = Assert.Single(r.Transcript!.Cues);
        Assert.Equal("y", cue.Text);
        Assert.Equal(new TimeRange(Ms(2000), Ms(3000)), cue.Time);
    }

    [Fact]
    public void Line_with_an_arrow_inside_cue_text_ends_the_cue_and_starts_the_next()
    {
        // Collect a WebVTT block: a line containing "-->" after the timing line ends the block.
        var r = Parse("WEBVTT\n\n00:00.000 --> 00:01.000\nfirst\n00:01.000 --> 00:02.000\nsecond\n");
        Assert.Equal(["first", "second"], r.Transcript!.Cues.Select(c => c.Text));
    }

    [Fact]
    public void Cue_text_lines_run_to_an_empty_line()
    {
        var r = Parse("WEBVTT\n\n00:00.000 --> 00:01.000\none\ntwo\n\n00:01.000 --> 00:02.000\nthree\n");
        Assert.Equal(["one\ntwo", "three"], r.Transcript!.Cues.Select(c => c.Text));
    }

    [Theory]
    [InlineData("NOTE this is a comment\n")]
    [InlineData("NOTE\nspanning\ntwo lines\n")]
    [InlineData("NOTE\tafter a tab\n")]
    public void Note_blocks_are_comments(string note)
    {
        // File parsing: a block starting "NOTE" followed by space, tab or a line break is a comment.
        var r = Parse("WEBVTT\n\n" + note + "\n00:00.000 --> 00:01.000\nx\n");
        Assert.Equal("x", Assert.Single(r.Transcript!.Cues).Text);
        Assert.Empty(r.Diagnostics);
    }

    [Fact]
    public void Nul_is_replaced_by_the_replacement_character()
    {
        // Parser algorithm, first step: U+0000 NULL becomes U+FFFD.
        Assert.Equal("a\uFFFDb", Only("WEBVTT\n\n00:00.000 --> 00:01.000\na\0b\n").Text);
    }

    [Fact]
    public void Style_and_region_blocks_before_the_cues_are_not_cues()
    {
        var r = Parse("WEBVTT\n\nSTYLE\n::cue { color: red }\n\nREGION\nid:left width:40%\n\n00:00.000 --> 00:01.000\nx\n");
        Assert.Equal("x", Assert.Single(r.Transcript!.Cues).Text);
        Assert.Empty(r.Diagnostics);
    }

    // --- "WebVTT cue timings and settings parsing" and "collect a WebVTT timestamp" ---

    [Theory]
    [InlineData("00:01.500 --> 00:02.000", 1500, 2000)]              // mm:ss.ttt
    [InlineData("01:02:03.004 --> 01:02:04.000", 3723004, 3724000)]   // hh:mm:ss.ttt
    [InlineData("100:00:00.000 --> 100:00:01.000", 360000000, 360001000)] // more than two hour digits
    [InlineData("00:01.000-->00:02.000", 1000, 2000)]                 // whitespace around "-->" is optional
    [InlineData("00:01.000 \t-->\t 00:02.000", 1000, 2000)]           // spaces and tabs are whitespace
    [InlineData("00:01.000\f-->\f00:02.000", 1000, 2000)]             // and so is form feed
    public void Valid_timings_are_read(string timing, long start, long end) =>
        Assert.Equal(new TimeRange(Ms(start), Ms(end)), Only($"WEBVTT\n\n{timing}\nx\n").Time);

    [Theory]
    [InlineData("00:01.00 --> 00:02.000")]   // milliseconds must be exactly three digits
    [InlineData("00:01.0000 --> 00:02.000")] // not four
    [InlineData("00:60.000 --> 01:02.000")]  // seconds 00-59
    [InlineData("00:60:00.000 --> 01:00:00.000")] // minutes 00-59 when hours are given
    [InlineData("0:1.000 --> 00:02.000")]    // minutes and seconds need two digits
    [InlineData("00:01,000 --> 00:02,000")]  // a comma is not the fraction separator
    [InlineData("00:01.000 -> 00:02.000")]   // the arrow is exactly "-->"
    public void Invalid_timings_drop_the_cue(string timing)
    {
        var r = Parse($"WEBVTT\n\n{timing}\nlost words\n\n00:05.000 --> 00:06.000\nkept\n");
        Assert.Equal("kept", Assert.Single(r.Transcript!.Cues).Text);
        // Deliberate: the spec drops such a cue silently; here its words are quoted in a warning.
        Assert.Contains(Reads.Warnings(r), w => w.Message.Contains("lost words"));
    }

    [Theory]
    [InlineData("00:00.000 --> 00:01.000 align:start line:0", "align:start line:0")]
    [InlineData("00:00.000 --> 00:01.000line:40%", "line:40%")] // the settings string starts right after the end time
    [InlineData("00:00.000 --> 00:01.000 unknown:setting", "unknown:setting")] // unknown settings are ignored, not fatal
    public void Settings_follow_the_end_time(string timing, string settings) =>
        Assert.Equal(settings, Only($"WEBVTT\n\n{timing}\nx\n").Settings);

    // --- "WebVTT cue text parsing rules" (the cue text tokenizer) ---

    [Theory]
    [InlineData("<i>italic</i> <b>bold</b> <u>under</u>", "italic bold under")]
    [InlineData("<c.yellow.bg_blue>classes</c>", "classes")]           // classes after dots
    [InlineData("<i.loud>x</i>", "x")]
    [InlineData("<blink>unknown</blink> tags", "unknown tags")]        // unknown tags are ignored
    [InlineData("a &amp; b &lt;c&gt;", "a & b <c>")]                  // character references
    [InlineData("&#x2014;&#8212;", "——")]                              // numeric references, hex and decimal
    [InlineData("&lrm;&rlm;&nbsp;", "\u200E\u200F\u00A0")]
    [InlineData("&unknown; &amp", "&unknown; &amp")]                   // not a reference: stays as written
    [InlineData("a <00:00:00.500>b", "a b")]                          // timestamp tags are not text
    [InlineData("</i>stray end tag", "stray end tag")]                  // an end tag with no start is ignored
    [InlineData("two\nlines", "two\nlines")]                           // line feeds stay in the text
    public void Cue_text_gives_its_plain_text(string cueText, string plain) =>
        Assert.Equal(plain, CueText(cueText).Text);

    [Fact]
    public void Voice_span_annotation_names_the_speaker()
    {
        // Start tag annotation: the text after the tag name and whitespace, character references decoded.
        var cue = CueText("<v.loud Roger &amp; Co>Hello</v>");
        Assert.Equal("Roger & Co", cue.SpeakerLabel);
        Assert.Equal("Hello", cue.Text);
    }

    [Fact]
    public void Language_span_keeps_its_text_and_drops_its_tags()
    {
        // The cue language span's language is not kept: the segmenter decides every stretch's language.
        var cue = CueText("say <lang de>Guten Tag</lang> now");
        Assert.Equal("say Guten Tag now", cue.Text);
    }

    [Fact]
    public void Timestamp_tag_marks_where_the_following_text_starts()
    {
        var cue = CueText("one <00:00:00.500>two");
        var word = Assert.Single(cue.WordTimes);
        Assert.Equal(4, word.CharOffset);
        Assert.Equal(Ms(500), word.Time);
    }

    [Fact]
    public void Ruby_text_follows_its_base()
    {
        // Deliberate rendering (FORMATS.md): ruby text in brackets after its base; "</ruby>" closes an
        // open "rt" as the DOM construction rules do.
        Assert.Equal("漢(kan)字(ji)", CueText("<ruby>漢<rt>kan</rt>字<rt>ji</rt></ruby>").Text);
        Assert.Equal("No (way!)", CueText("<ruby>No <rt>way!</ruby>").Text);
    }

    [Fact]
    public void A_tag_left_open_at_the_cue_end_is_kept_as_text()
    {
        // Tokenizer: a '<' with no '>' reads to the end of input as a tag; deliberate here (FORMATS.md):
        // kept as text with a warning, so no words go missing.
        var r = Parse("WEBVTT\n\n00:00.000 --> 00:01.000\na < b\n");
        Assert.Equal("a < b", r.Transcript!.Cues[0].Text);
        Assert.Single(Reads.Warnings(r));
    }
}
