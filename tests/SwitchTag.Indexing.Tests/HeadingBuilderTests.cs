using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Indexing;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests;

public class HeadingBuilderTests
{
    private static HeadingResult Build(IHeadingLexicon lexicon, params (string Text, NameLabel Label, string Language)[] names)
    {
        var mentions = names.Select((n, i) => new Mention(new TurnId(0), new CharSpan(i * 20, i * 20 + n.Text.Length), n.Text, n.Label, new LanguageCode(n.Language), 0.9, MentionSource.Model)).ToImmutableArray();
        var times = names.Select((_, i) => new TimeRange(new Timecode(i * 1000), new Timecode(i * 1000 + 500))).ToImmutableArray();
        var turn = new Turn(new TurnId(0), "narrator", "Narrator", new TimeRange(Timecode.Zero, new Timecode(100_000)), new string(' ', names.Length * 20 + 40), []);
        return new HeadingBuilder(lexicon).Build(mentions, times, [turn]);
    }

    [Fact]
    public void Other_language_names_and_inflections_of_one_place_make_one_heading()
    {
        // GeoNames cities15000 row 756135 (Warsaw, PL) lists Warschau and Varsovie among its alternate names;
        // "Warszawy" is the Polish genitive of Warszawa, also listed there.
        var result = Build(GeoNamesFixture.Lexicon(), ("Warschau", NameLabel.LOC, "de"), ("Varsovie", NameLabel.LOC, "fr"), ("Warszawy", NameLabel.LOC, "pl"));
        var heading = Assert.Single(result.Headings);
        Assert.Equal(756135, heading.Place!.GeonameId);
        Assert.Equal("PL", heading.Place.Country);
        Assert.Equal(52.22977, heading.Place.Latitude!.Value, 5);
        Assert.Equal(21.01178, heading.Place.Longitude!.Value, 5);
        Assert.Equal(["Warschau", "Varsovie", "Warszawy"], heading.Variants.ToArray());
    }

    [Fact]
    public void Ambiguous_place_follows_the_countries_of_the_other_places()
    {
        // GeoNames cities15000: Paris FR (2988507, pop 2138551) and Paris US (4717560, Texas, pop 25171).
        var french = Build(GeoNamesFixture.Lexicon(), ("Paris", NameLabel.LOC, "en"), ("Lyon", NameLabel.LOC, "en"));
        Assert.Equal(2988507, french.Headings.Single(h => h.Name == "Paris").Place!.GeonameId);
        Assert.Contains(french.Headings.Single(h => h.Name == "Paris").Alternatives, a => a.GeonameId == 4717560);

        // With Dallas and Houston (US) in the same interview the Texan Paris wins, the French one is kept as an alternative.
        var texan = Build(GeoNamesFixture.Lexicon(), ("Paris", NameLabel.LOC, "en"), ("Dallas", NameLabel.LOC, "en"), ("Houston", NameLabel.LOC, "en"));
        var paris = texan.Headings.Single(h => h.Variants.Contains("Paris"));
        Assert.Equal(4717560, paris.Place!.GeonameId);
        Assert.Contains(paris.Alternatives, a => a.GeonameId == 2988507);
    }

    [Fact]
    public void A_place_missing_from_the_gazetteer_stays_without_coordinates()
    {
        var result = Build(GeoNamesFixture.Lexicon(), ("Ironbound", NameLabel.LOC, "en"));
        var heading = Assert.Single(result.Headings);
        Assert.Null(heading.Place);
        Assert.Equal("Ironbound", heading.Name);
    }

    [Fact]
    public void A_lone_surname_joins_only_the_one_full_name_it_belongs_to()
    {
        var lexicon = Fixture.Lexicon();
        var one = Build(lexicon, ("Hanna Szwarc", NameLabel.PER, "en"), ("Szwarc", NameLabel.PER, "en"));
        Assert.Equal(["Hanna Szwarc", "Szwarc"], Assert.Single(one.Headings).Variants.ToArray());

        // Two people share the surname: the lone surname is not guessed onto either.
        var two = Build(lexicon, ("Hanna Szwarc", NameLabel.PER, "en"), ("Frajda Szwarc", NameLabel.PER, "en"), ("Szwarc", NameLabel.PER, "en"));
        Assert.Equal(3, two.Headings.Length);
    }

