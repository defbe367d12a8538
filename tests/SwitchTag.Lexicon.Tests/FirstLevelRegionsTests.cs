using SwitchTag.Tests.Shared;
using SwitchTag.Lexicon.NameLists;
using Xunit;

namespace SwitchTag.Lexicon.Tests;

/// <summary>The shipped first-level regions (models/lexicon/regions.tsv) against ISO 3166-2 codes
/// (the standard's code list as Debian iso-codes publishes it; the codes below are from memory).</summary>
public class FirstLevelRegionsTests
{
    private static readonly NameListSet Lists = NameListSet.Load(Path.Combine(TestPaths.RepoRoot, "models", NameListSet.FolderName));

    [Theory]
    [InlineData("Calabria", "IT-78", "IT")]
    [InlineData("Kalabrien", "IT-78", "IT")]
    [InlineData("Bahia", "BR-BA", "BR")]
    [InlineData("Minas Gerais", "BR-MG", "BR")]
    [InlineData("New Jersey", "US-NJ", "US")]
    [InlineData("Nowy Jork", "US-NY", "US")]
    [InlineData("Texas", "US-TX", "US")]
    public void A_region_is_found_by_its_names_in_several_languages(string name, string code, string country)
    {
        var region = Assert.Single(Lists.Regions.Find(name), r => r.Code == code);
        Assert.Equal(country, region.Country);
    }

    [Fact]
    public void Catalogue_forms_are_not_names_said() =>
        Assert.Empty(Lists.Regions.Find("Asturias, Principado de"));
}
