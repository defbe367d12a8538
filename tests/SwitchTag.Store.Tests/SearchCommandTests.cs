using System.CommandLine;
using System.Text.Json;
using SwitchTag.Cli;
using Xunit;

namespace SwitchTag.Store.Tests;

public class SearchCommandTests
{
    private static (int Exit, string Output) Run(params string[] args)
    {
        var console = Console.Out;
        var output = new StringWriter();
        try
        {
            Console.SetOut(output);
            int exit = new RootCommand { SearchCommand.Create() }.Parse(["search", .. args]).Invoke();
            return (exit, output.ToString());
        }
        finally
        {
            Console.SetOut(console);
        }
    }

    [Fact]
    public void Json_prints_one_object_per_hit_and_per_line_with_the_contract_fields()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        using (var store = CollectionStore.Open(dir.Path)) store.Save(index, "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        var (exit, output) = Run("Warszawie", "--in", dir.Path, "--json");
        Assert.Equal(0, exit);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(index.Headings.Single(h => h.Id == "loc-g756135").Mentions.Length, lines.Length);
        foreach (var line in lines)
        {
            using var json = JsonDocument.Parse(line);
            var hit = json.RootElement;
            // DESIGN.md second-round contract: interview (folder), start, end (seconds), speaker, label, text.
            Assert.Equal("anna-nowak", hit.GetProperty("interview").GetString());
            Assert.True(hit.GetProperty("end").GetDouble() >= hit.GetProperty("start").GetDouble());
            Assert.Equal(JsonValueKind.String, hit.GetProperty("speaker").ValueKind);
            Assert.Equal("LOC", hit.GetProperty("label").GetString());
            Assert.Contains(hit.GetProperty("match").GetString()!, hit.GetProperty("text").GetString());
            // GeoNames cities15000: Warsaw is 756135.
            Assert.Equal(756135, hit.GetProperty("place").GetProperty("geonameId").GetInt64());
        }
    }

    [Fact]
    public void Bad_options_are_usage_errors_and_a_folder_without_a_store_is_refused()
    {
        using var dir = new TempDir();
        Assert.Equal(ExitCodes.Usage, Run("x", "--in", dir.Path, "--km", "5").Exit);
        Assert.Equal(ExitCodes.Usage, Run("x", "--in", dir.Path, "--label", "CITY").Exit);
        Assert.Equal(ExitCodes.Usage, Run("--in", dir.Path).Exit);
        Assert.Equal(ExitCodes.InputsRejected, Run("x", "--in", dir.Path).Exit);
        Assert.Empty(Directory.GetFiles(dir.Path));
    }
}
