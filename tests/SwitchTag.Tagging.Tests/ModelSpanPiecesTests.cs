using SwitchTag.Tagging;
using SwitchTag.Tagging.Sources.Model;
using Xunit;

namespace SwitchTag.Tagging.Tests;

/// <summary>A tagged span is cut where a sentence ends. Reference: Unicode UAX #29 sentence
/// boundaries (a full stop, then space, then an upper-case letter ends a sentence: rule SB11 with SB8
/// not applying; from memory), with the abbreviation exception short titles need.</summary>
public class ModelSpanPiecesTests
{
    private static string[] Pieces(string text)
    {
        var words = WordTokenizer.Tokenize(text);
        return [.. NameModelSource.Pieces(words, 0, words.Count, text).Select(p => text[words[p.From].Start..words[p.To - 1].End])];
    }

    [Fact]
    public void A_span_over_a_sentence_end_becomes_two_names() =>
        Assert.Equal(["Paco", "Paco"], Pieces("Paco. Paco."));

    [Fact]
    public void A_span_over_a_sentence_end_keeps_the_full_name_after_it() =>
        Assert.Equal(["Stanley", "Stanley Kowalczyk"], Pieces("Stanley. Stanley Kowalczyk"));

    [Fact]
    public void A_dot_after_a_short_capitalised_word_is_an_abbreviation() =>
        Assert.Equal(["St. Louis"], Pieces("St. Louis"));

    [Fact]
    public void A_lone_stop_word_is_no_name() =>
        Assert.Equal(["Hnatyuk"], Pieces("Hnatyuk. I"));

    /// <summary>Polish w, Slovak s and Russian в are one-letter prepositions (in, with, in; the
    /// language profiles' stopwords.txt; from memory); "J. Smith" is an initial with its dot.</summary>
    [Theory]
    [InlineData("W Krakowie", "Krakowie")]
    [InlineData("S Imrichom", "Imrichom")]
    [InlineData("В Москве", "Москве")]
    [InlineData("J. Smith", "J. Smith")]
    public void A_one_letter_preposition_opening_a_span_is_left_out(string span, string name) =>
        Assert.Equal([name], Pieces(span));

    /// <summary>Ukrainian зі and Russian во are prepositions (with, in; the language profiles'
    /// stopwords.txt; from memory); Latin-script articles and particles longer than one letter open real
    /// names (El Paso, De Vries: the Spanish and French stop words el and de) and stay.</summary>
    [Theory]
    [InlineData("Зі Степаном", "Степаном")]
    [InlineData("Во Львове", "Львове")]
    [InlineData("El Paso", "El Paso")]
    [InlineData("De Vries", "De Vries")]
    public void A_cyrillic_preposition_opening_a_span_is_left_out(string span, string name) =>
        Assert.Equal([name], Pieces(span));
}
