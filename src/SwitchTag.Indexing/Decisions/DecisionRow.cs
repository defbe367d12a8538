using SwitchTag.Core.Decisions;
using System.Globalization;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing.Decisions;

/// <summary>One row of a decisions file, its action known and its name and label checked; the other
/// columns are raw text (null when empty) for the action to check.</summary>
public sealed record DecisionRow(SourceLine At, string Action, string? Interview, NameLabel? Label, string Name, string? Time, string? Turn, string? Char, string? Value)
{
    /// <summary>The interview and the place in it a mention decision needs: the time column (seconds),
    /// else the turn and char columns of the first format; the problem when neither is usable.</summary>
    public string? MentionTarget(out string interview, out MentionTarget? target)
    {
        interview = Interview ?? "";
        target = null;
        if (Interview is null) return "a mention decision needs the interview column";
        if (Time is not null)
        {
            if (!double.TryParse(Time, NumberStyles.Float, CultureInfo.InvariantCulture, out double seconds) || seconds < 0 || !double.IsFinite(seconds))
                return $"the time column wants seconds such as 754.2, not \"{Time}\"";
            target = new MentionAtTime(Timecode.FromSeconds(seconds));
            return null;
        }
        if (!int.TryParse(Turn, out int turn) || !int.TryParse(Char, out int charAt) || turn < 0 || charAt < 0)
            return "a mention decision needs the time column (seconds), or the turn and char columns (whole numbers, from mentions.csv)";
        target = new MentionAtPosition(new TurnId(turn), charAt);
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
