using System.Collections.Immutable;
using SwitchTag.Core.Ids;

namespace SwitchTag.Core.Documents;

/// <summary>The one order headings are listed in everywhere (index, reports, collection): by label
/// (PER, LOC, ORG), then name ignoring case, then id.</summary>
public static class HeadingOrder
{
    public static IOrderedEnumerable<T> Apply<T>(IEnumerable<T> items, Func<T, NameLabel> label, Func<T, string> name, Func<T, HeadingId> id) =>
        items.OrderBy(label).ThenBy(name, StringComparer.InvariantCultureIgnoreCase).ThenBy(id);

    public static ImmutableArray<Heading> Sort(IEnumerable<Heading> headings) =>
        Apply(headings, h => h.Label, h => h.Name, h => h.Id).ToImmutableArray();
}
