using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Tagging.Sources.PlaceEvidence;

namespace SwitchTag.Tagging.Sources.Gazetteer;

/// <summary>Place names of the gazetteer, conservatively (see <see cref="Lexicon.Gazetteer.Find"/>).
/// With a <see cref="PlaceContext"/>, a match whose context supports a place is proposed as
/// <see cref="MentionSource.PlaceEvidence"/>, which the precedence ranks above the model, and the
/// others as <see cref="MentionSource.Gazetteer"/>, below it: one gazetteer pass feeds both ranks.</summary>
public sealed class GazetteerSource(Lexicon.Gazetteer gazetteer, PlaceContext? context = null) : INameSource
{
    public MentionSource Source => MentionSource.Gazetteer;

    /// <summary>Both ranks this source proposes at.</summary>
    public ImmutableArray<MentionSource> Proposes => context is null ? [MentionSource.Gazetteer] : [MentionSource.PlaceEvidence, MentionSource.Gazetteer];

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        var found = RuleMatching.Find(turn, turnText, spans, gazetteer.Find);
        return context is null ? found : [.. found.Select(m => context.Supports(m, turnText) ? m with { Source = MentionSource.PlaceEvidence } : m)];
    }
}
