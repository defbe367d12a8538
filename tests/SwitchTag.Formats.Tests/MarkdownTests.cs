using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

public class MarkdownTests
{
    [Fact]
    public void Reads_paragraph_and_list_entries_with_sections_and_plain_text()
    {
        // CommonMark (from memory of the spec): **strong**, *emphasis*, __strong__, `code`, [text](url)
        // links and &amp; entity references render to their text.
        var t = Samples.Read("markdown");
        Assert.Equal(TranscriptFormat.Markdown, t.Source.Format);
        Assert.Equal(4, t.Cues.Length);
        Assert.Equal("Where were you born?", t.Cues[0].Text);
        Assert.Equal("Interviewer", t.Cues[0].Speaker);
        Assert.Equal("In Sevilla, near the\nriver, Guadalquivir.\nA second paragraph of Maria & her brother.", t.Cues[1].Text);
        Assert.Equal("Maria", t.Cues[1].Speaker);
        Assert.Equal(new TimeRange(Timecode.FromSeconds(4), Timecode.FromSeconds(20)), t.Cues[1].Time);
        Assert.Equal("When did you leave?", t.Cues[2].Text);
        Assert.Equal("In 1936.", t.Cues[3].Text);
        Assert.Equal([5, 7, 14, 15], t.Cues.Select(c => c.At.Line));
        Assert.Empty(t.Diagnostics);
    }

    [Fact]
    public void Raw_range_of_a_cue_covers_its_source_lines()
    {
        var read = Samples.ReadWithText("markdown");
        var cue = read.Transcript!.Cues[1];
        string raw = read.Text![cue.RawStart..cue.RawEnd];
        Assert.StartsWith("**[00:00:04] MARIA:**", raw);
        Assert.EndsWith("Maria &amp; her brother.", raw);
    }

    [Fact]
    public void Text_under_a_heading_before_any_stamp_is_reported()
    {
        var result = TranscriptFile.Parse("h.md", "# Title\n\n[00:00:01] A: one\n\n## Part two\n\nSome notes here.\n\n[00:00:05] A: two\n");
        Assert.Equal(2, result.Transcript!.Cues.Length);
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(7, w.At.Line);
        Assert.Contains("Some notes here.", w.Message);
    }

    [Fact]
    public void Setext_underline_below_an_entry_does_not_swallow_it()
    {
        var t = Reads.Accepted("setext.md", "[00:00:01] A: one\n---\n\n[00:00:05] A: two\n", TranscriptFormat.Markdown);
        Assert.Equal(["one", "two"], t.Cues.Select(c => c.Text));
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r\n")]
    [InlineData("\r")]
    public void Quotes_nested_lists_code_and_html_blocks_keep_their_lines(string newline)
    {
        string text = string.Join(newline,
            "# Tape 1",
            "",
            "> [00:00:01] ANNA: quoted <span>entry</span>",
            "",
            "1. [00:00:05] BEN: numbered",
            "   - [00:00:09] ANNA: nested",
            "",
            "        indented code line",
            "",
            "<div>",
            "an html block",
            "</div>",
            "",
            "[00:00:20] BEN: last",
            "",
            "[00:00:25]");
        var result = TranscriptFile.Parse("blocks.md", text);
        var t = result.Transcript!;
        Assert.Equal(["quoted entry", "numbered", "nested\nindented code line", "last"], t.Cues.Select(c => c.Text));
        Assert.Equal([3, 5, 6, 14], t.Cues.Select(c => c.At.Line));
        Assert.Equal(Timecode.FromSeconds(25), t.Cues[^1].Time.End);
        var w = Assert.Single(result.Diagnostics);
        Assert.Equal(10, w.At.Line);
        Assert.Contains("an html block", w.Message);
        InvariantTests.CheckCues(result);
    }
}
