using SwitchTag.Core.Documents;

namespace SwitchTag.Indexing;

public enum DecisionAction
{
    RejectMention,
    AcceptMention,
    RelabelMention,
    RejectHeading,
    RelabelHeading,
    MergeHeadings,
    RenameHeading,
}

/// <summary>One reviewer decision from the decisions file (columns documented in SCHEMA.md).</summary>
/// <param name="Interview">The interview it applies to; null for heading decisions meant for every interview.</param>
/// <param name="Label">For heading decisions, the heading's label (null matches any).</param>
/// <param name="Name">A mention's text, or a heading's id, name or one of its variants.</param>
/// <param name="Turn">A mention's turn index.</param>
/// <param name="Char">A mention's char offset in its turn.</param>
/// <param name="Value">The new label, the new name, or the heading merged into.</param>
public sealed record Decision(
    SourceLine At,
    DecisionAction Action,
    string? Interview,
    NameLabel? Label,
    string Name,
    int? Turn,
    int? Char,
    string? Value)
{
    public bool IsMentionDecision => Action is DecisionAction.RejectMention or DecisionAction.AcceptMention or DecisionAction.RelabelMention;

    public override string ToString() =>
        IsMentionDecision
            ? $"{At}: {DecisionsFile.ActionName(Action)} \"{Name}\" in {Interview} turn {Turn} char {Char}{(Value is null ? "" : " -> " + Value)}"
            : $"{At}: {DecisionsFile.ActionName(Action)} {Label?.ToString() ?? "any"} \"{Name}\"{(Value is null ? "" : " -> " + Value)}";
}

/// <summary>How often one decision took effect in a run (0: it no longer matched anything).</summary>
public sealed record DecisionOutcome(Decision Decision, string Interview, int Applied);
