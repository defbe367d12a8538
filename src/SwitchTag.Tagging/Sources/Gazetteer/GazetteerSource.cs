using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Tagging.Sources.Gazetteer;

/// <summary>Place names of the gazetteer, conservatively (see <see cref="Lexicon.Gazetteer.Find"/>).</summary>
public sealed class GazetteerSource(Lexicon.Gazetteer gazetteer) : INameSource
{
    public MentionSource Source => MentionSource.Gazetteer;

    public ImmutableArray<Mention> Find(int turn, string turnText, ImmutableArray<LanguageSpan> spans) =>
        RuleMatching.Find(turn, turnText, spans, gazetteer.Find);
}
