using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Bad input never throws: it gives a diagnostic with file:line and a reason (FORMATS.md, "Warnings and errors").</summary>
public class BadInputTests
{
    [Fact]
    public void Empty_file_is_rejected()
    {
        var path = Reads.TempFile([], ".vtt");
        var e = Reads.SingleError(TranscriptFile.Read(path));
        Assert.Equal(new SourceLine(path, 1), e.At);
        Assert.Contains("empty", e.Message);
        Assert.Contains("whitespace", Reads.SingleError(TranscriptFile.Parse("w.txt", " \n\t\r\n")).Message);
    }

    [Fact]
    public void Binary_file_is_rejected_naming_the_nul_offset()
    {
        // PNG signature (RFC 2083 / ISO 15948, from memory): 89 50 4E 47 0D 0A 1A 0A, then an IHDR
        // chunk length 00 00 00 0D.
        byte[] png = [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A, 0x00, 0x00, 0x00, 0x0D, 0x49, 0x48, 0x44, 0x52];
        var e = Reads.SingleError(TranscriptFile.Read(Reads.TempFile(png, ".srt")));
        Assert.Contains("binary", e.Message);
        Assert.Contains("byte offset 8", e.Message);
        Assert.Equal(3, e.At.Line); // the NUL opens line 3, after the CR LF and the LF of the signature
    }

    [Fact]
    public void Utf16_with_bom_is_accepted_little_and_big_endian()
    {
        foreach (var encoding in new[] { new UnicodeEncoding(false, true), new UnicodeEncoding(true, true) })
        {
            byte[] bytes = [.. encoding.GetPreamble(), .. encoding.GetBytes(Samples.Srt)];
            var result = TranscriptFile.Read(Reads.TempFile(bytes, ".srt"));
            Assert.NotNull(result.Transcript);
            Assert.Equal(Samples.Srt, result.Text);
            Assert.Equal(4, result.Transcript.Cues.Length);
        }
    }

    [Fact]
    public void Utf16_without_bom_is_rejected_with_a_hint()
    {
        var e = Reads.SingleError(TranscriptFile.Read(Reads.TempFile(Encoding.Unicode.GetBytes(Samples.Srt), ".srt")));
        Assert.Contains("UTF-16", e.Message);
    }

    [Fact]
    public void Invalid_utf8_is_rejected_naming_the_byte_offset()
    {
        // RFC 3629: 0xC3 must be followed by a continuation byte 0x80-0xBF; 0x28 is not one.
        byte[] head = Encoding.UTF8.GetBytes("WEBVTT\n\n00:01.000 --> 00:02.000\ncaf");
        byte[] bytes = [.. head, 0xC3, 0x28, .. "\n"u8];
        var path = Reads.TempFile(bytes, ".vtt");
        var e = Reads.SingleError(TranscriptFile.Read(path));
        Assert.Contains($"byte offset {head.Length}", e.Message);
        Assert.Equal(new SourceLine(path, 4), e.At);
    }

    [Fact]
    public void Unreadable_path_is_an_error_not_an_exception()
    {
        var e = Reads.SingleError(TranscriptFile.Read(Path.Combine(Path.GetTempPath(), "no-such-dir-switchtag", "x.vtt")));
        Assert.Equal(TranscriptFile.WholeFile, e.At.Line);
    }

    [Fact]
    public void Unknown_format_is_rejected()
    {
        var e = Reads.SingleError(TranscriptFile.Parse("prose.txt", "Just some prose\nwith no times at all.\n"));
        Assert.Contains("unknown format", e.Message);
    }

    [Fact]
    public void Missing_webvtt_header_rejects_forced_webvtt_and_detects_srt_otherwise()
    {
        const string headless = "00:00:01.000 --> 00:00:02.000\nhello\n";
        var e = Reads.SingleError(TranscriptFile.Parse("x.vtt", headless, TranscriptFormat.WebVtt));
        Assert.Equal(1, e.At.Line);
        Assert.Contains("WEBVTT", e.Message);

        var result = TranscriptFile.Parse("x.vtt", headless);
        Assert.Equal(TranscriptFormat.Srt, result.Transcript!.Source.Format);
        Assert.Contains(result.Diagnostics, d => d.Severity == Severity.Warning && d.Message.Contains("no WEBVTT header"));
        Assert.Equal("hello", result.Transcript.Cues[0].Text);
    }

    [Fact]
    public void Malformed_timing_keeps_the_rest_and_quotes_the_lost_cue()
    {
        // (W3C WebVTT timestamp grammar, from memory: the fraction has exactly three digits)
        var result = TranscriptFile.Parse("bad.vtt", "WEBVTT\n\n00:00:01.00 --> 00:00:02.000\nlost words\n\n00:00:03.000 --> 00:00:04.000\nkept\n");
        Assert.Equal("kept", Assert.Single(result.Transcript!.Cues).Text);
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(new SourceLine("bad.vtt", 3), w.At);
        Assert.Contains("malformed cue timing", w.Message);
        Assert.Contains("\"lost words\"", w.Message);
    }

