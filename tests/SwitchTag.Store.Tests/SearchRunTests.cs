using System.Text.Json;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Store.Tests;

/// <summary><c>switchtag search</c>'s work past argument parsing: the options made into a query, the
/// store searched and the hits printed. SearchCommandTests runs the command itself.</summary>
public class SearchRunTests
{
    [Fact]
    public void Json_prints_one_object_per_hit_and_per_line_with_the_contract_fields()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        using (var store = CollectionStore.Open(dir.Path)) store.Save(index, "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        var output = new StringWriter();
        var query = SearchQuery.From("Warszawie", null, null, null, null, null, out _)!;
        Assert.Equal(SearchRunResult.Searched, SearchRun.Execute(dir.Path, query, json: true, output, TextWriter.Null));
        var lines = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(index.Headings.Single(h => h.Id == new HeadingId("loc-g756135")).Mentions.Length, lines.Length);
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
    public void Bad_options_make_no_query_and_a_folder_without_a_store_is_refused()
    {
        using var dir = new TempDir();
        Assert.Null(SearchQuery.From("x", null, null, null, null, 5, out var usage));
        Assert.Contains("--km", usage);
        Assert.Null(SearchQuery.From("x", "CITY", null, null, null, null, out usage));
        Assert.Contains("--label", usage);
        Assert.Null(SearchQuery.From("", null, null, null, null, null, out usage));
        Assert.Contains("QUERY", usage);
        var log = new StringWriter();
        Assert.Equal(SearchRunResult.NoReadableStore, SearchRun.Execute(dir.Path, new SearchQuery("x"), json: false, TextWriter.Null, log));
        Assert.Contains(dir.Path, log.ToString());
        Assert.Empty(Directory.GetFiles(dir.Path));
    }
}
