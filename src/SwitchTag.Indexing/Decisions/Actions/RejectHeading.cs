using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>reject-heading</c>: the heading and all its mentions leave the index.</summary>
public sealed record RejectHeading(SourceLine At, string? Interview, NameLabel? Label, string Name)
    : HeadingDecision(At, ActionName, Interview, Label, Name)
{
    public const string ActionName = "reject-heading";

    internal override bool Apply(HeadingDraft heading, HeadingEdit edit)
    {
        foreach (var m in heading.Members) edit.Dropped[m.Index] = true;
        edit.Drafts.Remove(heading);
        return true;
    }

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem)
        {
            problem = null;
            return new RejectHeading(row.At, row.Interview, row.Label, row.Name);
        }
    }
}
