using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Lexicon;

/// <summary>One row of an authority list: the label it must carry, the preferred name, the other
/// spellings it may appear under, and where it was read.</summary>
public sealed record AuthorityEntry(NameLabel Label, string Name, ImmutableArray<string> Variants, SourceLine At);
