using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>A lexicon with a fixed place list (keyed by folded name or key) and a crude fold (lower case, marks removed, one Polish
/// case ending stripped), so heading tests do not move when the real lexicon changes.</summary>
public sealed class FakeLexicon(IReadOnlyDictionary<string, ImmutableArray<PlaceLink>> places) : IHeadingLexicon
{
    public string Key(string name, LanguageCode language) =>
        string.Join(' ', Fold(name).Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(Stem));

    /// <summary>By folded name, else by key (so an inflected form finds its nominative).</summary>
    public ImmutableArray<PlaceLink> Places(string name, LanguageCode language) =>
        places.TryGetValue(Fold(name), out var found) || places.TryGetValue(Key(name, language), out found) ? found : [];

    public static string Fold(string text)
    {
        var sb = new StringBuilder();
        foreach (char c in text.Normalize(NormalizationForm.FormD))
        {
            if (CharUnicodeInfo.GetUnicodeCategory(c) == UnicodeCategory.NonSpacingMark) continue;
            sb.Append(c == 'ł' || c == 'Ł' ? 'l' : char.ToLowerInvariant(c));
        }
        return sb.ToString();
    }

    private static string Stem(string word)
    {
        foreach (var ending in new[] { "ie", "y", "a" })
            if (word.Length > ending.Length + 4 && word.EndsWith(ending, StringComparison.Ordinal))
                return word[..^ending.Length];
        return word;
    }
}
