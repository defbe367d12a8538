using SwitchTag.Tagging;

namespace SwitchTag.Tagging.Tests;

/// <summary>Word splitting close to Universal Dependencies tokenisation (UD guidelines, "Tokenization
/// and word segmentation"; from memory): punctuation split off, word-internal apostrophes and
/// hyphens kept; offsets always into the original string.</summary>
public class WordTokenizerTests
{
    private static string[] Words(string text) => [.. WordTokenizer.Tokenize(text).Select(w => w.Text)];

    [Fact]
    public void SplitsPunctuationAndKeepsInnerJoiners()
    {
        Assert.Equal(["O'Brien", "moved", "to", "Bielsko-Biała", ",", "then", "to", "St", ".", "Louis", "..."],
            Words("O'Brien moved to Bielsko-Biała, then to St. Louis..."));
    }

    [Fact]
    public void OffsetsPointIntoTheOriginal()
    {
        const string text = "  Łódź\u00A0(1968)\t–\u200Bok ";
        foreach (var w in WordTokenizer.Tokenize(text))
            Assert.Equal(w.Text, text[w.Start..w.End]);
        Assert.Equal(["Łódź", "(", "1968", ")", "–", "ok"], Words(text));
    }

    [Fact]
    public void ControlCharactersSeparateAndNeverJoinWords()
    {
        Assert.Equal(["a", "b", "c"], Words("a\u0000b\u0007c\u001B"));
        Assert.Empty(Words(""));
        Assert.Empty(Words("\u0001\u0002 \r\n"));
    }

    [Fact]
    public void HanRunsBreakFromLatinLetters()
    {
        Assert.Equal(["我", "住", "在", "北京"], Words("我 住 在 北京"));
        Assert.Equal(["Beijing", "北京", "2008"], Words("Beijing北京2008"));
    }
}
