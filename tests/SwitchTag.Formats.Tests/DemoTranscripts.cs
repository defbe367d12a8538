using SwitchTag.Core.Documents;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>The invented demo interviews in transcripts-demo/. A missing folder, an empty one or a
/// rejected file fails the test that asked, with a plain message, rather than leaving it nothing to check.</summary>
public static class DemoTranscripts
{
    public static string Folder => Path.Combine(TestPaths.RepoRoot, "transcripts-demo");

    public static List<string> Files()
    {
        Assert.True(Directory.Exists(Folder), $"the demo folder {Folder} is missing");
        var problems = new List<Diagnostic>();
        List<string> files = [.. TranscriptFile.Expand([Folder], problems)];
        Assert.True(files.Count > 0, $"no transcripts in {Folder}");
        return files;
    }

    public static List<Transcript> ReadAll() => Files().Select(f =>
    {
        var read = TranscriptFile.Read(f);
        Assert.True(read.Transcript is not null, $"{f}: the demo transcript was rejected: {string.Join("; ", read.Diagnostics)}");
        return read.Transcript!;
    }).ToList();
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
