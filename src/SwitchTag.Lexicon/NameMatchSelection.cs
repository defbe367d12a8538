using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Lexicon;

/// <summary>Choosing among overlapping matches.</summary>
public static class NameMatchSelection
{
    /// <summary>Longest span first (earlier start on ties), dropping any that overlaps one already
    /// taken; the result is in text order.</summary>
    public static ImmutableArray<NameMatch> LongestFirst(IEnumerable<NameMatch> candidates)
    {
        var taken = new List<NameMatch>();
        foreach (var m in candidates.OrderByDescending(m => m.Length).ThenBy(m => m.CharStart))
            if (!taken.Any(t => t.Overlaps(m))) taken.Add(m);
        return [.. taken.OrderBy(m => m.CharStart)];
    }
}
