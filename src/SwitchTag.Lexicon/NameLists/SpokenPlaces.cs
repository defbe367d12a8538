using System.Collections.Concurrent;
using System.Collections.Frozen;
using System.Collections.Immutable;
using System.Globalization;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>A place that a gazetteer link would rename: a camp, ghetto or killing site (shown at the
/// town it lies at or beside, <see cref="At"/>), or a historical region or state (with the modern
/// countries that hold it).</summary>
public sealed record SpokenPlace(string Name, string Kind, string? At, ImmutableArray<string> Countries, double Latitude, double Longitude)
{
    public bool IsSite => At is not null;
}

/// <summary>Camps and ghettos (models/lexicon/camps-and-ghettos.tsv) and historical regions and states
/// (historical-regions.tsv), both hand-written (models/namelists.md), found by the whole name said,
/// folded.</summary>
public sealed record SpokenPlaces(FrozenDictionary<string, SpokenPlace> ByName)
{
    public static SpokenPlaces Empty { get; } = new(FrozenDictionary<string, SpokenPlace>.Empty);

    public SpokenPlace? Find(string name) => ByName.GetValueOrDefault(NameFolding.FoldedWords(name));

    /// <summary>The place by the whole name said, or by a case form of one of its names in the
    /// language said ("v Osvětimi", in Auschwitz, Czech locative).</summary>
    public SpokenPlace? Find(string name, LanguageCode language) =>
        Find(name) ?? _byKey.GetOrAdd(language, KeysIn).GetValueOrDefault(NameFolding.Key(name, language));

    /// <summary>Every name's grouping key in one language, built the first time that language is asked for.</summary>
    private readonly ConcurrentDictionary<LanguageCode, FrozenDictionary<string, SpokenPlace>> _byKey = new();

    private FrozenDictionary<string, SpokenPlace> KeysIn(LanguageCode language)
    {
        var byKey = new Dictionary<string, SpokenPlace>(StringComparer.Ordinal);
        foreach (var (name, place) in ByName)
            byKey.TryAdd(NameFolding.Key(name, language), place);
        return byKey.ToFrozenDictionary(StringComparer.Ordinal);
    }

    /// <summary>Every name of every listed place, folded: these are places, whatever a list of
    /// language names in some other language says ("galicia" is Finnish for the Galician language).</summary>
    public IEnumerable<string> Names => ByName.Keys;

    internal static SpokenPlaces Load(string lexiconDir)
    {
        var byName = new Dictionary<string, SpokenPlace>(StringComparer.Ordinal);
        // name, kind, the place it lies at, country, lat, lon, names
        foreach (var r in LexiconTsv.Rows(Path.Combine(lexiconDir, "camps-and-ghettos.tsv")).Where(r => r.Length > 6))
            Add(byName, new SpokenPlace(r[0], r[1], r[2], [r[3]], Number(r[4]), Number(r[5])), r[6]);
        // name, kind, modern countries, lat, lon, names
        foreach (var r in LexiconTsv.Rows(Path.Combine(lexiconDir, "historical-regions.tsv")).Where(r => r.Length > 5))
            Add(byName, new SpokenPlace(r[0], r[1], null, [.. r[2].Split(' ', StringSplitOptions.RemoveEmptyEntries)], Number(r[3]), Number(r[4])), r[5]);
        return new SpokenPlaces(byName.ToFrozenDictionary(StringComparer.Ordinal));
    }

    private static void Add(Dictionary<string, SpokenPlace> byName, SpokenPlace place, string names)
    {
        foreach (var name in LexiconTsv.Alternatives(names).Append(place.Name))
        {
            var key = NameFolding.FoldedWords(name);
            if (key.Length > 0) byName.TryAdd(key, place);
        }
    }

    private static double Number(string cell) => double.Parse(cell, CultureInfo.InvariantCulture);
}
