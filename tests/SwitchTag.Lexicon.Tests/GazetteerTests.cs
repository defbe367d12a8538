using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Tests.Shared;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.Tests;

/// <summary>Lookups checked against the shared GeoNames extract
/// (../shared/data/gazetteer/geonames-cities15000.txt): ids and coordinates are read from that file.</summary>
public class GazetteerTests(GeoNamesFixture data) : IClassFixture<GeoNamesFixture>
{
    private readonly Gazetteer _g = data.Loaded;

    [Fact]
    public void Saved_file_reads_back_identical()
    {
        Assert.Empty(data.Loaded.Problems);
        Assert.Equal(data.Built.Places, data.Loaded.Places);
        Assert.Equal(data.Built.NameCount, data.Loaded.NameCount);
        Assert.Equal(data.Built.Cautions, data.Loaded.Cautions);
    }

    [Theory]
    [InlineData("Warsaw", "en")]
    [InlineData("Warszawa", "pl")]
    [InlineData("Warszawy", "pl")]
    [InlineData("Warszawie", "pl")]
    [InlineData("Warschau", "de")]
    [InlineData("Varsovie", "fr")]
    [InlineData("Варшава", "ru")]
    [InlineData("Варшаве", "ru")]
    [InlineData("Warszawie", "en")] // no English rule: the fallback tries the others
    public void Warsaw_is_found_under_its_names_and_case_forms(string name, string language)
    {
        var warsaw = GeoNamesFixture.Row(GeoNamesFixture.IdOf("Warsaw"));
        var top = _g.Lookup(name, new LanguageCode(language))[0];
        Assert.Equal(warsaw.Id, top.GeonameId);
        Assert.Equal(warsaw.Lat, top.Latitude);
        Assert.Equal(warsaw.Lon, top.Longitude);
        Assert.Equal(warsaw.Country, top.Country);
    }

    [Theory]
    [InlineData("Lwów", "pl")]
    [InlineData("Lwowa", "pl")]
    [InlineData("Lemberg", "de")]
    [InlineData("Львів", "uk")]
    [InlineData("Львова", "uk")]
    [InlineData("Львове", "ru")]
    public void Lviv_is_found_under_its_names_and_case_forms(string name, string language)
    {
        var lviv = GeoNamesFixture.Row(GeoNamesFixture.IdOf("L'viv"));
        Assert.Equal("UA", lviv.Country);
        Assert.Contains(_g.Lookup(name, new LanguageCode(language)), p => p.GeonameId == lviv.Id);
    }

    [Theory]
    [InlineData("Krakowie", "pl", "Kraków")]
    [InlineData("Krakowa", "pl", "Kraków")]
    [InlineData("Budapesten", "hu", "Budapest")]
    [InlineData("Budapestre", "hu", "Budapest")]
    [InlineData("Vilniuje", "lt", "Vilnius")]
    [InlineData("Москве", "ru", "Moscow")]
    [InlineData("Berlins", "de", "Berlin")]
    [InlineData("Praze", "cs", "Prague")]
    public void Inflected_forms_find_the_city(string form, string language, string mainName)
    {
        long id = GeoNamesFixture.IdOf(mainName);
        Assert.Equal(id, _g.Lookup(form, new LanguageCode(language))[0].GeonameId);
        Assert.Equal(MatchKind.Inflected, _g.Candidates(form, new LanguageCode(language))[0].Kind);
    }

    [Fact]
    public void Lookup_returns_every_candidate_most_populous_first()
    {
        // GeoNames has several populated places named Paris (France, Texas, ...).
        var all = _g.Lookup("Paris", new LanguageCode("en"));
        Assert.True(all.Count > 1);
        Assert.Equal(GeoNamesFixture.IdOf("Paris"), all[0].GeonameId);
        Assert.Equal(all.OrderByDescending(p => p.Population).Select(p => p.Population), all.Select(p => p.Population));
    }

    [Fact]
    public void Lookup_of_nonsense_is_empty()
    {
        Assert.Empty(_g.Lookup("Xqzvwk", new LanguageCode("pl")));
        Assert.Empty(_g.Lookup("", new LanguageCode("pl")));
        Assert.Empty(_g.Lookup("  ,. ", new LanguageCode("en")));
    }

