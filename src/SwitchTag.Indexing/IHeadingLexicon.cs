using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing;

/// <summary>What heading building needs from the lexicon: a grouping key that folds spelling
/// variants, diacritics and inflections, and the gazetteer places a name can mean (alternate names in
/// every language included). Kept as an interface so grouping is testable without the shipped files.</summary>
public interface IHeadingLexicon
{
    string Key(string name, string language);

    /// <summary>Every gazetteer place the name may denote; empty when the gazetteer does not know it.</summary>
    ImmutableArray<PlaceLink> Places(string name, string language);
}
