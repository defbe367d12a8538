using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources.Regions;

namespace SwitchTag.Tagging.Tests;

/// <summary>First-level regions found in running text, on the shipped lists: ES-AS Asturias and BR-MG
/// Minas Gerais are ISO 3166-2 subdivisions (Debian iso-codes, models/lexicon/regions.tsv); "from" and
/// Polish "z" are in models/lexicon/place-prepositions.tsv.</summary>
public class RegionSourceTests
{
    private static readonly Lazy<RegionSource> Source = new(() =>
    {
        var lists = NameListSet.Load(Path.Combine(Models.Directory, NameListSet.FolderName));
        return new RegionSource(lists.Regions, lists.Prepositions);
    });

    private static string[] Found(string text) =>
        [.. Source.Value.Find(new TurnId(0), text, []).Select(m => $"{m.Label} {m.Text} {m.Source}")];

    [Fact]
    public void A_region_after_a_locative_preposition_is_a_place()
    {
        Assert.Equal(["LOC Asturias place-evidence"], Found("We rented from a widow, a Spanish woman from Asturias, for two years."));
    }

    [Fact]
    public void A_region_of_several_words_is_a_place_without_a_preposition()
    {
        Assert.Equal(["LOC Minas Gerais place-evidence"], Found("Minas Gerais was far away."));
    }

    [Fact]
    public void A_one_word_region_name_without_a_preposition_is_left_to_the_other_sources()
    {
        // Georgia: a US state (US-GA) and a given name; nothing here says place.
        Assert.Empty(Found("Georgia smiled and Asturias was not mentioned again."));
    }

    [Fact]
    public void A_region_name_inside_a_longer_name_is_not_a_region()
    {
        // CM-SU is the Cameroonian region "South" (iso-codes); here it is part of a continent's name.
        Assert.Empty(Found("Then we went to South America by ship."));
    }
}
