using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Lexicon.Tests;

/// <summary>Given-name relations read from the shipped lists (models/lexicon: name-equivalents.tsv and
/// Languages/*/hypocoristics.tsv, written by hand). The pairs checked are common usage known from
/// memory (Stanisław / Stanley, Giuseppina / Josefina (feminine forms of Joseph), Staszek as a Polish diminutive of Stanisław, Hyman as the usual English form adopted for Yiddish Chaim).</summary>
public class NameVariantsTests
{
    private static readonly NameVariants Variants = NameListSet.Load(Path.Combine(TestPaths.RepoRoot, "models", "lexicon")).Variants;

    [Theory]
    [InlineData("Stanley", "Stanisław")]
    [InlineData("Stanisław", "Stanley")]
    [InlineData("Joseph", "Józef")]
    [InlineData("Stanley", "Staszek")]
    [InlineData("Giuseppina", "Josefina")]
    [InlineData("Hyman", "Chaim")]
    public void Listed_equivalents_are_equivalent(string a, string b) => Assert.True(Variants.Equivalent(a, b), $"{a} / {b}");

    /// <summary>Feminine surname forms of Languages/*/feminine-surname-endings.tsv (standard Czech and
    /// Russian grammar, known from memory) meet their family forms; unrelated surnames do not.</summary>
    [Theory]
    [InlineData("Nováková", "Novák", true)]
    [InlineData("Orlova", "Orlov", true)]
    [InlineData("Заславская", "Заславский", true)]
    [InlineData("Nováková", "Novotný", false)]
    public void A_feminine_surname_meets_its_family_form(string a, string b, bool same) =>
        Assert.Equal(same, Variants.FamilyKeys(a).Intersect(Variants.FamilyKeys(b)).Any());

    [Theory]
    [InlineData("Stanley", "Joseph")]
    [InlineData("Walter", "Samuel")]
    public void Unrelated_names_are_not(string a, string b) => Assert.False(Variants.Equivalent(a, b), $"{a} / {b}");

    /// <summary>Forms no hypocoristics.tsv lists (checked with grep on 3 December), derived by the
    /// endings of Languages/*/diminutive-suffixes.txt: Slovak -ka, Ukrainian -ка, Portuguese -inha,
    /// Bavarian and Austrian German -l (common usage, known from memory).</summary>
    [Theory]
    [InlineData("Zuzana", "Zuzanka")]
    [InlineData("Оксана", "Оксанка")]
    [InlineData("Rosinha", "Rosa")]
    [InlineData("Kurt", "Kurtl")]
    public void A_productive_diminutive_is_found_either_way_round(string a, string b)
    {
        var longer = a.Length > b.Length ? a : b;
        Assert.Equal(longer, Variants.DiminutiveOf(a, b));
        Assert.Equal(longer, Variants.DiminutiveOf(b, a));
    }

    [Theory]
    [InlineData("Anna", "Hanna")]
    [InlineData("Marta", "Martin")]
    [InlineData("Al", "Alek")]
    [InlineData("Irena", "Irena")]
    public void Other_pairs_are_no_diminutives(string a, string b) => Assert.Null(Variants.DiminutiveOf(a, b));
}
