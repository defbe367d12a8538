using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions;

/// <summary>A decision about one tagged mention, named as mentions.csv names it: interview, turn,
/// char offset and text. Applied before grouping; a decided mention skips the review section.</summary>
public abstract record MentionDecision(SourceLine At, string Action, string Interview, string Name, int Turn, int Char)
    : Decision(At, Action, Interview, Name)
{
    public bool Matches(Mention m) => m.Turn == Turn && m.CharStart == Char && string.Equals(m.Text, Name, StringComparison.Ordinal);

    /// <summary>The mention after this decision, or null when it leaves the index.</summary>
    public abstract Mention? Apply(Mention mention);

    /// <summary>The value column as the log shows it, or null.</summary>
    protected virtual string? Value => null;

    public sealed override string ToString() =>
        $"{At}: {Action} \"{Name}\" in {Interview} turn {Turn} char {Char}{(Value is null ? "" : " -> " + Value)}";
}
