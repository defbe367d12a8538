using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;

namespace SwitchTag.Output.Collection;

/// <summary>The collection's headings: for every heading id across the run, the interviews using it.
/// Headings share an id across interviews when they link to one gazetteer place or fold to one key.</summary>
internal static class CollectionRows
{
    public sealed record Row(HeadingId Id, NameLabel Label, string Name, PlaceLink? Place, List<(CollectionEntry Entry, CollectionHeading Heading)> Uses);

    public static List<Row> Of(IReadOnlyList<CollectionEntry> entries)
    {
        var rows = new Dictionary<HeadingId, Row>();
        foreach (var e in entries)
            foreach (var h in e.Headings)
            {
                if (!rows.TryGetValue(h.Id, out var row)) rows[h.Id] = row = new Row(h.Id, h.Label, h.Name, h.Place, []);
                row.Uses.Add((e, h));
            }
        return HeadingOrder.Apply(rows.Values, r => r.Label, r => r.Name, r => r.Id).ToList();
    }
}
