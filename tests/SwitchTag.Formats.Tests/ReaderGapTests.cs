using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Reproductions of reader gaps found with real transcripts from outside the project (one test
/// per reproduction; FORMATS.md gives each rule). Inputs are invented in the shape reported.</summary>
public class ReaderGapTests
{
    private static Timecode S(double seconds) => new((long)Math.Round(seconds * 1000));

    [Fact]
    public void Out_of_range_stamp_is_reported_and_not_merged_into_the_entry_above()
    {
        var r = TranscriptFile.Parse("t.txt", "[00:00:01] ANNA: We left in spring.\n[99:99:99] ANNA: This line has a broken stamp.\nand goes on here.\n[00:00:09] BEN: Then?\n");
        var t = r.Transcript!;
        Assert.Equal(["We left in spring.", "Then?"], t.Cues.Select(c => c.Text));
        var w = Assert.Single(Reads.Warnings(r));
        Assert.Equal(2, w.At.Line);
        Assert.Contains("\"[99:99:99]\" is not a valid time", w.Message);
        Assert.Contains("\"ANNA: This line has a broken stamp. and goes on here.\"", w.Message);
        // The entry above ends where the next valid one starts, as if the broken one were absent.
        Assert.Equal(new TimeRange(S(1), S(9)), t.Cues[0].Time);
    }

    [Fact]
    public void Label_with_a_parenthesised_qualifier_names_the_speaker()
    {
        var t = Reads.Accepted("a.txt", "004:06:45 CDR (EAGLE): Houston, we're go.\n004:06:47 LMP (EAGLE): Roger.\n004:06:49 CDR (EAGLE): Okay.\n");
        Assert.Equal(["CDR (EAGLE)", "LMP (EAGLE)", "CDR (EAGLE)"], t.Cues.Select(c => c.SpeakerLabel));
        Assert.Equal("Lmp (Eagle)", t.Cues[1].Speaker);
        Assert.Equal("Roger.", t.Cues[1].Text);
        Assert.Equal("Anna (Translator)", SpeakerLabels.Normalise("ANNA (translator)"));
    }

    [Fact]
    public void Continuation_line_resumes_the_interrupted_speaker_in_order()
    {
        const string text = "004:06:45.53 LMP (EAGLE): 540 feet, down at - -\n"
            + "004:06:46.10 CDR (EAGLE): Okay.\n"
            + "004:06:45.53 - - 30. Down at 15.\n"
            + "004:06:55.00 LMP (EAGLE): 400 feet.\n";
        var r = TranscriptFile.Parse("apollo.txt", text);
        var t = r.Transcript!;
        Assert.Empty(r.Diagnostics); // no out-of-order warning
        Assert.Equal(["Lmp (Eagle)", "Cdr (Eagle)", "Lmp (Eagle)", "Lmp (Eagle)"], t.Cues.Select(c => c.Speaker));
        Assert.Equal("- - 30. Down at 15.", t.Cues[2].Text);
        Assert.True(t.Cues[2].Time.Start >= t.Cues[1].Time.End);
        Assert.Equal(S(4 * 3600 + 6 * 60 + 55), t.Cues[2].Time.End);

        // The same stamp again right below: the entry simply goes on.
        var same = Reads.Accepted("same.txt", "004:06:45.53 LMP (EAGLE): 540 feet, down at - -\n004:06:45.53 - - 30.\n004:06:50.00 CDR (EAGLE): Okay.\n");
        Assert.Equal("540 feet, down at - -\n- - 30.", same.Cues[0].Text);
        Assert.Equal(2, same.Cues.Length);
    }

    [Fact]
    public void Capitalised_word_and_colon_in_a_file_without_labels_is_not_a_speaker()
    {
        const string vtt = "WEBVTT\n\n00:01.000 --> 00:04.000\nLibellen: deren Flügelstruktur ist alt.\n\n00:04.000 --> 00:08.000\nSie fliegen seit langer Zeit.\n";
        var t = Reads.Accepted("doku.vtt", vtt);
        Assert.All(t.Cues, c => Assert.Null(c.Speaker));
        Assert.Equal("Libellen: deren Flügelstruktur ist alt.", t.Cues[0].Text);
        var srt = Reads.Accepted("doku.srt", "1\n00:00:01,000 --> 00:00:04,000\nLibellen: deren Flügelstruktur ist alt.\n\n2\n00:00:04,000 --> 00:00:08,000\nSie fliegen.\n");
        Assert.All(srt.Cues, c => Assert.Null(c.Speaker));
        // A label used twice is a speaker label.
        var labelled = Reads.Accepted("l.srt", "1\n00:00:01,000 --> 00:00:02,000\nAnna: Hi.\n\n2\n00:00:02,000 --> 00:00:03,000\nBen: Hello.\n\n3\n00:00:03,000 --> 00:00:04,000\nAnna: Bye.\n");
        Assert.Equal(["Anna", "Ben", "Anna"], labelled.Cues.Select(c => c.Speaker));
    }

    [Fact]
    public void Escaped_markdown_stamps_are_detected_as_markdown()
    {
        // CommonMark 0.31 section 2.4: a backslash before ASCII punctuation is a literal of that punctuation.
        const string md = "\\[00:00:00\\] **Anna:** We came by train.\n\n\\[00:00:05\\] **Ben:** From where?\n";
        foreach (var name in new[] { "escaped.md", "escaped.txt" })
        {
            var r = TranscriptFile.Parse(name, md);
            Assert.Equal(TranscriptFormat.Markdown, r.Transcript!.Source.Format);
            Assert.Equal(["Anna", "Ben"], r.Transcript.Cues.Select(c => c.Speaker));
            Assert.Equal("We came by train.", r.Transcript.Cues[0].Text);
        }
    }

    [Fact]
    public void Fifty_thousand_unclosed_brackets_give_one_warning_with_the_count()
    {
        var r = TranscriptFile.Parse("lt.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n" + new string('<', 50_000) + "\n");
        Assert.Equal(new string('<', 50_000), r.Transcript!.Cues[0].Text);
        var w = Assert.Single(r.Diagnostics);
        Assert.Contains("50000 '<' with no closing '>'", w.Message);
    }

    [Fact]
    public void Warnings_of_one_kind_are_capped_per_file_with_a_count_of_the_rest()
    {
        var vtt = new StringBuilder("WEBVTT\n\n");
        for (int i = 0; i < 100; i++) vtt.Append($"00:{i / 60:00}:{i % 60:00}.000 --> 00:{i / 60:00}:{i % 60:00}.500\nword <99:00.000> word\n\n");
        var r = TranscriptFile.Parse("many.vtt", vtt.ToString());
        Assert.Equal(100, r.Transcript!.Cues.Length);
        Assert.Equal(21, r.Diagnostics.Length);
        Assert.Contains("80 more warnings like", r.Diagnostics[^1].Message);
        Assert.Equal(r.Diagnostics[^2].At.Line + 3, r.Diagnostics[^1].At.Line); // the first one left out
    }

    [Fact]
    public void Decomposed_text_is_read_in_nfc_with_offsets_moved_along()
    {
        // Unicode UAX #15: "o" + U+0301 COMBINING ACUTE ACCENT composes to U+00F3 in NFC.
        const string nfd = "Krako\u0301w";
        var read = Reads.AcceptedRead("nfd.vtt", $"WEBVTT\n\n00:01.000 --> 00:03.000\n<v Anna>{nfd} <00:00:02.000>jest <lang pl>pie\u0300kny</lang>\n");
        var t = read.Transcript!;
        var cue = Assert.Single(t.Cues);
        Assert.Equal("Kraków jest piękny".Replace("ę", "e\u0300".Normalize(NormalizationForm.FormC)), cue.Text);
        Assert.True(cue.Text.IsNormalized(NormalizationForm.FormC));
        Assert.Equal(7, Assert.Single(cue.WordTimes).CharOffset); // "jest" starts at 7 in NFC, 8 in NFD
        Assert.Contains(nfd, read.Text); // the file's own form stays in the file's text
        Assert.Equal(Reads.Accepted("nfc.txt", "[00:00:01] KRAKÓW: x").Cues[0].Speaker,
            Reads.Accepted("nfd.txt", "[00:00:01] KRAKO\u0301W: x").Cues[0].Speaker);
    }

    [Fact]
    public void Control_and_bidi_override_characters_are_neutralised_in_messages()
    {
        var r = TranscriptFile.Parse("evil.srt", "1\n00:00:01,000 --> 00:00:02,000\nok\n\nstray \u001b[31mred\u001b[0m \u202Eevil\n");
        var w = Assert.Single(Reads.Warnings(r));
        Assert.DoesNotContain('\u001b', w.Message);
        Assert.DoesNotContain('\u202E', w.Message);
        Assert.Contains("␛[31mred", w.Message);
        Assert.Contains("[U+202E]evil", w.Message);
        // Unicode Control Pictures block (U+2400 + code) for C0; bidi controls from UAX #9 section 2.
        Assert.Equal("a␀b␛c␡d[U+0085]e[U+2066]f\u200Fg\th\ni", DisplayText.Neutralise("a\0b\u001bc\u007fd\u0085e\u2066f\u200Fg\th\ni"));
    }

    [Fact]
    public void Ruby_text_closed_by_the_end_of_ruby_gets_its_closing_bracket()
    {
        // W3C WebVTT, cue text parsing rules: an end tag "ruby" also closes an open "rt".
        var t = Reads.Accepted("r.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n<ruby>No <rt>way!</ruby>\n");
        Assert.Equal("No (way!)", t.Cues[0].Text);
        Assert.Equal("漢(kan)", Reads.Accepted("k.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n<ruby>漢<rt>kan</rt></ruby>\n").Cues[0].Text);
        Assert.Equal("a(b)", Reads.Accepted("o.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n<ruby>a<rt>b\n").Cues[0].Text);
    }

    [Fact]
    public void Settings_glued_to_the_end_time_keep_the_cue()
    {
        var t = Reads.Accepted("g.vtt", "WEBVTT\n\n00:00.000 --> 00:01.000line:40%\nglued\n");
        Assert.Equal("glued", t.Cues[0].Text);
        Assert.Equal("line:40%", t.Cues[0].Settings);
    }

    [Fact]
    public void Form_feed_around_the_timing_arrow_is_whitespace()
    {
        // W3C WebVTT: "skip whitespace" skips U+0009, U+000A, U+000C, U+000D and U+0020.
        var t = Reads.Accepted("ff.vtt", "WEBVTT\n\n00:00.000\f-->\f00:01.000\nfed\n");
        Assert.Equal("fed", Assert.Single(t.Cues).Text);
    }

    [Fact]
    public void Nul_in_webvtt_becomes_the_replacement_character()
    {
        // W3C WebVTT parser algorithm, first step: U+0000 NULL is replaced by U+FFFD.
        byte[] bytes = [.. "WEBVTT\n\n00:00.000 --> 00:01.000\nnul"u8, 0, .. "here\n"u8];
        var r = TranscriptFile.Read(Reads.TempFile(bytes, ".vtt"));
        Assert.Equal("nul\uFFFDhere", r.Transcript!.Cues[0].Text);
        var w = Assert.Single(r.Diagnostics);
        Assert.Equal(4, w.At.Line);
        Assert.Contains("replaced by U+FFFD", w.Message);
        // Other formats have no such rule: a NUL still means binary.
        Assert.Contains("binary", Reads.SingleError(TranscriptFile.Read(Reads.TempFile([.. "1\n00:00:01,000 --> 00:00:02,000\nx"u8, 0], ".srt"))).Message);
    }

    [Fact]
    public void Utf32_with_bom_is_read_not_called_utf16()
    {
        // Unicode Standard section 23.8 (from memory): UTF-32 BOMs are FF FE 00 00 (LE) and 00 00 FE FF (BE).
        foreach (var encoding in new[] { new UTF32Encoding(false, true), new UTF32Encoding(true, true) })
        {
            byte[] bytes = [.. encoding.GetPreamble(), .. encoding.GetBytes(Samples.Srt)];
            var r = TranscriptFile.Read(Reads.TempFile(bytes, ".srt"));
            Assert.True(r.Accepted, string.Join("; ", r.Diagnostics));
            Assert.Equal(Samples.Srt, r.Text);
        }
    }

    [Fact]
    public void Srt_end_time_with_trailing_text_keeps_the_cue()
    {
        var r = TranscriptFile.Parse("q.srt", "1\n00:01:18,000 --> 00:01:20,000?\nOnly cue.\n");
        Assert.Equal("Only cue.", r.Transcript!.Cues[0].Text);
        Assert.Equal("?", r.Transcript.Cues[0].Settings);
        Assert.Contains("kept as the cue's settings", Assert.Single(r.Diagnostics).Message);
    }

    [Fact]
    public void Unclosed_class_tag_keeps_its_words_as_text()
    {
        // Deliberate (FORMATS.md): the spec's tokenizer would take "That's awesome!</c" as the tag's
        // annotation and show nothing; an archive keeps the words.
        var r = TranscriptFile.Parse("c.vtt", "WEBVTT\n\n00:00.000 --> 00:01.000\n<c.first That's awesome!</c>\n");
        Assert.Equal("<c.first That's awesome!", r.Transcript!.Cues[0].Text);
        Assert.Contains("no closing '>'", Assert.Single(r.Diagnostics).Message);
    }
}
