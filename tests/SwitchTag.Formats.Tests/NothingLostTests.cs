using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using SwitchTag.Core.Documents;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>DESIGN.md: nothing in the input is dropped silently. For every accepted file, every word of
/// its text content must be found in the cues (text, speaker label, identifier, section) or quoted in
/// a warning. The file's words are found independently of the readers: markup is removed with simple
/// patterns and character references are decoded with System.Net.WebUtility.HtmlDecode (the .NET
/// HTML decoder as the reference).</summary>
public partial class NothingLostTests
{
    public static TheoryData<string> Names() => Samples.Names();

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_word_of_a_sample_reaches_a_cue_or_a_warning(string name)
    {
        var (path, text) = Samples.Get(name);
        Check(TranscriptFile.Parse(path, text), text);
    }

    [Fact]
    public void Every_word_of_a_demo_transcript_reaches_a_cue_or_a_warning()
    {
        foreach (var file in DemoTranscripts.Files())
        {
            var result = TranscriptFile.Read(file);
            Assert.NotNull(result.Transcript);
            Check(result, result.Text!);
        }
    }

    [Fact]
    public void Words_of_unplaced_text_are_in_warnings()
    {
        const string text = "WEBVTT\n\nstray words here\n\n00:01.000 --> 00:02.00\nbroken timing words\n\n00:03.000 --> 00:04.000\nfine\n";
        var result = TranscriptFile.Parse("stray.vtt", text);
        Check(result, text);
        Assert.Equal(2, result.Diagnostics.Length);
    }

    private static void Check(ReadResult result, string text)
    {
        var t = result.Transcript!;
        var found = new HashSet<string>(StringComparer.Ordinal);
        foreach (var cue in t.Cues)
            foreach (var part in new[] { cue.Text, cue.SpeakerLabel, cue.Identifier })
                found.UnionWith(Words(part ?? ""));
        foreach (var d in result.Diagnostics.Where(d => d.Severity == Severity.Warning))
            found.UnionWith(Words(d.Message));
        var missing = Words(Content(text, t.Source.Format)).Where(w => !found.Contains(w)).Distinct().ToList();
        Assert.True(missing.Count == 0, $"{t.Source.Path}: words lost: {string.Join(", ", missing.Take(20))}");
    }

    /// <summary>The file's text content: what a person reads as the transcript, markup and structure removed.</summary>
    private static string Content(string text, TranscriptFormat format)
    {
        var lines = text.ReplaceLineEndings("\n").Split('\n');
        var kept = new StringBuilder();
        bool skipBlock = false, header = format == TranscriptFormat.WebVtt;
        foreach (var line in lines)
        {
            if (line.Trim().Length == 0) { skipBlock = false; header = false; continue; }
            if (header) continue;
            if (format == TranscriptFormat.WebVtt && Regex.IsMatch(line, "^(NOTE|STYLE|REGION)([ \t]|$)")) skipBlock = true;
            if (skipBlock || line.Contains("-->")) continue;
            if (format == TranscriptFormat.Markdown && Regex.IsMatch(line, "^ {0,3}#{1,6}( |$)")) continue;
            kept.Append(line).Append('\n');
        }
        string s = kept.ToString();
        if (format == TranscriptFormat.Markdown) s = LinkDestination().Replace(s, "]");
        if (format == TranscriptFormat.WebVtt || format == TranscriptFormat.Srt) s = Tag().Replace(s, " ");
        if (format == TranscriptFormat.Srt) s = OverrideCode().Replace(s, " ");
        if (format != TranscriptFormat.Srt) s = WebUtility.HtmlDecode(s);
        return s;
    }

    /// <summary>Runs of letters (combining marks included); numbers, punctuation and symbols are not words here.</summary>
    private static IEnumerable<string> Words(string s) =>
        WordPattern().Matches(s).Select(m => m.Value);

    [GeneratedRegex(@"[\p{L}\p{M}]+")]
    private static partial Regex WordPattern();

    [GeneratedRegex(@"<[^<>]*>")]
    private static partial Regex Tag();

    [GeneratedRegex(@"\{\\[^}]*\}")]
    private static partial Regex OverrideCode();

    [GeneratedRegex(@"\]\([^)]*\)")]
    private static partial Regex LinkDestination();
}
