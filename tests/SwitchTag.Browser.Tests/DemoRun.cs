using System.Text.Json;
using SwitchTag.Pipeline;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Browser.Tests;

/// <summary>The demo interviews indexed once for all browser tests, with a recording path so the
/// report's times are links.</summary>
public sealed class DemoRun : IDisposable
{
    public static string Demo { get; } = Path.Combine(TestPaths.RepoRoot, "transcripts-demo");

    public string OutDir { get; } = Run(Demo, "demo", null, out _);

    /// <summary>Indexes <paramref name="input"/> with the shipped models into a new temp folder.</summary>
    public static string Run(string input, string name, string? decisions, out string log)
    {
        string outDir = Path.Combine(Path.GetTempPath(), $"switchtag-browser-{name}-{Guid.NewGuid():N}");
        var request = IndexRequest.From([input], outDir, null, null, "default", null, decisions, out var usage, media: "../media/{interview}.mp3")
            ?? throw new InvalidOperationException(usage);
        var writer = new StringWriter();
        var result = IndexRun.Execute(request, writer);
        log = writer.ToString();
        if (result == IndexRunResult.NotStarted) throw new InvalidOperationException(log);
        return outDir;
    }

    public static JsonElement Index(string outDir, string interview) =>
        JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, interview, "index.json"))).RootElement;

    public void Dispose()
    {
        if (Directory.Exists(OutDir)) Directory.Delete(OutDir, recursive: true);
    }
}
