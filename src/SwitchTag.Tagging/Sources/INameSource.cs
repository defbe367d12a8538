using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;

namespace SwitchTag.Tagging.Sources;

/// <summary>One source of names for the tag stage: it proposes mentions in a turn, each carrying
/// <see cref="Source"/>, and <see cref="NamePrecedence"/> decides which proposals stand where they overlap.
/// A source need not avoid overlapping other sources; its own proposals must not overlap each other.</summary>
public interface INameSource
{
    MentionSource Source { get; }

    /// <summary>Every source value its proposals carry, each needing a rank in the precedence; a
    /// source that splits its proposals by evidence (the gazetteer: place evidence or not) lists both.</summary>
    ImmutableArray<MentionSource> Proposes => [Source];

    /// <summary>Mentions in <paramref name="turnText"/> (offsets into it) of turn <paramref name="turn"/>,
    /// each with the language of the span it starts in.</summary>
    ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans);
}
