using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.Tests;

public class NameFoldingTests
{
    // Unicode NFKD (UAX #15) decomposes letters with marks into base + combining mark; the marks
    // are then dropped. Checked against the decomposition mappings of the Unicode Character Database.
    [Theory]
    [InlineData("Kraków", "krakow")]
    [InlineData("Łódź", "lodz")]          // ł has no decomposition (UCD): folded by the explicit table
    [InlineData("Straße", "strasse")]      // ß → ss as Unicode full case folding (CaseFolding.txt) does
    [InlineData("Tromsø", "tromso")]       // ø has no decomposition (UCD): explicit table
    [InlineData("Đakovo", "dakovo")]       // đ has no decomposition (UCD): explicit table
    [InlineData("Ústí nad Labem", "usti nad labem")]
    [InlineData("Şanlıurfa", "sanliurfa")] // dotless ı has no decomposition (UCD)
    [InlineData("Москва", "москва")]
    [InlineData("Орёл", "орел")]           // ё = е + U+0308 (UCD)
    [InlineData("Йошкар-Ола", "йошкар-ола")] // й = и + U+0306 (UCD), kept whole: a letter of its own
    [InlineData("Θεσσαλονίκη", "θεσσαλονικη")]
    [InlineData("ﬁne", "fine")]            // U+FB01 compatibility decomposition (UCD)
    public void Fold_removes_case_and_diacritics(string text, string folded) =>
        Assert.Equal(folded, NameFolding.Fold(text));

    [Fact]
    public void Fold_keeps_hebrew_letters_and_drops_points()
    {
        // Hebrew points (niqqud) are combining marks, category Mn in the UCD.
        Assert.Equal("ורשה", NameFolding.Fold("וַרְשָׁה"));
    }

    [Fact]
    public void FoldedWords_join_words_split_by_hyphen_apostrophe_and_dot()
    {
        Assert.Equal("saint etienne", NameFolding.FoldedWords("Saint-Étienne"));
        Assert.Equal("l viv", NameFolding.FoldedWords("L’viv"));
        Assert.Equal("st petersburg", NameFolding.FoldedWords("St. Petersburg"));
    }

    [Fact]
    public void Broken_utf16_does_not_throw()
    {
        // A lone high surrogate (U+D800) is not valid UTF-16 (Unicode §3.9); it is replaced by U+FFFD.
        Assert.Equal("a\uFFFDb", NameFolding.Fold("a\uD800b"));
        var (list, _) = AuthorityList.Parse("label,name,variants\nLOC,Kraków,\n", "list.csv");
        Assert.Single(list.Find("\uDC00Kraków \uD800", new LanguageCode("pl")));
    }
}
