using SwitchTag.Core.Documents;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.Report;

/// <summary>Where a heading's coordinates come from: a GeoNames place, a country's weighted centre
/// (negative ids), a hand-written list's own centre (id 0: a camp's town the gazetteer lacks), or
/// none (a first-level region, linked by its ISO 3166-2 code).</summary>
internal static class PlaceSource
{
    public static string Of(PlaceLink p) =>
        p.Region is not null ? $"region {p.Region}" : p.HasGeonameId ? $"GeoNames {p.GeonameId}" : p.GeonameId < 0 ? "country" : "approximate, from the name lists";

    /// <summary>"lat, lon; source", or "region CODE; no coordinates".</summary>
    public static string Describe(PlaceLink p) => p is { Latitude: { } lat, Longitude: { } lon }
        ? $"{Numbers.Coordinate(lat)}, {Numbers.Coordinate(lon)}; {Of(p)}"
        : $"{Of(p)}; no coordinates";
}
