using System.Collections;

namespace SwitchTag.Tagging;

/// <summary>The words of a text as <see cref="WordTokenizer"/> splits it, held as offsets: a word's
/// text is cut out when it is asked for, so one speaker turn of millions of words does not hold
/// millions of strings while it is tagged.</summary>
public sealed class TokenizedText(string text) : IReadOnlyList<WordToken>
{
    private readonly List<(int Start, int End)> _bounds = WordTokenizer.Bounds(text);

    public int Count => _bounds.Count;

    public WordToken this[int index] => new(_bounds[index].Start, _bounds[index].End, Text(index));

    /// <summary>The words' texts, in order.</summary>
    public IReadOnlyList<string> Texts => new WordTexts(this);

    private string Text(int index) => text[_bounds[index].Start.._bounds[index].End];

    public IEnumerator<WordToken> GetEnumerator()
    {
        for (int i = 0; i < Count; i++) yield return this[i];
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    private sealed class WordTexts(TokenizedText words) : IReadOnlyList<string>
    {
        public int Count => words.Count;
        public string this[int index] => words.Text(index);

        public IEnumerator<string> GetEnumerator()
        {
            for (int i = 0; i < Count; i++) yield return this[i];
        }

        IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
    }
}
