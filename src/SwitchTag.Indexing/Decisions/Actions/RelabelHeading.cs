using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>relabel-heading</c>: the heading and its mentions are names of another kind; the id
/// keeps its key under the new label's prefix.</summary>
public sealed record RelabelHeading(SourceLine At, string? Interview, NameLabel? Label, string Name, NameLabel NewLabel)
    : HeadingDecision(At, ActionName, Interview, Label, Name)
{
    public const string ActionName = "relabel-heading";

    protected override string? Value => NewLabel.ToString();

    internal override bool Apply(HeadingDraft heading, HeadingEdit edit)
    {
        if (heading.Label == NewLabel) return false;
        heading.Label = NewLabel;
        heading.Id = heading.Id.WithLabel(NewLabel);
        foreach (var m in heading.Members) edit.Labels[m.Index] = NewLabel;
        return true;
    }

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem) =>
            (problem = row.NewLabel(out var label)) is null ? new RelabelHeading(row.At, row.Interview, row.Label, row.Name, label) : null;
    }
}
