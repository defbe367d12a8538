using SwitchTag.Core.Languages;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Lexicon.Tests;

/// <summary>Continents and world regions from models/lexicon/territories.tsv (CLDR territory names; UN M49
/// codes 150 Europe and 005 South America, known from memory). Hungarian "Európát" is the accusative of
/// Európa (standard grammar, known from memory).</summary>
public class WorldRegionsTests
{
    private static readonly WorldRegions Regions = NameListSet.Load(Path.Combine(TestPaths.RepoRoot, "models", "lexicon")).WorldRegions;

    [Theory]
    [InlineData("Europe", "en")]
    [InlineData("Európát", "hu")]
    [InlineData("Ameryka Południowa", "pl")]
    public void Continents_are_world_regions(string name, string language) => Assert.True(Regions.Contains(name, new LanguageCode(language)));

    [Theory]
    [InlineData("Poland", "en")]
    [InlineData("Kraków", "pl")]
    public void Countries_and_towns_are_not(string name, string language) => Assert.False(Regions.Contains(name, new LanguageCode(language)));
}
