using SwitchTag.Core.Ids;

namespace SwitchTag.Indexing.Decisions;

/// <summary>The mention ids after heading decisions drop some mentions: the kept mentions close up in
/// their order, and every id that points at one (a heading's members, a review item) is mapped by
/// <see cref="Map"/>, so no list is renumbered by hand.</summary>
internal sealed class MentionRenumbering
{
    private readonly int[] _newIndex;

    /// <param name="dropped">Per mention as grouped, whether it leaves the index.</param>
    public MentionRenumbering(IReadOnlyList<bool> dropped)
    {
        _newIndex = new int[dropped.Count];
        for (int i = 0; i < dropped.Count; i++)
            _newIndex[i] = dropped[i] ? -1 : KeptCount++;
    }

    public int KeptCount { get; }

    /// <summary>The mention's id among the kept mentions, or null when it was dropped.</summary>
    public MentionId? Map(MentionId grouped) => _newIndex[grouped.Index] is >= 0 and var kept ? new MentionId(kept) : null;
}
