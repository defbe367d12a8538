using SwitchTag.Indexing.Decisions.Actions;

namespace SwitchTag.Indexing.Decisions;

/// <summary>The registry of decision actions, by the name the action column uses (any case). Its
/// order is the order the "unknown action" message lists them in.</summary>
public sealed class DecisionActions
{
    private readonly List<IDecisionAction> _actions = [];

    public static DecisionActions Default { get; } = new DecisionActions()
        .Add(new RejectMention.Parser())
        .Add(new AcceptMention.Parser())
        .Add(new RelabelMention.Parser())
        .Add(new RejectHeading.Parser())
        .Add(new RelabelHeading.Parser())
        .Add(new MergeHeadings.Parser())
        .Add(new RenameHeading.Parser());

    public DecisionActions Add(IDecisionAction action)
    {
        if (Find(action.Name) is not null) throw new ArgumentException($"a decision action named {action.Name} is already registered");
        _actions.Add(action);
        return this;
    }

    public IEnumerable<string> Names => _actions.Select(a => a.Name);

    public IDecisionAction? Find(string? name) =>
        _actions.FirstOrDefault(a => string.Equals(a.Name, name, StringComparison.OrdinalIgnoreCase));
}
