using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources.PlaceEvidence;
using SwitchTag.Tagging.Sources.Vetoes;
using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging.Tests;

/// <summary>A gazetteer match with nothing else for it is a place only for a city said mid-sentence.
/// Checked on the shipped gazetteer (GeoNames cities1000): Nola, IT and Kraków, PL are in it, the first
/// under and the second over <see cref="PlaceContext.CityPopulation"/> people (asserted below, not
/// assumed); Italian "a" is in models/lexicon/place-prepositions.tsv. Sentences are invented.</summary>
public class BarePlaceVetoTests
{
    private static readonly Lazy<Gazetteer> Places = new(() => Gazetteer.Load(Path.Combine(Models.Directory, Gazetteer.FileName)));

    private static readonly Lazy<BarePlaceVeto> Veto = new(() =>
        new BarePlaceVeto(Places.Value, NameListSet.Load(Path.Combine(Models.Directory, NameListSet.FolderName)).Prepositions));

    private static Mention Bare(string text, string word, string language)
    {
        int at = text.IndexOf(word, StringComparison.Ordinal);
        return new Mention(new TurnId(0), new CharSpan(at, at + word.Length), word, NameLabel.LOC, new LanguageCode(language), 0.9, MentionSource.Gazetteer);
    }

    private static long Largest(string name, string language) =>
        Places.Value.Candidates(name, new LanguageCode(language)).Max(c => c.Place.Population);

    [Fact]
    public void A_bare_match_of_a_town_mid_sentence_is_no_place_but_a_city_stands()
    {
        Assert.True(Largest("Nola", "en") < PlaceContext.CityPopulation);
        Assert.True(Largest("Kraków", "en") >= PlaceContext.CityPopulation);
        const string town = "Then Nola said we should leave.";
        Assert.True(Veto.Value.Vetoes(Bare(town, "Nola", "en"), town));
        const string city = "Everybody knew Kraków then.";
        Assert.False(Veto.Value.Vetoes(Bare(city, "Kraków", "en"), city));
    }

    /// <summary>Czech "s Mílou" (with Míla, instrumental; standard grammar, from memory): the gazetteer
    /// reaches a city of the name only through the case ending (asserted), and "s" is no locative
    /// preposition, so nothing says place.</summary>
    [Fact]
    public void A_bare_case_form_is_no_place()
    {
        Assert.NotEmpty(Places.Value.Candidates("Mílou", new LanguageCode("cs")));
        Assert.All(Places.Value.Candidates("Mílou", new LanguageCode("cs")), c => Assert.Equal(MatchKind.Inflected, c.Kind));
        const string text = "Každou neděli jsme s Mílou chodili do tělocvičny.";
        Assert.True(Veto.Value.Vetoes(Bare(text, "Mílou", "cs"), text));
    }

    [Fact]
    public void A_bare_match_opening_a_sentence_is_no_place_however_large()
    {
        const string text = "It was cold. Kraków was far.";
        Assert.True(Veto.Value.Vetoes(Bare(text, "Kraków", "en"), text));
    }

    [Fact]
    public void A_locative_preposition_keeps_the_town()
    {
        const string text = "Un paesino vicino a Nola.";
        Assert.False(Veto.Value.Vetoes(Bare(text, "Nola", "it"), text));
    }

    [Fact]
    public void Only_bare_gazetteer_matches_are_judged()
    {
        const string text = "Then Nola said we should leave.";
        var byModel = Bare(text, "Nola", "en") with { Source = MentionSource.Model };
        Assert.False(Veto.Value.Vetoes(byModel, text));
    }
}
