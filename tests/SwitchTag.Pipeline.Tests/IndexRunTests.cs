using System.Collections.Immutable;
using System.Text.Json;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

public class IndexRunTests
{
    [Fact]
    public void A_rejected_input_is_reported_with_file_and_line_and_the_run_goes_on()
    {
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-cmd-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string bad = Path.Combine(dir, "broken.srt");
            File.WriteAllText(bad, "not a transcript\n");
            string good = Path.Combine(TestPaths.RepoRoot, "transcripts-demo", "kowalczyk-1998.vtt");
            var request = new IndexRequest([bad, good], Path.Combine(dir, "out"), null, null, TaggingMode.RulesOnly, null, [], []);
            var log = new StringWriter();
            var result = IndexRun.Execute(request, log);
            // DESIGN.md "Contracts": exit 1 when some inputs were rejected, each with a reason.
            Assert.Equal(IndexRunResult.InputsRejected, result);
            Assert.Contains($"{bad}:1: error:", log.ToString());
            using var index = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "out", "kowalczyk-1998", "index.json")));
            Assert.Equal("switchtag.index/1", index.RootElement.GetProperty("schema").GetString());
            using var collection = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "out", "collection.json")));
            Assert.Single(collection.RootElement.GetProperty("interviews").EnumerateArray());
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    [Fact]
    public void Bad_options_are_usage_errors()
    {
        Assert.Null(IndexRequest.From(["x"], "out", "docx", null, "default", null, null, out var usage));
        Assert.Contains("--format", usage);
        Assert.Null(IndexRequest.From(["x"], "out", null, null, "everything", null, null, out usage));
        Assert.Contains("--names", usage);
        Assert.Null(IndexRequest.From(["x"], "out", null, "English", "default", null, null, out usage));
        Assert.Contains("--main", usage);
        Assert.NotNull(IndexRequest.From(["x"], "out", "srt", "pl", "rules-only", null, null, out _));
    }
}
