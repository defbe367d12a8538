using System.Text.Json;
using Microsoft.Data.Sqlite;
using SwitchTag.Pipeline;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Store.Tests;

/// <summary>Index runs into a store, on the demo transcripts with the real stages (rules-only names,
/// so no name model is needed).</summary>
public class CollectionRunTests
{
    private static readonly string Demo = Path.Combine(TestPaths.RepoRoot, "transcripts-demo");

    private static string[] DemoFiles(string into)
    {
        Directory.CreateDirectory(into);
        return Directory.GetFiles(Demo).Where(f => !f.EndsWith("README.md", StringComparison.Ordinal)).Order(StringComparer.Ordinal)
            .Select(f => { string copy = Path.Combine(into, Path.GetFileName(f)); File.Copy(f, copy); return copy; }).ToArray();
    }

    private static (int Code, string Log) Index(string[] paths, string outDir, int jobs = 0, bool force = false, bool prune = false)
    {
        var request = new IndexRequest([.. paths], outDir, null, "en", TaggingMode.RulesOnly, null, [], [], Jobs: jobs, Force: force, Prune: prune);
        var log = new StringWriter();
        int code = IndexRun.Execute(request, log) switch { IndexRunResult.Indexed => 0, IndexRunResult.InputsRejected => 1, _ => 2 };
        return (code, log.ToString());
    }

    [Fact]
    public void One_worker_and_two_make_byte_identical_files_and_the_same_store_rows()
    {
        using var dir = new TempDir();
        var files = DemoFiles(Path.Combine(dir.Path, "in"));
        string one = Path.Combine(dir.Path, "one"), two = Path.Combine(dir.Path, "two");
        Assert.Equal(0, Index(files, one, jobs: 1).Code);
        Assert.Equal(0, Index(files, two, jobs: 2).Code);
        var written = Directory.GetFiles(one, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(one, f))
            .Where(f => !f.EndsWith(".sqlite", StringComparison.Ordinal)).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(written, Directory.GetFiles(two, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(two, f))
            .Where(f => !f.EndsWith(".sqlite", StringComparison.Ordinal)).Order(StringComparer.Ordinal));
        Assert.Equal(files.Length * Output.OutputWriters.Default.Interview.Count + Output.OutputWriters.Default.Collection.Count, written.Count);
        foreach (var f in written) Assert.True(File.ReadAllBytes(Path.Combine(one, f)).SequenceEqual(File.ReadAllBytes(Path.Combine(two, f))), f);
        Assert.Equal(StoreDump.Of(one), StoreDump.Of(two));
    }

    [Fact]
    public void An_unchanged_interview_is_skipped_a_changed_or_forced_one_redone()
    {
        using var dir = new TempDir();
        var files = DemoFiles(Path.Combine(dir.Path, "in"));
        string outDir = Path.Combine(dir.Path, "out");
        Index(files, outDir);
        string report = Path.Combine(outDir, "lindner-1987", "index.json");
        var before = File.GetLastWriteTimeUtc(report);
        var (_, log) = Index(files, outDir);
        Assert.Equal(files.Length, log.Split('\n').Count(l => l.StartsWith("unchanged, skipped", StringComparison.Ordinal)));
        Assert.Contains($"0 of {files.Length} interviews indexed, {files.Length} unchanged", log);
        Assert.Equal(before, File.GetLastWriteTimeUtc(report));

        File.AppendAllText(files[0], "\n");
        (_, log) = Index(files, outDir);
        Assert.Contains($"1 of {files.Length} interviews indexed, {files.Length - 1} unchanged", log);
        (_, log) = Index(files, outDir, force: true);
        Assert.Contains($"{files.Length} of {files.Length} interviews indexed, 0 unchanged", log);
    }

