using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon;

namespace SwitchTag.Tagging.Sources.Authority;

/// <summary>Names on an archive's authority list, with the label the list gives them.</summary>
public sealed class AuthorityListSource(AuthorityList list) : INameSource
{
    public MentionSource Source => MentionSource.Authority;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans) =>
        RuleMatching.Find(turn, turnText, spans, list.Find);
}
