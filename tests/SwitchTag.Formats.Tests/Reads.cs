using SwitchTag.Core.Documents;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Small helpers around <see cref="TranscriptFile"/> for the tests.</summary>
public static class Reads
{
    public static Transcript Accepted(string path, string text, TranscriptFormat? forced = null) => AcceptedRead(path, text, forced).Transcript!;

    /// <summary>The whole read result, for checks against the file's text.</summary>
    public static ReadResult AcceptedRead(string path, string text, TranscriptFormat? forced = null)
    {
        var result = TranscriptFile.Parse(path, text, forced);
        Assert.True(result.Transcript is not null, "rejected: " + string.Join("; ", result.Diagnostics));
        Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Error);
        return result;
    }

    public static Diagnostic SingleError(ReadResult result)
    {
        Assert.Null(result.Transcript);
        return Assert.Single(result.Diagnostics, d => d.Severity == Severity.Error);
    }

    public static IEnumerable<Diagnostic> Warnings(ReadResult result) => result.Diagnostics.Where(d => d.Severity == Severity.Warning);

    public static string TempFile(byte[] bytes, string extension)
    {
        var dir = Path.Combine(Path.GetTempPath(), "switchtag-formats-tests");
        Directory.CreateDirectory(dir);
        var path = Path.Combine(dir, Guid.NewGuid().ToString("N") + extension);
        File.WriteAllBytes(path, bytes);
        return path;
    }
}
