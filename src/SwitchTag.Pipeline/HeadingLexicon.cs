using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Pipeline;

/// <summary>The lexicon seen by heading building: the lexicon's own grouping key (fold and per-language
/// stem), its gazetteer lookup (folded, inflected and other-language names) and the name lists'
/// first names, surname keys, diminutives and equivalents, and the camps and historical regions whose
/// spoken names a link would replace (a camp's town from the gazetteer, else the list's own centre).</summary>
public sealed class HeadingLexicon(Gazetteer gazetteer, NameListSet? lists = null) : IHeadingLexicon
{
    private readonly NameListSet _lists = lists ?? NameListSet.Empty;

    public string Key(string name, string language) => NameFolding.Key(name, language);

    public ImmutableArray<PlaceLink> Places(string name, string language) =>
        gazetteer.Lookup(name, language)
            .Select(p => new PlaceLink(p.GeonameId, p.Name, p.Latitude, p.Longitude, p.Country, p.Population))
            .ToImmutableArray();

    public ListedPlace? Listed(string name, string language)
    {
        if (_lists.Places.Find(name) is not { } listed) return null;
        var at = listed.At is null ? null
            : gazetteer.Lookup(listed.At, "und").Where(p => p.Country == listed.Countries[0] && Key(p.Name, "und") == Key(listed.At, "und"))
                .Select(p => new PlaceLink(p.GeonameId, p.Name, p.Latitude, p.Longitude, p.Country, p.Population)).FirstOrDefault()
              ?? new PlaceLink(0, listed.At, listed.Latitude, listed.Longitude, listed.Countries[0], 0);
        return new ListedPlace(listed.Name, listed.Kind, listed.IsSite, at, listed.Countries);
    }

    public bool IsFirstName(string word) => _lists.Cues.IsFirstName(NameFolding.Fold(word));

    public string SurnameKey(string word, string language) => _lists.Variants.Key(NameFolding.Stem(word, language));

    public bool SameGivenName(string a, string languageA, string b, string languageB) =>
        _lists.Variants.SameGivenName(a, b)
        || _lists.Variants.SameGivenName(NameFolding.Stem(a, languageA), NameFolding.Stem(b, languageB))
        || Key(a, languageA) == Key(b, languageB);

    public bool EquivalentGivenNames(string a, string b) => _lists.Variants.Equivalent(a, b);
}
