using SwitchTag.Core.Languages;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Pipeline.Models;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

/// <summary>Given names as heading building sees them, on the shipped lists: a productive diminutive
/// is the same given name unless it is a listed first name of its own. Marek is listed as a first name
/// in models/lexicon/Languages/pl/first-names.tsv (from @faker-js/faker, checked with grep); Slovak
/// Zuzanka for Zuzana is common usage (known from memory) and listed in no hypocoristics.tsv.</summary>
public class HeadingLexiconTests
{
    private static readonly Lazy<(HeadingLexicon Lexicon, NameListSet Lists)> Loaded = new(() =>
    {
        var at = new ModelLocation(Path.Combine(TestPaths.RepoRoot, "models"));
        var lists = NameListSet.Load(at.PathOf(NameListSet.FolderName));
        return (new HeadingLexicon(ShippedModels.LoadGazetteer(at), lists), lists);
    });

    private static readonly LanguageCode Slovak = new("sk"), Polish = new("pl");

    [Fact]
    public void A_derived_diminutive_is_the_same_given_name()
    {
        Assert.True(Loaded.Value.Lexicon.SameGivenName("Zuzana", Slovak, "Zuzanka", Slovak));
    }

    [Fact]
    public void A_derived_form_that_is_a_first_name_of_its_own_is_not()
    {
        Assert.Equal("Marek", Loaded.Value.Lists.Variants.DiminutiveOf("Mara", "Marek"));
        Assert.True(Loaded.Value.Lexicon.IsFirstName("Marek"));
        Assert.False(Loaded.Value.Lexicon.SameGivenName("Mara", Polish, "Marek", Polish));
    }
}
