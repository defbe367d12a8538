using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Indexing;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing.Tests;

public class HeadingBuilderTests
{
    private static HeadingResult Build(IHeadingLexicon lexicon, params (string Text, NameLabel Label, string Language)[] names)
    {
        var mentions = names.Select((n, i) => new Mention(0, new CharSpan(i * 20, i * 20 + n.Text.Length), n.Text, n.Label, n.Language, 0.9, MentionSource.Model)).ToImmutableArray();
        var times = names.Select((_, i) => new TimeRange(new Timecode(i * 1000), new Timecode(i * 1000 + 500))).ToImmutableArray();
        var turn = new Turn(0, "narrator", "Narrator", new TimeRange(Timecode.Zero, new Timecode(100_000)), new string(' ', names.Length * 20 + 40), []);
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
        Assert.Equal(52.22977, heading.Place.Latitude, 5);
        Assert.Equal(21.01178, heading.Place.Longitude, 5);
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
    public void A_one_word_model_name_the_talk_also_uses_as_an_ordinary_word_goes_to_review()
    {
        // English grammar (from memory): "her" is a pronoun; capitalised only at a sentence start.
        var mentions = ImmutableArray.Create(
            new Mention(0, new CharSpan(0, 3), "Her", NameLabel.PER, "en", 0.9, MentionSource.Model),
            new Mention(0, new CharSpan(26, 31), "Irena", NameLabel.PER, "en", 0.9, MentionSource.Model));
        var times = ImmutableArray.Create(new TimeRange(Timecode.Zero, new Timecode(500)), new TimeRange(new Timecode(1000), new Timecode(1500)));
        const string text = "Her mother knew her well. Irena";
        var turn = new Turn(0, "narrator", "Narrator", new TimeRange(Timecode.Zero, new Timecode(2000)), text, []);
        var result = new HeadingBuilder(Fixture.Lexicon()).Build(mentions, times, [turn]);
        Assert.Equal("\"Her\" is also used as an ordinary word in this interview (\"her\")", Assert.Single(result.Review).Reason);
        Assert.Equal("Irena", Assert.Single(result.Headings).Name);
    }
}
