using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>A lexicon with a fixed place list (keyed by folded name or key) and a crude fold (lower case, marks removed, one Polish
/// case ending stripped), so heading tests do not move when the real lexicon changes; <paramref name="diminutives"/> maps a
/// diminutive to its full given name, <paramref name="listed"/> the camps and historical places by the name said, <paramref name="equivalents"/>
/// the given-name pairs listed as cross-language equivalents, <paramref name="firstNames"/> the words listed as first names.</summary>
public sealed class FakeLexicon(IReadOnlyDictionary<string, ImmutableArray<PlaceLink>> places, IReadOnlyDictionary<string, string>? diminutives = null,
    IReadOnlyDictionary<string, ListedPlace>? listed = null, IReadOnlyList<(string, string)>? equivalents = null,
    IReadOnlySet<string>? firstNames = null) : IHeadingLexicon
{
    public bool IsFirstName(string word) => firstNames?.Contains(word) == true;

    public bool EquivalentGivenNames(string a, string b) =>
        equivalents?.Any(e => (e.Item1 == a && e.Item2 == b) || (e.Item1 == b && e.Item2 == a)) == true;

    public ListedPlace? Listed(string name, LanguageCode language) => listed?.GetValueOrDefault(name);

    public bool SameGivenName(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        Key(a, languageA) == Key(b, languageB) || diminutives?.GetValueOrDefault(b) == a || diminutives?.GetValueOrDefault(a) == b;

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
