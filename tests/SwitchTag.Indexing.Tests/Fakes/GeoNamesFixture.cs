using System.Collections.Immutable;
using System.Globalization;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>Rows of the GeoNames cities15000 dump (../shared/data/gazetteer, CC BY), indexed by the folded
/// form and key of its name, ASCII name and every alternate name: the outside source the place-resolution tests check against.</summary>
public static class GeoNamesFixture
{
    private static readonly FakeLexicon Keyer = new(new Dictionary<string, ImmutableArray<PlaceLink>>());

    private static readonly Lazy<Dictionary<string, ImmutableArray<PlaceLink>>> Index = new(Load);

    public static IReadOnlyDictionary<string, ImmutableArray<PlaceLink>> Places => Index.Value;

    public static FakeLexicon Lexicon() => new(Places);

    private static Dictionary<string, ImmutableArray<PlaceLink>> Load()
    {
        var byName = new Dictionary<string, List<PlaceLink>>(StringComparer.Ordinal);
        foreach (var line in File.ReadLines(TestPaths.RequireData("gazetteer/geonames-cities15000.txt")))
        {
            var f = line.Split('\t');
            if (f.Length < 15) continue;
            var place = new PlaceLink(long.Parse(f[0], CultureInfo.InvariantCulture), f[1],
                double.Parse(f[4], CultureInfo.InvariantCulture), double.Parse(f[5], CultureInfo.InvariantCulture),
                f[8], long.Parse(f[14], CultureInfo.InvariantCulture));
            var names = new HashSet<string>(StringComparer.Ordinal) { FakeLexicon.Fold(f[1]), FakeLexicon.Fold(f[2]) };
            foreach (var alt in f[3].Split(',', StringSplitOptions.RemoveEmptyEntries)) names.Add(FakeLexicon.Fold(alt));
            foreach (var n in names.ToList()) names.Add(Keyer.Key(n, LanguageCode.Undetermined));
            foreach (var n in names)
            {
                if (!byName.TryGetValue(n, out var list)) byName[n] = list = [];
                list.Add(place);
            }
        }
        return byName.ToDictionary(kv => kv.Key, kv => kv.Value.ToImmutableArray(), StringComparer.Ordinal);
    }
}
