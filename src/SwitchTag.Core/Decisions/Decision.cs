using SwitchTag.Core.Documents;

namespace SwitchTag.Core.Decisions;

/// <summary>One reviewer decision read from a decisions file (columns in SCHEMA.md). Each action is
/// its own record deriving from this one (SwitchTag.Indexing/Decisions/Actions), so applying one needs
/// no parsing. <paramref name="Interview"/> is null for a heading decision meant for every interview.</summary>
public abstract record Decision(SourceLine At, string Action, string? Interview, string Name)
{
    /// <summary>The row that writes this decision again (a review page carries earlier decisions forward).</summary>
    public abstract DecisionFields Fields { get; }
}

/// <summary>One decision as the cells of a decisions-file row, null for an empty cell.</summary>
public sealed record DecisionFields(string Action, string? Interview, string? Label, string Name, string? Time, string? Turn, string? Char, string? Value);

/// <summary>How often one decision took effect in one interview (0: it no longer matched anything).
/// Carried on the finished index so a caller reports it without watching the stage run.</summary>
public sealed record DecisionOutcome(Decision Decision, int Applied);
