using System.Globalization;
using SwitchTag.Lexicon;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Lexicon.Tests;

/// <summary>A gazetteer built from the shared GeoNames extract (../shared/data/gazetteer/
/// geonames-cities15000.txt, CC BY), written to the compact file format and read back through
/// <see cref="Gazetteer.Load"/>: the same path the shipped file takes. Cautions come from the shared
/// Universal Dependencies sentences (../shared/data/lid) and the training splits of Universal NER
/// and the Broad Twitter Corpus (../shared/data/ner/uner, ../shared/data/ner-extra/btc).</summary>
public sealed class GeoNamesFixture : IDisposable
{
    public const string GeoNamesFile = "gazetteer/geonames-cities15000.txt";

    private readonly string _file = Path.Combine(Path.GetTempPath(), $"gazetteer-{Guid.NewGuid():N}.bin.gz");

    public GeoNamesFixture()
    {
        var source = TestPaths.RequireData(GeoNamesFile);
        var corpora = Directory.GetFiles(TestPaths.RequireData("lid"), "*.txt");
        var ner = Directory.GetFiles(TestPaths.RequireData("ner/uner"), "*-train.iob2", SearchOption.AllDirectories)
            .Append(TestPaths.RequireData("ner-extra/btc/btc.train"));
        Built = Gazetteer.FromGeoNamesText(source, corpora, ner);
        Built.Save(_file);
        Loaded = Gazetteer.Load(_file);
    }

    public Gazetteer Built { get; }

    public Gazetteer Loaded { get; }

    public void Dispose() => File.Delete(_file);

    /// <summary>A row of the shared GeoNames file read independently of the library: id, name,
    /// latitude, longitude, country.</summary>
    public static (long Id, string Name, double Lat, double Lon, string Country) Row(long geonameId)
    {
        var prefix = geonameId.ToString(CultureInfo.InvariantCulture) + "\t";
        var line = File.ReadLines(TestPaths.RequireData(GeoNamesFile)).Single(l => l.StartsWith(prefix, StringComparison.Ordinal));
        var c = line.Split('\t');
        return (geonameId, c[1], double.Parse(c[4], CultureInfo.InvariantCulture), double.Parse(c[5], CultureInfo.InvariantCulture), c[8]);
    }

    /// <summary>The geonameid of the most populous row whose main name is <paramref name="name"/>.</summary>
    public static long IdOf(string name) =>
        File.ReadLines(TestPaths.RequireData(GeoNamesFile))
            .Select(l => l.Split('\t'))
            .Where(c => c.Length > 14 && c[1] == name)
            .OrderByDescending(c => long.Parse(c[14], CultureInfo.InvariantCulture))
            .Select(c => long.Parse(c[0], CultureInfo.InvariantCulture))
            .First();
}