    [Fact]
    public void The_collection_covers_every_interview_in_the_store_and_a_removed_source_stays_until_pruned()
    {
        using var dir = new TempDir();
        var files = DemoFiles(Path.Combine(dir.Path, "in"));
        string outDir = Path.Combine(dir.Path, "out");
        // Two runs, each with half the files: the collection lists all of them.
        Index(files[..2], outDir);
        Index(files[2..], outDir);
        var names = files.Select(f => Path.GetFileNameWithoutExtension(f)!).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(names, CollectionInterviews(outDir));
        string html = File.ReadAllText(Path.Combine(outDir, "collection.html"));
        foreach (var name in names)
        {
            // DESIGN.md second-round contract: collection.html links each interview's index.html relatively.
            Assert.Contains($"<a href=\"{name}/index.html\">", html);
            Assert.True(File.Exists(Path.Combine(outDir, name, "index.html")));
            Assert.True(File.Exists(Path.Combine(outDir, name, "index.tei.xml")));
        }

        File.Delete(files[0]);
        string gone = Path.GetFileNameWithoutExtension(files[0])!;
        var (_, log) = Index(files[1..], outDir);
        Assert.Contains("kept in the collection (--prune removes it)", log);
        Assert.Equal(names, CollectionInterviews(outDir));
        (_, log) = Index(files[1..], outDir, prune: true);
        Assert.Contains("pruned from the collection", log);
        Assert.Equal(names.Where(n => n != gone), CollectionInterviews(outDir));
        Assert.False(Directory.Exists(Path.Combine(outDir, gone)));
    }

    [Fact]
    public void Every_demo_export_is_valid_and_holds_every_word_of_every_turn()
    {
        using var dir = new TempDir();
        var files = DemoFiles(Path.Combine(dir.Path, "in"));
        string outDir = Path.Combine(dir.Path, "out");
        Index(files, outDir);
        foreach (var file in files)
        {
            string folder = Path.Combine(outDir, Path.GetFileNameWithoutExtension(file));
            var utterances = TeiCheck.Utterances(Path.Combine(folder, "index.tei.xml"));
            using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "index.json")));
            var turns = json.RootElement.GetProperty("turns").EnumerateArray().Select(t => t.GetProperty("text").GetString()!).ToList();
            Assert.Equal(turns.Count, utterances.Count);
            for (int t = 0; t < turns.Count; t++)
            {
                Assert.Equal(TeiCheck.AsXmlReads(turns[t]), utterances[t]);
                foreach (var word in turns[t].Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries))
                    Assert.Contains(word, utterances[t]);
            }
        }
    }

    [Fact]
    public void Search_finds_the_inflected_place_across_the_demo_collection()
    {
        using var dir = new TempDir();
        string outDir = Path.Combine(dir.Path, "out");
        Index(DemoFiles(Path.Combine(dir.Path, "in")), outDir);
        using var store = CollectionStore.Open(outDir);
        // kowalczyk-1998.vtt writes both "Kraków" and the Polish locative "Krakowie" (Polish grammar, from memory).
        var hits = store.Search(new SearchQuery("Krakowie"));
        Assert.Contains(hits, h => h.Match == "Kraków" && h.Label == Core.Documents.NameLabel.LOC && h.Place?.GeonameId == 3094802);
        Assert.Contains(hits, h => h.Match == "Krakowie");
        Assert.All(hits, h => Assert.Equal("kowalczyk-1998", h.Interview));
    }

    private static List<string> CollectionInterviews(string outDir)
    {
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "collection.json")));
        return json.RootElement.GetProperty("interviews").EnumerateArray().Select(i => i.GetProperty("interview").GetString()!).ToList();
    }
}

/// <summary>Every row of every table of a store as text, leaving out <c>indexed_at</c> (the wall-clock
/// time of each save, the one value two equal runs do not share).</summary>
public static class StoreDump
{
    public static string Of(string dir)
    {
        using var connection = new SqliteConnection($"Data Source={CollectionStore.FindFile(dir)};Pooling=False;Mode=ReadOnly");
        connection.Open();
        var tables = new List<string>();
        using (var list = connection.CreateCommand())
        {
            list.CommandText = "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'search_fts%' ORDER BY name";
            using var reader = list.ExecuteReader();
            while (reader.Read()) tables.Add(reader.GetString(0));
        }
        var dump = new System.Text.StringBuilder();
        foreach (var table in tables)
        {
            using var command = connection.CreateCommand();
            command.CommandText = $"SELECT * FROM {table}";
            using var reader = command.ExecuteReader();
            var rows = new List<string>();
            while (reader.Read())
            {
                var row = new System.Text.StringBuilder(table);
                for (int c = 0; c < reader.FieldCount; c++)
                    if (reader.GetName(c) != "indexed_at") row.Append('|').Append(reader.IsDBNull(c) ? "null" : Convert.ToString(reader.GetValue(c), System.Globalization.CultureInfo.InvariantCulture));
                rows.Add(row.ToString());
            }
            foreach (var row in rows.Order(StringComparer.Ordinal)) dump.Append(row).Append('\n');
        }
        return dump.ToString();
    }
}
