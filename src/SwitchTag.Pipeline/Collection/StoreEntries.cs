using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Time;
using SwitchTag.Output;
using SwitchTag.Store;

namespace SwitchTag.Pipeline.Collection;

/// <summary>The collection pages' entries from the store, so they cover every interview indexed into
/// the output folder, whichever run indexed it.</summary>
public static class StoreEntries
{
    /// <summary>Every stored interview as the collection writers take it. A stored decision is given
    /// back as the run's own decision with the same text (a decision file's rows are part of the run's
    /// fingerprint, so an interview indexed under other decisions is redone when its source is in the run).</summary>
    public static List<CollectionEntry> Of(CollectionStore store, ImmutableArray<Decision> decisions)
    {
        var byText = new Dictionary<string, Decision>(StringComparer.Ordinal);
        foreach (var d in decisions) byText.TryAdd(DecisionKey(d), d);
        return store.Collection().Select(i => new CollectionEntry(i.Name, i.Folder, i.MainLanguage, i.Duration - Timecode.Zero,
            i.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place, h.Times, h.Variants)).ToImmutableArray(),
            i.Mentions.Select(m => new CollectionMention(m.Time, m.Mention, m.Speaker, m.HeadingId, m.ReviewReason, m.TurnText)).ToImmutableArray(),
            i.Decisions.Select(t => byText.GetValueOrDefault(t)).OfType<Decision>().ToImmutableArray())).ToList();
    }

    /// <summary>How a decision is kept in the store: its record's text (action, row and cells).</summary>
    public static string DecisionKey(Decision d) => d.ToString();
}