    [Fact]
    public void A_given_name_or_a_middle_name_variant_joins_only_with_one_owner()
    {
        var lexicon = Fixture.Lexicon();
        var result = Build(lexicon, ("Irena Kowalczyk", NameLabel.PER, "en"), ("Irena", NameLabel.PER, "en"),
            ("Manuel Joaquim Ferreira", NameLabel.PER, "en"), ("Manuel Ferreira", NameLabel.PER, "en"));
        Assert.Equal(2, result.Headings.Length);
        Assert.Contains(result.Headings, h => h.Variants.SequenceEqual(["Irena Kowalczyk", "Irena"]));
        Assert.Contains(result.Headings, h => h.Variants.SequenceEqual(["Manuel Joaquim Ferreira", "Manuel Ferreira"]));

        var two = Build(lexicon, ("Irena Kowalczyk", NameLabel.PER, "en"), ("Józef Kowalczyk", NameLabel.PER, "en"), ("Kowalczyk", NameLabel.PER, "en"));
        Assert.Equal(3, two.Headings.Length);
    }

    [Fact]
    public void Person_and_place_competing_go_to_review()
    {
        var result = Build(GeoNamesFixture.Lexicon(), ("Florence", NameLabel.PER, "en"), ("Jordan", NameLabel.LOC, "en"), ("Jordan", NameLabel.PER, "en"));
        Assert.Empty(result.Headings);
        Assert.Equal(3, result.Review.Length);
        Assert.All(result.HeadingOf, Assert.Null);
    }

    [Fact]
    public void A_model_name_in_lower_case_goes_to_review()
    {
        // Hebrew script has no case (Unicode: its letters are category Lo), so a Yiddish name is never held for that.
        var result = Build(Fixture.Lexicon(), ("nicht wahr", NameLabel.PER, "de"), ("Nowak", NameLabel.PER, "pl"), ("הענקע", NameLabel.PER, "yi"));
        Assert.Equal("the model tagged a name that does not start with a capital letter", Assert.Single(result.Review).Reason);
        Assert.Equal(2, result.Headings.Length);
    }

    [Fact]
    public void A_model_place_nothing_knows_holding_an_ordinary_lower_case_word_goes_to_review()
    {
        // English and Italian (from memory): "club" is a common noun, "Avevamo fame" means "we were hungry";
        // "de" is a name particle (the language profiles' particles.txt).
        var result = Build(Fixture.Lexicon(), ("Austrian club", NameLabel.LOC, "en"), ("Avevamo fame", NameLabel.LOC, "it"),
            ("Milwaukee Avenue", NameLabel.LOC, "en"), ("Puerta de Triana", NameLabel.LOC, "es"));
        Assert.Equal(["a place's name does not hold the lower-case word \"club\", and no place of that name is known",
            "a place's name does not hold the lower-case word \"fame\", and no place of that name is known"], result.Review.Select(r => r.Reason).ToArray());
        Assert.Equal(["Milwaukee Avenue", "Puerta de Triana"], result.Headings.Select(h => h.Name).Order(StringComparer.Ordinal).ToArray());
    }

    [Fact]
    public void A_one_word_model_name_the_talk_also_uses_as_an_ordinary_word_goes_to_review()
    {
        // English grammar (from memory): "her" is a pronoun; capitalised only at a sentence start.
        var mentions = ImmutableArray.Create(
            new Mention(new TurnId(0), new CharSpan(0, 3), "Her", NameLabel.PER, new LanguageCode("en"), 0.9, MentionSource.Model),
            new Mention(new TurnId(0), new CharSpan(26, 31), "Irena", NameLabel.PER, new LanguageCode("en"), 0.9, MentionSource.Model));
        var times = ImmutableArray.Create(new TimeRange(Timecode.Zero, new Timecode(500)), new TimeRange(new Timecode(1000), new Timecode(1500)));
        const string text = "Her mother knew her well. Irena";
        var turn = new Turn(new TurnId(0), "narrator", "Narrator", new TimeRange(Timecode.Zero, new Timecode(2000)), text, []);
        var result = new HeadingBuilder(Fixture.Lexicon()).Build(mentions, times, [turn]);
        Assert.Equal("\"Her\" is also used as an ordinary word in this interview (\"her\")", Assert.Single(result.Review).Reason);
        Assert.Equal("Irena", Assert.Single(result.Headings).Name);
    }