    [Theory]
    [InlineData("1\n00:00:01,000 --> two seconds later\ntext\n")]
    [InlineData("1\n00:61:01,000 --> 00:00:02,000\ntext\n")]
    [InlineData("1\n00:00:01,000 -> 00:00:02,000\ntext\n")]
    public void Malformed_srt_timings_are_reported(string text)
    {
        var result = TranscriptFile.Parse("bad.srt", text, TranscriptFormat.Srt);
        Assert.Null(result.Transcript); // nothing left: no cues
        Assert.Contains(result.Diagnostics, d => d.Severity == Severity.Warning && d.At.Line is 1 or 2 && d.Message.Contains("text\""));
        Assert.Contains(result.Diagnostics, d => d.Severity == Severity.Error && d.Message.Contains("no cues"));
    }

    [Fact]
    public void Reversed_times_keep_the_cue_with_end_at_start()
    {
        var result = TranscriptFile.Parse("rev.srt", "1\n00:00:05,000 --> 00:00:02,000\nbackwards\n");
        var cue = Assert.Single(result.Transcript!.Cues);
        Assert.Equal(new TimeRange(Timecode.FromSeconds(5), Timecode.FromSeconds(5)), cue.Time);
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(2, w.At.Line);
        Assert.Contains("ends", w.Message);
    }

    [Fact]
    public void Out_of_order_cues_keep_file_order_with_a_warning()
    {
        var result = TranscriptFile.Parse("order.vtt", "WEBVTT\n\n00:05.000 --> 00:06.000\nsecond\n\n00:01.000 --> 00:02.000\nfirst\n");
        Assert.Equal(["second", "first"], result.Transcript!.Cues.Select(c => c.Text));
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(6, w.At.Line);
        Assert.Contains("kept in file order", w.Message);
    }

    [Fact]
    public void Text_outside_cues_is_quoted_in_a_warning()
    {
        var result = TranscriptFile.Parse("stray.vtt", "WEBVTT\n\nstray words here\n\n00:01.000 --> 00:02.000\nok\n");
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(3, w.At.Line);
        Assert.Contains("\"stray words here\"", w.Message);
    }

    [Fact]
    public void Unclosed_angle_bracket_and_bad_inline_timestamp_are_warned()
    {
        var result = TranscriptFile.Parse("lt.vtt", "WEBVTT\n\n00:01.000 --> 00:05.000\nfirst <00:02.0>line\nthen a < b");
        var cue = Assert.Single(result.Transcript!.Cues);
        Assert.Equal("first line\nthen a < b", cue.Text);
        Assert.Equal([4, 5], result.Diagnostics.Select(d => d.At.Line));
    }

    [Fact]
    public void Unescaped_comparison_is_dropped_as_a_tag_but_quoted()
    {
        // (W3C WebVTT cue text tokenizer, from memory: "<" always opens a tag; "< 3 and 5 >" is a tag
        // with an empty name, which the spec ignores)
        var result = TranscriptFile.Parse("cmp.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n2 < 3 and 5 > 4");
        Assert.Equal("2  4", result.Transcript!.Cues[0].Text);
        Assert.Contains("< 3 and 5 >", Assert.Single(result.Diagnostics).Message);
    }

    [Fact]
    public void Cue_with_no_text_is_skipped_with_a_warning()
    {
        var result = TranscriptFile.Parse("empty-cue.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n<i></i>\n\n00:02.000 --> 00:03.000\nsaid\n");
        Assert.Equal("said", Assert.Single(result.Transcript!.Cues).Text);
        Assert.Equal(3, Assert.Single(result.Diagnostics).At.Line);
    }

    private static readonly Lazy<string> Words = new(() => string.Concat(Enumerable.Repeat("palavra słowo ", 10_000_000 / 14 + 1)));

    [Theory]
    [InlineData("huge.vtt")]
    [InlineData("huge.srt")]
    [InlineData("huge.txt")]
    [InlineData("huge.md")]
    [InlineData("angles.vtt")]
    [InlineData("amps.vtt")]
    public void Ten_megabyte_single_line_is_read(string path)
    {
        string text = path switch
        {
            "huge.vtt" => "WEBVTT\n\n00:01.000 --> 00:02.000\n" + Words.Value,
            "huge.srt" => "1\n00:00:01,000 --> 00:00:02,000\n" + Words.Value,
            "huge.txt" => "[00:00:01] ANNA: " + Words.Value,
            "huge.md" => "# T\n\n**[00:00:01] ANNA:** " + Words.Value,
            "angles.vtt" => "WEBVTT\n\n00:01.000 --> 00:02.000\n" + new string('<', 10_000_000),
            _ => "WEBVTT\n\n00:01.000 --> 00:02.000\n" + new string('&', 10_000_000),
        };
        var result = TranscriptFile.Parse(path, text);
        var cue = Assert.Single(result.Transcript!.Cues);
        Assert.True(cue.Text.Length >= 9_999_000, $"{cue.Text.Length} chars");
    }

    [Fact]
    public void Ten_megabyte_line_of_unknown_content_is_rejected_cleanly()
    {
        var e = Reads.SingleError(TranscriptFile.Parse("huge-prose.txt", new string('a', 10_000_000)));
        Assert.Contains("unknown format", e.Message);
    }
}
