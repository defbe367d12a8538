using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions;

/// <summary>One row of a decisions file, its action known and its name and label checked; the other
/// columns are raw text (null when empty) for the action to check.</summary>
public sealed record DecisionRow(SourceLine At, string Action, string? Interview, NameLabel? Label, string Name, string? Turn, string? Char, string? Value)
{
    /// <summary>The interview, turn and char a mention decision needs; the problem when one is missing.</summary>
    public string? MentionTarget(out string interview, out int turn, out int charAt)
    {
        interview = Interview ?? "";
        turn = charAt = 0;
        if (Interview is null) return "a mention decision needs the interview column";
        if (!int.TryParse(Turn, out turn) || !int.TryParse(Char, out charAt) || turn < 0 || charAt < 0)
            return "a mention decision needs the turn and char columns (whole numbers, from mentions.csv)";
        return null;
    }

    /// <summary>The label a relabel action sets; the problem when the value is not one.</summary>
    public string? NewLabel(out NameLabel label) =>
        Enum.TryParse(Value, ignoreCase: true, out label) ? null : $"relabel needs a value of PER, LOC or ORG, not \"{Value}\"";
}

/// <summary>One action a decisions file may name: its name in the action column and how a row
/// becomes its typed record.</summary>
public interface IDecisionAction
{
    string Name { get; }

    /// <summary>The decision, or null with <paramref name="problem"/> saying what the row lacks.</summary>
    Decision? Parse(DecisionRow row, out string? problem);
}
