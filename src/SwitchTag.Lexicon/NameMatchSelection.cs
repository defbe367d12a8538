using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Lexicon;

/// <summary>Choosing among overlapping matches.</summary>
public static class NameMatchSelection
{
    /// <summary>Longest span first (earlier start on ties), dropping any that overlaps one already
    /// taken; the result is in text order.</summary>
    public static ImmutableArray<NameMatch> LongestFirst(IEnumerable<NameMatch> candidates)
    {
        var list = candidates.Where(m => m.CharEnd > m.CharStart && m.CharStart >= 0).ToList();
        if (list.Count == 0) return [];
        // One flag per char taken: a match is checked over its own chars only (names are short), so
        // the cost stays linear in the matches of a turn however many there are.
        var used = new CharFlags(list.Max(m => m.CharEnd));
        var taken = new List<NameMatch>();
        foreach (var m in list.OrderByDescending(m => m.Length).ThenBy(m => m.CharStart))
        {
            if (used.Any(m.CharStart, m.Length)) continue;
            used.Set(m.CharStart, m.Length);
            taken.Add(m);
        }
        return [.. taken.OrderBy(m => m.CharStart)];
    }
}
