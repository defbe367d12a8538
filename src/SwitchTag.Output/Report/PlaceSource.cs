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

    /// <summary>How the heading's name relates to its place: the place itself (nothing), a camp or
    /// historical place lying at it ("at "), or a place the gazetteer lacks that the talk put there.</summary>
    public static string Relation(Heading h) =>
        h.PlaceFromContext ? "in or near " : h.Place is { } p && p.Name != h.Name ? "at " : "";

    /// <summary><see cref="Describe(PlaceLink)"/>, saying when the talk, not the name, chose the place.</summary>
    public static string Describe(Heading h) =>
        Describe(h.Place!) + (h.PlaceFromContext ? "; placed by the town named just before it, not found by its own name" : "");

    /// <summary>"lat, lon; source", or "region CODE; no coordinates".</summary>
    public static string Describe(PlaceLink p) => p is { Latitude: { } lat, Longitude: { } lon }
        ? $"{Numbers.Coordinate(lat)}, {Numbers.Coordinate(lon)}; {Of(p)}"
        : $"{Of(p)}; no coordinates";
}
