using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions.Actions;

/// <summary><c>merge-headings</c>: the heading's mentions join another heading of the same label,
/// named by <paramref name="Into"/> (id, name or variant).</summary>
public sealed record MergeHeadings(SourceLine At, string? Interview, NameLabel? Label, string Name, string Into)
    : HeadingDecision(At, ActionName, Interview, Label, Name)
{
    public const string ActionName = "merge-headings";

    protected override string? Value => Into;

    internal override bool Apply(HeadingDraft heading, HeadingEdit edit)
    {
        var into = edit.Drafts.FirstOrDefault(t => t != heading && t.Label == heading.Label && t.Answers(Label, Into));
        if (into is null) return false;
        into.Absorb(heading, edit.Times);
        edit.Drafts.Remove(heading);
        return true;
    }

    public sealed class Parser : IDecisionAction
    {
        public string Name => ActionName;

        public Decision? Parse(DecisionRow row, out string? problem)
        {
            problem = row.Value is null ? "merge-headings needs the heading to merge into in the value column" : null;
            return problem is null ? new MergeHeadings(row.At, row.Interview, row.Label, row.Name, row.Value!) : null;
        }
    }
}
