using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing.Decisions;

/// <summary>A decision about the headings named <see cref="Decision.Name"/> (id, name or a variant,
/// ignoring case), of <paramref name="Label"/> when given. Applied after grouping, in file order.</summary>
public abstract record HeadingDecision(SourceLine At, string Action, string? Interview, NameLabel? Label, string Name)
    : Decision(At, Action, Interview, Name)
{
    /// <summary>Changes <paramref name="heading"/> (one of <paramref name="edit"/>'s drafts); false when
    /// there was nothing to change, so the decision does not count as applied.</summary>
    internal abstract bool Apply(HeadingDraft heading, HeadingEdit edit);

    protected virtual string? Value => null;

    public sealed override DecisionFields Fields => new(Action, Interview, Label?.ToString(), Name, null, null, null, Value);

    public sealed override string ToString() =>
        $"{At}: {Action} {Label?.ToString() ?? "any"} \"{Name}\"{(Value is null ? "" : " -> " + Value)}";
}
