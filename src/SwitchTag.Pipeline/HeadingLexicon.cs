using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Lexicon;

namespace SwitchTag.Pipeline;

/// <summary>The lexicon seen by heading building: the lexicon's own grouping key (fold and per-language
/// stem) and its gazetteer lookup (folded, inflected and other-language names).</summary>
public sealed class HeadingLexicon(Gazetteer gazetteer) : IHeadingLexicon
{
    public string Key(string name, string language) => NameFolding.Key(name, language);

    public ImmutableArray<PlaceLink> Places(string name, string language) =>
        gazetteer.Lookup(name, language)
            .Select(p => new PlaceLink(p.GeonameId, p.Name, p.Latitude, p.Longitude, p.Country, p.Population))
            .ToImmutableArray();
}
