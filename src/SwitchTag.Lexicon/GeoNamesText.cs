using System.Collections.Immutable;
using System.Globalization;
using SwitchTag.Core.Documents;

namespace SwitchTag.Lexicon;

/// <summary>One row of a GeoNames cities dump and the names it is known by (main, ASCII and the
/// kept alternate names, as written).</summary>
public sealed record GeoNamesRow(GazetteerPlace Place, ImmutableArray<string> Names);

/// <summary>Reads the GeoNames tab-separated dump format (cities1000.txt, cities15000.txt): geonameid,
/// name, asciiname, alternatenames (comma-separated), latitude, longitude, feature class, feature
/// code, country code, cc2, admin1–4, population, elevation, dem, timezone, modification date.</summary>
public static class GeoNamesText
{
    private const int MinColumns = 15;

    public static (ImmutableArray<GeoNamesRow> Rows, ImmutableArray<Diagnostic> Problems) Read(string path)
    {
        var rows = ImmutableArray.CreateBuilder<GeoNamesRow>();
        var problems = ImmutableArray.CreateBuilder<Diagnostic>();
        IEnumerable<string> lines;
        try
        {
            lines = File.ReadLines(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            problems.Add(new Diagnostic(new SourceLine(path, 1), Severity.Error, $"cannot read GeoNames file: {e.Message}"));
            return (rows.ToImmutable(), problems.ToImmutable());
        }
        int lineNumber = 0;
        foreach (var line in lines)
        {
            lineNumber++;
            if (line.Length == 0) continue;
            if (ParseLine(line) is { } row) rows.Add(row);
            else problems.Add(new Diagnostic(new SourceLine(path, lineNumber), Severity.Warning,
                "not a GeoNames row (needs 15+ tab-separated columns with numeric id, coordinates and population); skipped"));
        }
        return (rows.ToImmutable(), problems.ToImmutable());
    }

    public static GeoNamesRow? ParseLine(string line)
    {
        var c = line.Split('\t');
        if (c.Length < MinColumns) return null;
        var inv = CultureInfo.InvariantCulture;
        if (!long.TryParse(c[0], NumberStyles.None, inv, out long id)
            || !double.TryParse(c[4], NumberStyles.Float, inv, out double lat) || lat is < -90 or > 90
            || !double.TryParse(c[5], NumberStyles.Float, inv, out double lon) || lon is < -180 or > 180
            || c[1].Length == 0)
            return null;
        long population = long.TryParse(c[14], NumberStyles.None, inv, out long p) ? p : 0;
        var place = new GazetteerPlace(id, c[1], lat, lon, c[8], population, c[7]);
        var names = new List<string> { c[1] };
        if (c[2].Length > 0) names.Add(c[2]);
        foreach (var alt in c[3].Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
            if (ScriptFilter.Keep(alt)) names.Add(alt);
        return new GeoNamesRow(place, [.. names]);
    }
}
