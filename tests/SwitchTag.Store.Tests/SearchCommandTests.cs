using System.Text.Json;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Store.Tests;

/// <summary>The <c>switchtag search</c> command run as a process: its options and exit codes (DESIGN.md:
/// 0 success, 1 inputs rejected, 2 usage error). What it does past the options is tested in SearchRunTests.</summary>
// One collection: child processes would otherwise compete for the CPU with those of SignalTests.
[Collection("child processes")]
public class SearchCommandTests
{
    private static (int Exit, string Output) Run(params string[] args)
    {
        using var process = new System.Diagnostics.Process { StartInfo = BuiltCli.Start(["search", .. args]) };
        process.Start();
        var errors = process.StandardError.ReadToEndAsync();
        string output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        _ = errors.Result;
        return (process.ExitCode, output);
    }

    [Fact]
    public void Json_prints_one_object_per_hit_and_per_line()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        using (var store = CollectionStore.Open(dir.Path)) store.Save(index, "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        var (exit, output) = Run("Warszawie", "--in", dir.Path, "--json");
        Assert.Equal(0, exit);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(index.Headings.Single(h => h.Id == new HeadingId("loc-g756135")).Mentions.Length, lines.Length);
        foreach (var line in lines)
        {
            using var json = JsonDocument.Parse(line);
            Assert.Equal("anna-nowak", json.RootElement.GetProperty("interview").GetString());
        }
    }

    [Fact]
    public void Bad_options_are_usage_errors_and_a_folder_without_a_store_is_refused()
    {
        using var dir = new TempDir();
        Assert.Equal(2, Run("x", "--in", dir.Path, "--km", "5").Exit);
        Assert.Equal(2, Run("x", "--in", dir.Path, "--label", "CITY").Exit);
        Assert.Equal(2, Run("--in", dir.Path).Exit);
        Assert.Equal(1, Run("x", "--in", dir.Path).Exit);
        Assert.Empty(Directory.GetFiles(dir.Path));
    }
}
