using SwitchTag.Lexicon;

namespace SwitchTag.Lexicon.Tests;

/// <summary>A long text scanned window by window sees, from every word it starts at, the words the
/// whole list would show it. Text: invented sentences with names of several words (Nowy Sącz,
/// Bielsko-Biała, St. Louis), diacritics and a non-Latin script, repeated so names fall on seams.</summary>
public class NameWordWindowsTests
{
    private static readonly string Text = string.Concat(Enumerable.Repeat(
        "Potem pojechaliśmy z Nowego Sącza do Bielsko-Biała, a potem do St. Louis i Kraków; Москва 1945. ", 40));

    [Theory]
    [InlineData(1, 0)]
    [InlineData(7, 5)]
    [InlineData(16, 3)]
    [InlineData(4096, 5)]
    public void Every_start_word_sees_the_words_the_whole_list_shows_it(int size, int lookAhead)
    {
        var whole = NameWords.Split(Text);
        int seen = 0;
        foreach (var (words, starts) in NameWords.Windows(Text, lookAhead, size))
        {
            for (int i = 0; i < starts; i++, seen++)
            {
                int after = Math.Min(lookAhead, whole.Count - 1 - seen);
                Assert.Equal(whole.Skip(seen).Take(after + 1), words.Skip(i).Take(after + 1));
                Assert.True(words.Count >= i + after + 1);
            }
        }
        Assert.Equal(whole.Count, seen);
    }

    [Fact]
    public void A_text_without_words_has_no_window() =>
        Assert.Empty(NameWords.Windows(" ,.; ", 5));
}