    [Fact]
    public void Find_tags_capitalised_place_names_with_offsets()
    {
        const string text = "After the war we moved from Warszawa to Nowy Sącz, then to New York.";
        var matches = _g.Find(text, new LanguageCode("pl"));
        Assert.Equal(["Warszawa", "Nowy Sącz", "New York"], matches.Select(m => text[m.CharStart..m.CharEnd]));
        Assert.All(matches, m => Assert.Equal(NameLabel.LOC, m.Label));
        Assert.All(matches, m => Assert.Equal(MentionSource.Gazetteer, m.Source));
        Assert.Equal("Warsaw", matches[0].Canonical);
    }

    [Fact]
    public void Find_follows_case_endings_of_the_text_language()
    {
        const string text = "Mieszkaliśmy w Warszawie, potem w Krakowie.";
        var found = _g.Find(text, new LanguageCode("pl")).Select(m => (text[m.CharStart..m.CharEnd], m.Canonical)).ToList();
        Assert.Equal([("Warszawie", "Warsaw"), ("Krakowie", "Kraków")], found);
    }

    [Fact]
    public void Find_skips_stop_words_lower_case_words_and_common_words_at_sentence_start()
    {
        // "Of" (Turkey) and "Nice" (France) are GeoNames places; "nice" is a common English word.
        Assert.Contains(_g.Lookup("Of", new LanguageCode("en")), p => p.Country == "TR");
        Assert.Contains(_g.Lookup("Nice", new LanguageCode("en")), p => p.Country == "FR");
        Assert.True(_g.Cautions["nice"].HasFlag(NameCaution.CommonWord));
        Assert.Empty(_g.Find("Nice to meet you. Of course.", new LanguageCode("en")));
        Assert.Empty(_g.Find("we went to paris", new LanguageCode("en")));
        const string text = "We spent a week in Nice.";
        Assert.Equal("Nice", Assert.Single(_g.Find(text, new LanguageCode("en"))).Canonical);
    }

    [Fact]
    public void Person_names_that_are_also_places_are_not_tagged_alone()
    {
        // David (Panama) is a GeoNames city; "David" is tagged PER in the NER training splits.
        Assert.Contains(_g.Lookup("David", new LanguageCode("en")), p => p.Country == "PA");
        Assert.True(_g.Cautions["david"].HasFlag(NameCaution.PersonName));
        const string text = "Ruth and David went to Tel Aviv.";
        Assert.Equal(["Tel Aviv"], _g.Find(text, new LanguageCode("en")).Select(m => text[m.CharStart..m.CharEnd]));
        Assert.True(_g.IsKnownName("David")); // still a name, whatever the language around it
    }

    [Fact]
    public void IsKnownName_accepts_capitalised_place_names_only()
    {
        Assert.True(_g.IsKnownName("Warszawa"));
        Assert.True(_g.IsKnownName("Kraków"));
        Assert.False(_g.IsKnownName("warszawa"));   // not capitalised
        Assert.False(_g.IsKnownName("Nice"));       // common lower-case word in the UD English sentences
        Assert.False(_g.IsKnownName("The"));
        Assert.False(_g.IsKnownName("Xqzvwk"));
        Assert.False(_g.IsKnownName(""));
    }

    [Fact]
    public void Missing_or_damaged_file_gives_an_empty_gazetteer_with_a_diagnostic()
    {
        var missing = Gazetteer.Load("/nonexistent/gazetteer.bin.gz");
        Assert.Empty(missing.Places);
        Assert.Equal("/nonexistent/gazetteer.bin.gz:1", Assert.Single(missing.Problems).At.ToString());
        var junk = Path.GetTempFileName();
        File.WriteAllText(junk, "not a gazetteer");
        try
        {
            var damaged = Gazetteer.Load(junk);
            Assert.Empty(damaged.Places);
            Assert.Single(damaged.Problems);
            Assert.Empty(damaged.Lookup("Warsaw", new LanguageCode("en")));
        }
        finally { File.Delete(junk); }
    }

    [Fact]
    public void Bad_geonames_rows_are_diagnostics_with_line_numbers()
    {
        var path = Path.GetTempFileName();
        var good = File.ReadLines(TestPaths.RequireData(GeoNamesFixture.GeoNamesFile)).First();
        File.WriteAllLines(path, [good, "garbage line", good.Replace("\t42.", "\tnorth")]);
        try
        {
            var g = Gazetteer.FromGeoNamesText(path);
            Assert.Single(g.Places);
            Assert.Equal([$"{path}:2", $"{path}:3"], g.Problems.Select(p => p.At.ToString()));
        }
        finally { File.Delete(path); }
    }
}
