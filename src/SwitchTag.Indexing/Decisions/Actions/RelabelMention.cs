using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>relabel-mention</c>: the mention is a name of another kind.</summary>
public sealed record RelabelMention(SourceLine At, string Interview, string Name, MentionTarget Target, NameLabel NewLabel)
    : MentionDecision(At, ActionName, Interview, Name, Target)
{
    public const string ActionName = "relabel-mention";

    public override Mention? Apply(Mention mention) => mention with { Label = NewLabel };

    protected override string? Value => NewLabel.ToString();

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem)
        {
            NameLabel label = default;
            problem = row.MentionTarget(out var interview, out var target) ?? row.NewLabel(out label);
            return problem is null ? new RelabelMention(row.At, interview, row.Name, target!, label) : null;
        }
    }
}
