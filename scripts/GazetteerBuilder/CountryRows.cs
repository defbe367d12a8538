using System.Collections.Immutable;
using System.Text.Json;
using SwitchTag.Lexicon;

/// <summary>Countries as gazetteer rows: names in every locale of the npm package i18n-iso-countries
/// (langs/*.json, MIT), pinned at the population-weighted centre of the country's GeoNames places
/// (averaged as unit vectors, so countries across the 180th meridian come out right), with the sum
/// of those places' populations. GeoNames ids are not in that package, so a country's id is minus
/// its ISO 3166-1 numeric code (Poland: -616), never a real GeoNames id. Feature code PCLI.</summary>
internal static class CountryRows
{
    /// <summary>Short English names the package lacks, in everyday use for a whole country (from memory).</summary>
    private static readonly (string Code, string Name)[] Aliases =
    [
        ("US", "America"), ("NL", "Holland"), ("GB", "Britain"), ("GB", "England"), ("GB", "Scotland"), ("GB", "Wales"),
    ];

    public static List<GeoNamesRow> Build(string packageDir, IReadOnlyList<GeoNamesRow> cities)
    {
        var numeric = new Dictionary<string, long>();
        using (var codes = JsonDocument.Parse(File.ReadAllText(Path.Combine(packageDir, "codes.json"))))
            foreach (var row in codes.RootElement.EnumerateArray())
                if (long.TryParse(row[2].GetString(), out long n)) numeric[row[0].GetString()!] = n;

        var names = new Dictionary<string, List<string>>();
        // English first, so the main name is the English one.
        var langs = Directory.GetFiles(Path.Combine(packageDir, "langs"), "*.json")
            .OrderBy(f => Path.GetFileName(f) == "en.json" ? 0 : 1)
            .ThenBy(f => f, StringComparer.Ordinal);
        foreach (var file in langs)
        {
            using var doc = JsonDocument.Parse(File.ReadAllText(file));
            foreach (var country in doc.RootElement.GetProperty("countries").EnumerateObject())
            {
                var list = names.TryGetValue(country.Name, out var l) ? l : names[country.Name] = [];
                if (country.Value.ValueKind == JsonValueKind.Array)
                    list.AddRange(country.Value.EnumerateArray().Select(v => v.GetString()!));
                else list.Add(country.Value.GetString()!);
            }
        }
        foreach (var (code, alias) in Aliases) names[code].Add(alias);

        var byCountry = cities.GroupBy(r => r.Place.Country).ToDictionary(g => g.Key, g => g.Select(r => r.Place).ToList());
        var rows = new List<GeoNamesRow>();
        foreach (var (code, list) in names.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            if (!numeric.TryGetValue(code, out long n) || !byCountry.TryGetValue(code, out var places)) continue;
            var (lat, lon) = WeightedCentre(places);
            var kept = list.Where(ScriptFilter.InKeptScripts).Distinct(StringComparer.Ordinal).ToImmutableArray();
            if (kept.IsEmpty) continue;
            // The main name is the English one even when too long to be searched for.
            var place = new GazetteerPlace(-n, list[0], lat, lon, code, places.Sum(p => p.Population), "PCLI");
            rows.Add(new GeoNamesRow(place, kept));
        }
        return rows;
    }

    private static (double Lat, double Lon) WeightedCentre(List<GazetteerPlace> places)
    {
        double x = 0, y = 0, z = 0;
        foreach (var p in places)
        {
            double w = Math.Max(p.Population, 1), la = double.DegreesToRadians(p.Latitude), lo = double.DegreesToRadians(p.Longitude);
            x += w * Math.Cos(la) * Math.Cos(lo);
            y += w * Math.Cos(la) * Math.Sin(lo);
            z += w * Math.Sin(la);
        }
        double lat = double.RadiansToDegrees(Math.Atan2(z, Math.Sqrt(x * x + y * y)));
        double lon = double.RadiansToDegrees(Math.Atan2(y, x));
        return (Math.Round(lat, 5), Math.Round(lon, 5));
    }
}
