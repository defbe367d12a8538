using SwitchTag.Core.Documents;
using Xunit;

namespace SwitchTag.Formats.Tests;

public class SpeakerAndDetectionTests
{
    [Theory]
    [InlineData("INTERVIEWER")]
    [InlineData("Interviewer:")]
    [InlineData(" interviewer ")]
    [InlineData("interviewer  :")]
    public void Case_spacing_and_trailing_colon_fold_to_one_label(string raw) =>
        Assert.Equal("Interviewer", SpeakerLabels.Normalise(raw));

    [Theory]
    [InlineData("MARIA  DE LA\tCRUZ", "Maria De La Cruz")]
    [InlineData("jean-paul", "Jean-Paul")]
    [InlineData("ŁUKASZ", "Łukasz")]
    [InlineData("  ", null)]
    [InlineData(null, null)]
    public void Words_are_capitalised_and_blank_labels_are_null(string? raw, string? expected) =>
        Assert.Equal(expected, SpeakerLabels.Normalise(raw));

    [Theory]
    [InlineData("WEBVTT\n\n00:01.000 --> 00:02.000\nx", ".txt", "webvtt")]
    [InlineData("\n\nWEBVTT\tcaptions", null, "webvtt")]
    [InlineData("1\n00:00:01,000 --> 00:00:02,000\nx", ".vtt", "srt")]
    [InlineData("[00:00:01] A: x", ".md", "markdown")]
    [InlineData("[00:00:01] A: x", ".txt", "text")]
    [InlineData("[00:00:01] A: x", null, "text")]
    [InlineData("# Title\n\n[00:00:01] A: x", ".txt", "markdown")]
    [InlineData("- **00:00:01** A: x", null, "markdown")]
    [InlineData("WEBVTTX\n00:01.000 --> 00:02.000", null, "srt")]
    [InlineData("[00:00:04] MIRIAM: on the second of October,\n1987. Mister Lindner, thank you.", ".txt", "text")]
    [InlineData("[00:00:04] MIRIAM: we left\n- and then we came back", ".txt", "text")]
    [InlineData("hello", ".vtt", null)]
    [InlineData("", ".vtt", null)]
    public void Format_comes_from_content_with_the_extension_as_a_hint(string text, string? extension, string? expected) =>
        Assert.Equal(expected, TranscriptReaders.Default.Detect(text, extension)?.Format.Name);

    [Fact]
    public void Forced_format_overrides_detection()
    {
        var t = Reads.Accepted("x.txt", "[00:00:01] A: **bold**", TranscriptFormat.Markdown);
        Assert.Equal(TranscriptFormat.Markdown, t.Source.Format);
        Assert.Equal("bold", t.Cues[0].Text);
        Assert.Equal("**bold**", Reads.Accepted("x.txt", "[00:00:01] A: **bold**", TranscriptFormat.Text).Cues[0].Text);
    }

    [Fact]
    public void Known_extensions_are_the_documented_five() =>
        Assert.Equal([".vtt", ".srt", ".txt", ".md", ".markdown"], TranscriptFile.KnownExtensions);

    [Fact]
    public void Expand_walks_folders_sorted_skips_notes_and_reports_hidden_entries_and_missing_paths()
    {
        var root = Path.Combine(Path.GetTempPath(), "switchtag-expand-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path.Combine(root, "b"));
        Directory.CreateDirectory(Path.Combine(root, ".hidden"));
        foreach (var f in new[] { "b/z.srt", "a.VTT", "c.md", "README.md", "notes.json", ".hidden/h.txt" })
            File.WriteAllText(Path.Combine(root, f), "x");
        var problems = new List<Diagnostic>();
        var missing = Path.Combine(root, "missing.vtt");
        var files = TranscriptFile.Expand([root, Path.Combine(root, "c.md"), missing, Path.Combine(root, "notes.json")], problems).ToList();
        Assert.Equal([Path.Combine(root, "a.VTT"), Path.Combine(root, "b", "z.srt"), Path.Combine(root, "c.md"), Path.Combine(root, "notes.json")], files);
        Assert.Equal(2, problems.Count);
        // The hidden folder is not walked, and said so (InputWalkingTests has the details).
        Assert.Equal((new SourceLine(root, TranscriptFile.WholeFile), Severity.Warning), (problems[0].At, problems[0].Severity));
        Assert.Contains(Path.Combine(root, ".hidden"), problems[0].Message);
        Assert.Equal((new SourceLine(missing, TranscriptFile.WholeFile), Severity.Error), (problems[1].At, problems[1].Severity));
    }
}
