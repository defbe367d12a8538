using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>Language by word list: a word in <paramref name="words"/> takes that language, any other
/// word the main language; consecutive words of one language form one span, punctuation and spaces
/// between words of one language belong to the span.</summary>
public sealed class FakeSegmenter(IReadOnlyDictionary<string, string> words, string main = "en") : ILanguageSegmenter
{
    public IReadOnlyList<LanguageCode> Languages => [new("en"), new("pl"), new("de")];

    public LanguageGuess Identify(ReadOnlySpan<char> text) => new(new LanguageCode(main), 0.9);

    public ImmutableArray<LanguageSpan> Segment(string text, LanguageCode mainLanguage)
    {
        var spans = ImmutableArray.CreateBuilder<LanguageSpan>();
        int i = 0;
        while (i < text.Length)
        {
            while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
            if (i >= text.Length) break;
            int start = i;
            while (i < text.Length && !char.IsWhiteSpace(text[i])) i++;
            string word = text[start..i].Trim(',', '.', '!', '?', ':', ';');
            LanguageCode language = words.TryGetValue(word.ToLowerInvariant(), out var listed) ? new(listed) : mainLanguage;
            if (spans.Count > 0 && spans[^1].Language == language)
                spans[^1] = spans[^1] with { Chars = new CharSpan(spans[^1].CharStart, i) };
            else
                spans.Add(new LanguageSpan(new CharSpan(start, i), language, language == mainLanguage ? 0.95 : 0.8));
        }
        return spans.ToImmutable();
    }
}
