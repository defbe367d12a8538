using SwitchTag.Core.Time;
using System.Text.Json;
using Microsoft.Data.Sqlite;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Output;
using Xunit;

namespace SwitchTag.Store.Tests;

public class StoreTests
{
    [Fact]
    public void The_store_is_one_sqlite_file_in_the_output_folder_at_the_current_schema_version()
    {
        using var dir = new TempDir();
        using (var store = CollectionStore.Open(dir.Path)) store.Save(Interviews.Small(), "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        // DESIGN.md second-round contract: one SQLite file directly in the output folder; no WAL files left.
        Assert.Equal([CollectionStore.DefaultFileName], Directory.GetFiles(dir.Path).Select(Path.GetFileName));
        // SQLite file format (sqlite.org/fileformat.html): every database starts with "SQLite format 3\0".
        Assert.Equal("SQLite format 3\0"u8.ToArray(), File.ReadAllBytes(Path.Combine(dir.Path, CollectionStore.DefaultFileName))[..16]);
        using var connection = new SqliteConnection($"Data Source={Path.Combine(dir.Path, CollectionStore.DefaultFileName)};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT version FROM schema_version";
        Assert.Equal((long)CollectionStore.SchemaVersion, command.ExecuteScalar());
    }

    [Fact]
    public void A_store_from_a_newer_schema_is_refused_not_changed()
    {
        using var dir = new TempDir();
        using (CollectionStore.Open(dir.Path)) { }
        string file = Path.Combine(dir.Path, CollectionStore.DefaultFileName);
        using (var connection = new SqliteConnection($"Data Source={file};Pooling=False"))
        {
            connection.Open();
            using var command = connection.CreateCommand();
            command.CommandText = "UPDATE schema_version SET version = 999";
            command.ExecuteNonQuery();
        }
        var error = Assert.Throws<InvalidDataException>(() => CollectionStore.Open(dir.Path));
        Assert.Contains("999", error.Message);
    }

    [Fact]
    public void The_collection_read_back_equals_what_the_index_holds()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        using var store = CollectionStore.Open(dir.Path);
        store.Save(index, "anna-nowak", "m1", [new StoredDecision("reject x", 2)], DateTimeOffset.UnixEpoch);
        var expected = CollectionEntry.From(index, "anna-nowak");
        var stored = Assert.Single(store.Collection());
        Assert.Equal(expected.Interview, stored.Name);
        Assert.Equal(expected.Folder, stored.Folder);
        Assert.Equal(expected.Duration, stored.Duration - Timecode.Zero);
        Assert.Equal(expected.Headings.Select(h => (h.Id, h.Label, h.Name, h.Place, string.Join(",", h.Times))),
            stored.Headings.Select(h => (h.Id, h.Label, h.Name, h.Place, string.Join(",", h.Times))));
        Assert.Equal(2, store.Decisions(index.Transcript.Source.Path)["reject x"]);
    }

    [Fact]
    public void Saving_again_replaces_and_removing_leaves_nothing_behind()
    {
        using var dir = new TempDir();
        using var store = CollectionStore.Open(dir.Path);
        var index = Interviews.Small();
        store.Save(index, "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        var once = store.Counts();
        store.Save(index, "anna-nowak", "m2", [], DateTimeOffset.UnixEpoch);
        Assert.Equal(once, store.Counts());
        Assert.Equal(index.Turns.Length, once["turns"]);
        Assert.Equal(index.Mentions.Length, once["mentions"]);
        Assert.True(store.ShouldSkip(index.Transcript.Source.Path, index.Transcript.Source.Sha256, "m2"));
        Assert.False(store.ShouldSkip(index.Transcript.Source.Path, index.Transcript.Source.Sha256, "m1"));
        Assert.True(store.Remove(index.Transcript.Source.Path));
        Assert.All(store.Counts().Values, n => Assert.Equal(0, n));
        Assert.Empty(store.Search(new SearchQuery("Warsaw")));
    }

    [Fact]
    public void An_inflected_form_finds_the_heading_and_the_heading_finds_inflected_text()
    {
        using var dir = new TempDir();
        using var store = CollectionStore.Open(dir.Path);
        store.Save(Interviews.Small(), "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        // Polish grammar (from memory): "Warszawie" is the locative of "Warszawa"; "Krakowie" of "Kraków".
        var index = Interviews.Small();
        var warsaw = store.Search(new SearchQuery("Warszawie"));
        int warsawMentions = index.Headings.Single(h => h.Id == new HeadingId("loc-g756135")).Mentions.Length;
        Assert.Equal(warsawMentions, warsaw.Count(h => h.Label == NameLabel.LOC && h.HeadingId == new HeadingId("loc-g756135")));
        Assert.True(warsawMentions >= 4);
        Assert.Contains(warsaw, h => h.Match == "Varsovie");
        var krakow = Assert.Single(store.Search(new SearchQuery("Krakowie")));
        Assert.Equal(("Kraków", "anna-nowak", NameLabel.LOC), (krakow.Match, krakow.Interview, krakow.Label));
        // Case and diacritics folded: the query has neither.
        Assert.Single(store.Search(new SearchQuery("KRAKOW")));
    }

    [Fact]
    public void A_text_hit_carries_its_cue_time_speaker_language_and_sentence()
    {
        using var dir = new TempDir();
        using var store = CollectionStore.Open(dir.Path);
        store.Save(Interviews.Small(), "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        var hit = Assert.Single(store.Search(new SearchQuery("dziecko")));
        Assert.Null(hit.Label);
        Assert.Equal(("Anna Nowak", "pl", 11.0, 16.0), (hit.Speaker, hit.Language.Code, hit.Time.Start.TotalSeconds, hit.Time.End.TotalSeconds));
        Assert.Equal("Mama mówiła: dziecko.", hit.Text);
        Assert.Empty(store.Search(new SearchQuery("dziecko", Label: NameLabel.PER)));
        Assert.Empty(store.Search(new SearchQuery("dziecko", Language: "en")));
        Assert.Empty(store.Search(new SearchQuery("dziecko", Speaker: "Interviewer")));
        Assert.Single(store.Search(new SearchQuery("dziecko", Speaker: "anna nowak")));
    }

    [Fact]
    public void Near_finds_linked_places_within_the_radius()
    {
        using var dir = new TempDir();
        using var store = CollectionStore.Open(dir.Path);
        store.Save(Interviews.Small(), "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        // Warsaw-Kraków is about 250 km, Kraków-Paris about 1,275 km (great circle, from memory).
        var within300 = store.Search(new SearchQuery("", Near: new NearPlace("Kraków", 300)));
        Assert.Contains(within300, h => h.HeadingId == new HeadingId("loc-g756135"));
        Assert.DoesNotContain(within300, h => h.HeadingId == new HeadingId("loc-g2988507"));
        var warsawHit = within300.First(h => h.HeadingId == new HeadingId("loc-g756135"));
        Assert.InRange(warsawHit.DistanceKm!.Value, 240, 260);
        var within100 = store.Search(new SearchQuery("", Near: new NearPlace("Krakowie", 100)));
        Assert.All(within100, h => Assert.Equal(new HeadingId("loc-g3094802"), h.HeadingId));
        Assert.NotEmpty(within100);
    }

    [Fact]
    public void Haversine_distance_matches_published_values()
    {
        // Coordinates: GeoNames cities15000 rows of Warsaw (756135) and Paris (2988507), as in the fixture.
        // Warsaw-Paris great-circle distance about 1,366 km (from memory); one degree of latitude 111.2 km.
        Assert.InRange(GeoDistance.Kilometres(52.22977, 21.01178, 48.85341, 2.3488), 1355, 1375);
        Assert.InRange(GeoDistance.Kilometres(0, 0, 1, 0), 111.1, 111.3);
        Assert.Equal(0, GeoDistance.Kilometres(50, 19, 50, 19), 9);
    }

    [Fact]
    public void Json_hits_are_one_line_with_the_contract_fields()
    {
        using var dir = new TempDir();
        using var store = CollectionStore.Open(dir.Path);
        store.Save(Interviews.Small(), "anna-nowak", "m1", [], DateTimeOffset.UnixEpoch);
        foreach (var hit in store.Search(new SearchQuery("Nowak")).Concat(store.Search(new SearchQuery("dziecko"))))
        {
            string line = hit.ToJson();
            Assert.DoesNotContain('\n', line);
            using var json = JsonDocument.Parse(line);
            var root = json.RootElement;
            // DESIGN.md second-round contract: interview, start, end, speaker, label (null for text), text.
            Assert.Equal("anna-nowak", root.GetProperty("interview").GetString());
            Assert.Equal(hit.Time.Start.TotalSeconds, root.GetProperty("start").GetDouble());
            Assert.Equal(hit.Time.End.TotalSeconds, root.GetProperty("end").GetDouble());
            Assert.Equal(hit.Speaker, root.GetProperty("speaker").GetString());
            Assert.Equal(hit.Label?.ToString(), root.GetProperty("label").GetString());
            Assert.Equal(hit.Text, root.GetProperty("text").GetString());
        }
    }
}
