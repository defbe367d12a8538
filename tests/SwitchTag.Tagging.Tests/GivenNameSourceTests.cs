using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources.GivenNames;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Tagging.Tests;

/// <summary>The given-name source on the shipped lists (models/lexicon: first names from
/// @faker-js/faker, hand-written short forms, and the ordinary words found in the Universal
/// Dependencies sentences of ../shared/data/lid). Which words are short forms of which names is
/// common usage known from memory (Polish Staś for Stanisław, Spanish Beto for Alberto).</summary>
public class GivenNameSourceTests
{
    private static readonly NameListSet Lists = NameListSet.Load(Path.Combine(TestPaths.RepoRoot, "models", "lexicon"));

    private static string[] Found(string text, string language)
    {
        var spans = System.Collections.Immutable.ImmutableArray.Create(new LanguageSpan(new CharSpan(0, text.Length), new LanguageCode(language), 1.0));
        var found = new GivenNameSource(Lists.Cues, Lists.NotPlaces, Lists.Variants, Lists.Prepositions).Find(new TurnId(0), text, spans);
        Assert.All(found, m => Assert.Equal((NameLabel.PER, MentionSource.GivenName), (m.Label, m.Source)));
        return [.. found.Select(m => m.Text)];
    }

    [Theory]
    [InlineData("at home he was Staś, or Stasiek when Mama was angry", "en", new[] { "Staś", "Stasiek" })]
    [InlineData("Ze Stasiem chodziłam do szkoły.", "pl", new[] { "Stasiem" })]
    [InlineData("Beto stayed in Argentina.", "en", new[] { "Beto" })]
    public void A_listed_short_form_said_alone_is_a_person(string text, string language, string[] expected) =>
        Assert.Equal(expected, Found(text, language));

    [Theory]
    [InlineData("Will you tell me about the war?", "en")]        // an ordinary English word first
    [InlineData("We met in May, in Rosa Luxemburg Street.", "en")] // a month; a word beside another name
    [InlineData("Wir wohnten auf dem Kazimierz bei Ernst.", "de")] // German capitalises nouns
    [InlineData("Mieszkaliśmy na Kazimierzu.", "pl")]             // after a locative preposition
    [InlineData("He was a Christian, a railway man.", "en")]       // a faith, not a name
    public void Words_that_can_be_something_else_are_left_to_the_model(string text, string language) =>
        Assert.Empty(Found(text, language));
}
