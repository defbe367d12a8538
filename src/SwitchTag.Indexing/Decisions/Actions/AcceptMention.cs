using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>accept-mention</c>: the mention stays as tagged and is not held for review.</summary>
public sealed record AcceptMention(SourceLine At, string Interview, string Name, MentionTarget Target)
    : MentionDecision(At, ActionName, Interview, Name, Target)
{
    public const string ActionName = "accept-mention";

    public override Mention? Apply(Mention mention) => mention;

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem) =>
            (problem = row.MentionTarget(out var interview, out var target)) is null
                ? new AcceptMention(row.At, interview, row.Name, target!) : null;
    }
}
