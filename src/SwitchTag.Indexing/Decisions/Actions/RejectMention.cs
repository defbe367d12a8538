using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>reject-mention</c>: the mention is not a name; it leaves the index.</summary>
public sealed record RejectMention(SourceLine At, string Interview, string Name, MentionTarget Target)
    : MentionDecision(At, ActionName, Interview, Name, Target)
{
    public const string ActionName = "reject-mention";

    public override Mention? Apply(Mention mention) => null;

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem) =>
            (problem = row.MentionTarget(out var interview, out var target)) is null
                ? new RejectMention(row.At, interview, row.Name, target!) : null;
    }
}
