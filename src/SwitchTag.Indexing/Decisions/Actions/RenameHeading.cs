using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>rename-heading</c>: the heading is shown under another name (its id stays).</summary>
public sealed record RenameHeading(SourceLine At, string? Interview, NameLabel? Label, string Name, string NewName)
    : HeadingDecision(At, ActionName, Interview, Label, Name)
{
    public const string ActionName = "rename-heading";

    protected override string? Value => NewName;

    internal override bool Apply(HeadingDraft heading, HeadingEdit edit)
    {
        if (heading.Name == NewName) return false;
        heading.Name = NewName;
        return true;
    }

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem)
        {
            problem = row.Value is null ? "rename-heading needs the new name in the value column" : null;
            return problem is null ? new RenameHeading(row.At, row.Interview, row.Label, row.Name, row.Value!) : null;
        }
    }
}
