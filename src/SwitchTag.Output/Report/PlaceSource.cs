using SwitchTag.Core.Documents;

namespace SwitchTag.Output.Report;

/// <summary>Where a heading's coordinates come from: a GeoNames place, a country's weighted centre
/// (negative ids), or a hand-written list's own centre (id 0: a camp's town the gazetteer lacks).</summary>
internal static class PlaceSource
{
    public static string Of(PlaceLink p) => p.HasGeonameId ? $"GeoNames {p.GeonameId}" : p.GeonameId < 0 ? "country" : "approximate, from the name lists";
}
