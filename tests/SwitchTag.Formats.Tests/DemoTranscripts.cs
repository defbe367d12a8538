using SwitchTag.Core.Documents;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>The invented demo interviews in transcripts-demo/, whatever is there when the tests run.</summary>
public static class DemoTranscripts
{
    public static string Folder => Path.Combine(TestPaths.RepoRoot, "transcripts-demo");

    public static List<string> Files()
    {
        var problems = new List<Diagnostic>();
        return Directory.Exists(Folder) ? [.. TranscriptFile.Expand([Folder], problems)] : [];
    }

    public static IEnumerable<Transcript> ReadAll() => Files().Select(f => TranscriptFile.Read(f).Transcript).OfType<Transcript>();
}

public class DemoTranscriptTests
{
    [Fact]
    public void Every_demo_transcript_reads_without_errors()
    {
        foreach (var file in DemoTranscripts.Files())
        {
            var result = TranscriptFile.Read(file);
            Assert.True(result.Transcript is not null, $"{file}: " + string.Join("; ", result.Diagnostics));
            Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Error);
            Assert.NotEmpty(result.Transcript!.Cues);
            // transcripts-demo/README.md names each file's format; the extension agrees with it.
            var expected = Path.GetExtension(file) switch
            {
                ".vtt" => TranscriptFormat.WebVtt,
                ".srt" => TranscriptFormat.Srt,
                ".md" => TranscriptFormat.Markdown,
                _ => TranscriptFormat.Text,
            };
            Assert.Equal(expected, result.Transcript.Source.Format);
        }
    }
}
