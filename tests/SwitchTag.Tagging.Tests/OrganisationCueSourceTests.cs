using SwitchTag.Tagging.Sources.Organisations;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Tagging.Tests;

/// <summary>Organisation cues from the language profiles' head words. The names are of the kinds
/// firms, schools and societies take in Italian, Portuguese, Spanish, Polish and English (common
/// usage, from memory): head word first in the Romance and Slavic languages, last in English.</summary>
public class OrganisationCueSourceTests
{
    private static string[] Organisations(string text) =>
        [.. new OrganisationCueSource().Find(new TurnId(0), text, []).Select(m => m.Text)];

    [Theory]
    [InlineData("I worked in a textile factory,\nthe Fiação Santa Rita, in Brás.", "Fiação Santa Rita")]
    [InlineData("She went to the Scuola Elementare Regina Margherita in Nola.", "Scuola Elementare Regina Margherita")]
    [InlineData("He sold cloth for Textil Ortiz y Hermanos.", "Textil Ortiz y Hermanos")]
    [InlineData("We bought from the Lewin Brothers on Grodzka.", "Lewin Brothers")]
    [InlineData("Sklep miała firma Bracia Lewin.", "Bracia Lewin")]
    [InlineData("The Emigrants' Aid Committee paid.", "Emigrants' Aid Committee")]
    [InlineData("I was at the Saint Florian School then.", "Saint Florian School")]
    public void A_capitalised_run_around_a_head_word_is_one_organisation(string text, string organisation) =>
        Assert.Equal([organisation], Organisations(text));

    [Theory]
    [InlineData("School was hard for me.")]
    [InlineData("I went to the school in Kraków.")]
    [InlineData("The Line was long.")]
    public void A_head_word_alone_or_lower_case_is_no_cue(string text) =>
        Assert.Empty(Organisations(text));
}
