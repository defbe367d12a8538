using System.Text.Json;
using System.Text.RegularExpressions;
using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;

namespace SwitchTag.Pipeline.Tests;

/// <summary>One gold heading: label, heading name, every surface as it occurs in the talk, and for
/// places the GeoNames id (null when the place has no city entry; absent in the demo gold) and country.</summary>
public sealed record GoldEntry(string Label, string Name, IReadOnlyList<string> Surfaces, bool HasGeonameId, long? GeonameId, string? Country)
{
    public static IReadOnlyList<GoldEntry> ReadAll(JsonElement root) =>
        root.GetProperty("headings").EnumerateArray().Select(h => new GoldEntry(
            h.GetProperty("label").GetString()!, h.GetProperty("name").GetString()!,
            h.GetProperty("surfaces").EnumerateArray().Select(s => s.GetString()!).ToList(),
            h.TryGetProperty("geonameId", out var g),
            g.ValueKind == JsonValueKind.Number ? g.GetInt64() : null,
            h.TryGetProperty("country", out var c) ? c.GetString() : null)).ToList();

    public HashSet<string> Forms { get; } = Surfaces.Append(Name).Select(NameFolding.Fold).ToHashSet(StringComparer.Ordinal);
}

/// <summary>An index scored against gold, counted as scripts/eval-index counts (that script is where
/// the issue-10 targets are measured): found, wrong, persons merged right, place links right, and
/// place mentions lying inside a gold person's surface.</summary>
public sealed record GoldScore(int Gold, int Found, int Produced, int Wrong, int Persons, int MergedRight,
    int PlacesFound, int LinksRight, int PersonsAsPlaces, IReadOnlyList<string> Lines)
{
    public static GoldScore Of(IReadOnlyList<GoldEntry> gold, InterviewIndex index)
    {
        var heads = index.Headings;
        var variants = heads.Select(h => h.Variants.Select(NameFolding.Fold).ToHashSet(StringComparer.Ordinal)).ToList();
        var lines = new List<string>();
        var hits = new Dictionary<int, int>();
        for (int g = 0; g < gold.Count; g++)
        {
            int hit = Enumerable.Range(0, heads.Length).FirstOrDefault(i => heads[i].Label.ToString() == gold[g].Label && variants[i].Overlaps(gold[g].Forms), -1);
            if (hit < 0) { lines.Add($"missed  {gold[g].Label} {gold[g].Name}"); continue; }
            hits[g] = hit;
            var p = heads[hit].Place;
            lines.Add($"found   {gold[g].Label} {gold[g].Name} as \"{heads[hit].Name}\" [{string.Join(", ", heads[hit].Variants)}]" +
                      (p is null ? "" : $" -> {p.Name}, {p.Country}"));
        }
        var wrong = Enumerable.Range(0, heads.Length).Where(i => !hits.ContainsValue(i) &&
            !gold.Any(g => g.Label == heads[i].Label.ToString() && variants[i].Overlaps(g.Forms))).ToList();
        lines.AddRange(wrong.Select(i => $"wrong   {heads[i].Label} \"{heads[i].Name}\" [{string.Join(", ", heads[i].Variants)}]" +
                                         (heads[i].Place is { } p ? $" -> {p.Name}, {p.Country}" : "")));

        var persons = Enumerable.Range(0, gold.Count).Where(g => gold[g].Label == "PER").ToList();
        int merged = persons.Count(g =>
        {
            var holders = Enumerable.Range(0, heads.Length).Where(i => variants[i].Overlaps(gold[g].Forms)).ToList();
            if (!hits.ContainsKey(g) || holders.Count != 1 || heads[holders[0]].Label != NameLabel.PER) return false;
            var others = gold.Where((_, o) => o != g).SelectMany(o => o.Forms).ToHashSet(StringComparer.Ordinal);
            return !variants[holders[0]].Except(gold[g].Forms).Any(others.Contains);
        });

        var places = hits.Keys.Where(g => gold[g].Label == "LOC").ToList();
        int links = places.Count(g => LinkRight(gold[g], heads[hits[g]].Place));

        var personSurfaces = persons.SelectMany(g => gold[g].Surfaces).ToList();
        var personForms = persons.SelectMany(g => gold[g].Forms).ToHashSet(StringComparer.Ordinal);
        var asPlaces = heads.Where(h => h.Label == NameLabel.LOC).SelectMany(h => h.Mentions).Select(m => index.MentionAt(m).Mention)
            .Where(m => personForms.Contains(NameFolding.Fold(m.Text)) || personSurfaces.Any(s => Covers(index.TurnAt(m.Turn).Text, s, m.CharStart, m.CharEnd)))
            .ToList();
        lines.AddRange(asPlaces.Select(m => $"PER->LOC \"{m.Text}\" in turn {m.Turn}"));
        return new GoldScore(gold.Count, hits.Count, heads.Length, wrong.Count, persons.Count, merged, places.Count, links, asPlaces.Count, lines);
    }

    // The gold id when there is one; else the gold country, or no link where the eval gold says the
    // place has no city entry; else (a historical region without a country) no link at all.
    private static bool LinkRight(GoldEntry g, PlaceLink? place)
    {
        if (g.GeonameId is { } id) return place is not null && place.GeonameId == id;
        if (g.Country is not null) return place is null ? g.HasGeonameId : place.Country == g.Country;
        return place is null;
    }

    private static bool Covers(string text, string surface, int start, int end) =>
        Regex.Matches(text, @"(?<!\w)" + Regex.Escape(surface) + @"(?!\w)").Any(m => m.Index <= start && end <= m.Index + m.Length);

    public string Summary(string interview) =>
        $"{interview}: found {Found}/{Gold}, wrong {Wrong}/{Produced}, merged right {MergedRight}/{Persons}, " +
        $"links right {LinksRight}/{PlacesFound}, persons as places {PersonsAsPlaces}";
}
