using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing.Decisions;

/// <summary>A decision about one tagged mention, named by its interview, its text and where it is
/// (<see cref="MentionTarget"/>: its time, or the turn and char offset of the first format). Applied
/// before grouping; a decided mention skips the review section.</summary>
public abstract record MentionDecision(SourceLine At, string Action, string Interview, string Name, MentionTarget Target)
    : Decision(At, Action, Interview, Name)
{
    /// <summary>The text must be the same (case aside for a timed target, which a reviewer may retype)
    /// and the target must match.</summary>
    public bool Matches(Mention m, TimeRange time) =>
        string.Equals(m.Text, Name, Target is MentionAtTime ? StringComparison.OrdinalIgnoreCase : StringComparison.Ordinal) && Target.Matches(m, time);

    /// <summary>The mentions this decision means: every match of a turn and char; for a time only the
    /// closest match (the earlier on a tie), since one name said twice can fall within the tolerance.</summary>
    public IEnumerable<int> Pick(IReadOnlyList<Mention> mentions, IReadOnlyList<TimeRange> times) =>
        Pick(Enumerable.Range(0, mentions.Count), mentions, times);

    /// <summary><see cref="Pick(IReadOnlyList{Mention}, IReadOnlyList{TimeRange})"/> among
    /// <paramref name="candidates"/> (indices in ascending order), which must hold every mention of
    /// this decision's text.</summary>
    public IEnumerable<int> Pick(IEnumerable<int> candidates, IReadOnlyList<Mention> mentions, IReadOnlyList<TimeRange> times)
    {
        var matches = candidates.Where(i => Matches(mentions[i], times[i]));
        return Target is MentionAtTime at ? matches.OrderBy(i => Math.Abs((times[i].Start - at.Time).Milliseconds)).ThenBy(i => i).Take(1) : matches;
    }

    /// <summary>The mention after this decision, or null when it leaves the index.</summary>
    public abstract Mention? Apply(Mention mention);

    /// <summary>The value column as the log shows it, or null.</summary>
    protected virtual string? Value => null;

    public sealed override DecisionFields Fields
    {
        get
        {
            var (time, turn, charAt) = Target.Cells;
            return new DecisionFields(Action, Interview, null, Name, time, turn, charAt, Value);
        }
    }

    public sealed override string ToString() =>
        $"{At}: {Action} \"{Name}\" in {Interview} {Target}{(Value is null ? "" : " -> " + Value)}";
}
