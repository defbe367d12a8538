using SwitchTag.Core.Documents;

namespace SwitchTag.Store;

/// <summary>Places within <paramref name="Kilometres"/> of a place linked in the collection.</summary>
public sealed record NearPlace(string Place, double Kilometres);

/// <summary>One search: words (may be empty when <see cref="Near"/> is set) and filters.</summary>
/// <param name="Speaker">Matched against the turn's speaker, folded (case and diacritics ignored).</param>
public sealed record SearchQuery(string Text, NameLabel? Label = null, string? Language = null, string? Speaker = null, NearPlace? Near = null);
