using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output.AnnotatedVtt;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.Tests;

/// <summary>annotated.vtt reads back to the text it was written from (issue reproduction: whitespace-only
/// lines inside a cue became cue ends, and "&amp;#13;&amp;#13;" glued two words). Character references
/// are those of W3C WebVTT cue text (HTML numeric character references).</summary>
public class AnnotatedVttRoundTripTests
{
    [Fact]
    public void Carriage_returns_and_blank_or_whitespace_lines_survive_writing_and_reading()
    {
        const string source = "WEBVTT\n\n"
            + "00:01.000 --> 00:02.000\nonly&#13;&#13;between\n\n"
            + "00:02.000 --> 00:03.000\n<v Anna>first&#10; &#10;after a whitespace line\n\n"
            + "00:03.000 --> 00:04.000\n&#10;&#10;leading breaks, a blank line&#10;&#10;and a trailing space&#32;\n\n"
            + "00:04.000 --> 00:05.000\nplain\nsecond line\n";
        var transcript = TranscriptFile.Parse("rt.vtt", source).Transcript!;
        Assert.Equal("only\r\rbetween", transcript.Cues[0].Text);
        Assert.Equal("first\n \nafter a whitespace line", transcript.Cues[1].Text);

        var index = new InterviewPipeline(Fixture.Segmenter(), Fixture.Tagger(), new IndexBuilder(Fixture.Lexicon())).Run(transcript, new LanguageCode("en"));
        string written = AnnotatedVttWriter.Render(index);
        Assert.Contains("plain\nsecond line", written); // a break between two lines of text stays a line break
        var reread = TranscriptFile.Parse("annotated.vtt", written, TranscriptFormat.WebVtt);
        Assert.True(reread.Accepted, string.Join("\n", reread.Diagnostics));
        Assert.Equal(transcript.Cues.Select(c => c.Text), reread.Transcript!.Cues.Select(c => c.Text));
        Assert.Equal(transcript.Cues.Select(c => c.Time), reread.Transcript.Cues.Select(c => c.Time));
    }
}