    [Fact]
    public void A_diminutive_of_a_person_named_in_full_is_that_person_not_a_village()
    {
        // GeoNames cities1000 row 1694091 (Piña, PH, pop 3137), as in models/gazetteer.bin.gz; "Pina" as the
        // Italian diminutive of Giuseppina is from memory (models/lexicon/Languages/it/hypocoristics.tsv).
        var pina = new PlaceLink(1694091, "Piña", 12.19078, 124.4015, "PH", 3137);
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["pina"] = [pina] },
            new Dictionary<string, string> { ["Pina"] = "Giuseppina" });
        var result = Build(lexicon, ("Giuseppina Russo", NameLabel.PER, "en"), ("Pina", NameLabel.LOC, "en"), ("Pina", NameLabel.LOC, "en"));
        var heading = Assert.Single(result.Headings);
        Assert.Equal(NameLabel.PER, heading.Label);
        Assert.Equal(["Giuseppina Russo", "Pina"], heading.Variants.ToArray());
        Assert.All(result.Mentions, m => Assert.Equal(NameLabel.PER, m.Label));
    }

    [Fact]
    public void A_name_accented_otherwise_than_its_only_places_goes_to_review()
    {
        // GeoNames cities1000 rows as in models/gazetteer.bin.gz: 2987932 Péron, FR (pop 1729) and 3846991 Leones,
        // AR (pop 9971), which lists "Perón" among its alternate names. Juan Perón, the Argentine president, is from memory.
        var peron = new PlaceLink(2987932, "Péron", 46.19053, 5.92524, "FR", 1729);
        var leones = new PlaceLink(3846991, "Leones", -32.66174, -62.29678, "AR", 9971);
        var accented = Build(new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["peron"] = [peron] }), ("Perón", NameLabel.LOC, "en"));
        Assert.Empty(accented.Headings);
        Assert.StartsWith("\"Perón\" is accented otherwise than the only places of that name (Péron, FR)", Assert.Single(accented.Review).Reason);

        var village = Build(new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["peron"] = [peron, leones] }), ("Perón", NameLabel.LOC, "en"));
        Assert.Empty(village.Headings);
        Assert.StartsWith("\"Perón\" is only another name of a village (Leones, AR)", Assert.Single(village.Review).Reason);

        // GeoNames cities15000 row 456172 (Riga, LV): "Rīga", accented only where the place is not, is no conflict.
        var riga = Build(GeoNamesFixture.Lexicon(), ("Rīga", NameLabel.LOC, "lv"));
        Assert.Equal(456172, Assert.Single(riga.Headings).Place!.GeonameId);
    }

    [Fact]
    public void A_camp_keeps_its_spoken_name_and_is_shown_at_its_town()
    {
        // GeoNames cities15000 row 3089658 (Oświęcim, PL); Auschwitz lay beside it (known from memory).
        var lexicon = GeoNamesFixture.Lexicon();
        var oswiecim = lexicon.Places("Oświęcim", new LanguageCode("pl")).Single(p => p.Country == "PL");
        Assert.Equal(3089658, oswiecim.GeonameId);
        var camps = new FakeLexicon(GeoNamesFixture.Places, listed: new Dictionary<string, ListedPlace>
        {
            ["Auschwitz"] = new("Auschwitz", "camp", true, oswiecim, ["PL"]),
        });
        var result = Build(camps, ("Auschwitz", NameLabel.LOC, "en"), ("Oświęcim", NameLabel.LOC, "pl"), ("Auschwitz", NameLabel.LOC, "de"));
        Assert.Equal(2, result.Headings.Length);
        var camp = result.Headings.Single(h => h.Name == "Auschwitz");
        Assert.Equal(3089658, camp.Place!.GeonameId);
        Assert.Equal(2, camp.Mentions.Length);
        Assert.Equal(3089658, result.Headings.Single(h => h.Name == "Oświęcim").Place!.GeonameId);
    }

    [Fact]
    public void A_historical_state_is_not_linked_to_the_modern_state_of_its_name_beside_places_of_its_land()
    {
        // GeoNames cities15000 row 294801 (Haifa, IL); Mandatory Palestine covered today's IL and PS (known from memory).
        var state = new PlaceLink(-275, "State of Palestine", 31.9, 35.2, "PS", 4_000_000);
        var places = new Dictionary<string, ImmutableArray<PlaceLink>>(GeoNamesFixture.Places.ToDictionary()) { ["palestine"] = [state] };
        var lexicon = new FakeLexicon(places, listed: new Dictionary<string, ListedPlace>
        {
            ["Palestine"] = new("Palestine (Mandate)", "state", false, null, ["IL", "PS"]),
        });
        var story = Build(lexicon, ("Palestine", NameLabel.LOC, "en"), ("Haifa", NameLabel.LOC, "en"));
        var palestine = story.Headings.Single(h => h.Variants.Contains("Palestine"));
        Assert.Equal("Palestine", palestine.Name);
        Assert.Null(palestine.Place);
        Assert.Equal(-275, Assert.Single(palestine.Alternatives).GeonameId);

        // With nothing else in the land, the modern state stands.
        var alone = Build(lexicon, ("Palestine", NameLabel.LOC, "en"), ("Paris", NameLabel.LOC, "en"), ("Lyon", NameLabel.LOC, "en"));
        Assert.Equal(-275, alone.Headings.Single(h => h.Variants.Contains("Palestine")).Place!.GeonameId);
    }

    [Fact]
    public void A_sentence_opening_phrase_of_ordinary_words_goes_to_review()
    {
        // Italian (from memory): "mia madre" is "my mother"; both words are ordinary words, capitalised only at a sentence start.
        const string text = "Mia madre diceva sempre: la madre mia. Santa Maria";
        int santa = text.IndexOf("Santa", StringComparison.Ordinal);
        var mentions = ImmutableArray.Create(
            new Mention(new TurnId(0), new CharSpan(0, 9), "Mia madre", NameLabel.LOC, new LanguageCode("it"), 0.9, MentionSource.Model),
            new Mention(new TurnId(0), new CharSpan(santa, santa + 11), "Santa Maria", NameLabel.LOC, new LanguageCode("it"), 0.9, MentionSource.Model));
        var times = ImmutableArray.Create(new TimeRange(Timecode.Zero, new Timecode(500)), new TimeRange(new Timecode(1000), new Timecode(1500)));
        var turn = new Turn(new TurnId(0), "narrator", "Narrator", new TimeRange(Timecode.Zero, new Timecode(2000)), text, []);
        var result = new HeadingBuilder(Fixture.Lexicon()).Build(mentions, times, [turn]);
        Assert.Equal("\"Mia madre\" opens a sentence and its words are used as ordinary words in this interview", Assert.Single(result.Review).Reason);
        Assert.Equal("Santa Maria", Assert.Single(result.Headings).Name);
    }

    // GeoNames cities15000 rows: 3164603 Venice, IT (270,816 people), 5128581 New York City, US
    // (8,175,133), 2761369 Vienna, AT (1,691,468). ISO 3166-2 codes as the shipped regions.tsv gives
    // them from Debian iso-codes: IT-34 Veneto, US-NY New York, AT-9 Wien.
    private static readonly PlaceLink Venice = new(3164603, "Venice", 45.43861, 12.32667, "IT", 270816);
    private static readonly PlaceLink NewYorkCity = new(5128581, "New York City", 40.71427, -74.00597, "US", 8175133);
    private static readonly PlaceLink Vienna = new(2761369, "Vienna", 48.20849, 16.37208, "AT", 1691468);

    private static PlaceLink Region(string name, string country, string code) => new(0, name, null, null, country, 0, code);

    [Fact]
    public void A_first_level_region_is_linked_before_a_town_met_only_through_another_of_its_names()
    {
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["veneto"] = [Venice, Region("Veneto", "IT", "IT-34")] });
        var heading = Assert.Single(Build(lexicon, ("Veneto", NameLabel.LOC, "it")).Headings);
        Assert.Equal("IT-34", heading.Place!.Region);
        Assert.False(heading.Place.HasCoordinates);
        Assert.Equal(new HeadingId("loc-r-it-34"), heading.Id);
        Assert.Equal([Venice], heading.Alternatives.ToArray());
    }

    [Fact]
    public void A_metropolis_or_a_city_state_keeps_its_name_before_the_region()
    {
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>>
        {
            ["new york"] = [NewYorkCity, Region("New York", "US", "US-NY")],
            ["wien"] = [Vienna, Region("Wien", "AT", "AT-9")],
            ["vienna"] = [Vienna, Region("Vienna", "AT", "AT-9")],
        });
        var result = Build(lexicon, ("New York", NameLabel.LOC, "en"), ("Wien", NameLabel.LOC, "de"));
        Assert.Equal([Vienna.GeonameId, NewYorkCity.GeonameId], result.Headings.Select(h => h.Place!.GeonameId).Order().ToArray());
    }

    [Fact]
    public void A_town_abroad_named_like_a_region_yields_to_the_region_a_namesake_town_in_it_does_not()
    {
        // GeoNames cities15000: 2513416 Murcia, ES (436,870). 1730032 Asturias, PH is the row of the
        // shipped gazetteer (GeoNames cities1000; population from memory, about 50,000). ES-AS and
        // ES-MC as the shipped regions.tsv gives them from Debian iso-codes.
        var murcia = new PlaceLink(2513416, "Murcia", 37.98704, -1.13004, "ES", 436870);
        var asturiasPh = new PlaceLink(1730032, "Asturias", 10.5679, 123.7178, "PH", 50000);
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>>
        {
            ["asturias"] = [asturiasPh, Region("Asturias", "ES", "ES-AS")],
            ["murcia"] = [murcia, Region("Murcia", "ES", "ES-MC")],
        });
        Assert.Equal("ES-AS", Assert.Single(Build(lexicon, ("Asturias", NameLabel.LOC, "en")).Headings).Place!.Region);
        Assert.Equal(murcia.GeonameId, Assert.Single(Build(lexicon, ("Murcia", NameLabel.LOC, "en")).Headings).Place!.GeonameId);
    }

    [Fact]
    public void A_city_said_by_its_own_name_is_not_a_region_of_the_name_abroad()
    {
        // GeoNames 2643123 Manchester, GB (coordinates as the shipped gazetteer gives them; population
        // from memory, about 400,000); JM-12 Manchester, a Jamaican parish, as the shipped regions.tsv
        // gives it from Debian iso-codes.
        var manchester = new PlaceLink(2643123, "Manchester", 53.48095, -2.23743, "GB", 395515);
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["manchester"] = [manchester, Region("Manchester", "JM", "JM-12")] });
        Assert.Equal(manchester.GeonameId, Assert.Single(Build(lexicon, ("Manchester", NameLabel.LOC, "en")).Headings).Place!.GeonameId);
    }

    [Fact]
    public void A_person_of_two_words_named_exactly_as_a_region_goes_to_review()
    {
        // BR-MG Minas Gerais as the shipped regions.tsv gives it (Debian iso-codes).
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["minas gerais"] = [Region("Minas Gerais", "BR", "BR-MG")] });
        var result = Build(lexicon, ("Minas Gerais", NameLabel.PER, "pt"), ("Hanna Szwarc", NameLabel.PER, "pl"));
        Assert.Equal(["Hanna Szwarc"], result.Headings.Select(h => h.Name).ToArray());
        Assert.Contains("also the name of a place", Assert.Single(result.Review).Reason);
    }

    [Fact]
    public void A_person_holding_a_lower_case_word_that_is_no_particle_goes_to_review()
    {
        // "van" is a Dutch name particle (src/SwitchTag.Core/Languages/nl/particles.txt); "dalla mattina"
        // is Italian for "from the morning".
        var result = Build(Fixture.Lexicon(), ("Cucivo cappotti dalla mattina", NameLabel.PER, "it"), ("Jan van Dijk", NameLabel.PER, "nl"));
        Assert.Equal(["Jan van Dijk"], result.Headings.Select(h => h.Name).ToArray());
        Assert.Contains("cappotti", Assert.Single(result.Review).Reason);
    }

    [Fact]
    public void An_accented_name_is_not_linked_to_a_village_spelt_plainly()
    {
        // GeoNames cities1000 row 3030529 (the shipped gazetteer's source, models/gazetteer.md): Bras, FR, 1,888 people; Brás is a district of São Paulo (from memory).
        var bras = new PlaceLink(3030529, "Bras", 43.47163, 5.95486, "FR", 1888);
        var lexicon = new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["bras"] = [bras] });
        var heading = Assert.Single(Build(lexicon, ("Brás", NameLabel.LOC, "pt")).Headings);
        Assert.Null(heading.Place);
        var plain = Assert.Single(Build(lexicon, ("Bras", NameLabel.LOC, "fr")).Headings);
        Assert.Equal(bras, plain.Place);
    }

    [Fact]
    public void A_word_for_the_people_of_a_place_that_names_no_known_place_goes_to_review()
    {
        // English word formation (from memory): -an, -ian, -ese make words for the people of a place.
        var result = Build(new FakeLexicon(new Dictionary<string, ImmutableArray<PlaceLink>> { ["venice"] = [Venice] }),
            ("Neapolitan", NameLabel.LOC, "en"), ("Venice", NameLabel.LOC, "en"));
        Assert.StartsWith("\"Neapolitan\" reads as a word for the people of a place (-an)", Assert.Single(result.Review).Reason);
        Assert.Equal(Venice, Assert.Single(result.Headings).Place);
    }
}
