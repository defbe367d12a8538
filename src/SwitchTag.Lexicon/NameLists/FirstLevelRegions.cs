using System.Collections.Frozen;
using System.Collections.Immutable;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>A first-level subdivision of a country (state, voivodeship, province, oblast): its ISO
/// 3166-2 code, its country and the spelling found. No coordinates: the shipped lists have none
/// under a licence this project can ship (models/namelists.md).</summary>
public sealed record FirstLevelRegion(string Code, string Country, string Name);

/// <summary>First-level regions from models/lexicon/regions.tsv (Debian iso-codes and CLDR names in
/// the 29 locales), found by the whole name said, folded. One spelling may name regions of several
/// countries (Limburg in the Netherlands and in Belgium): all are returned, in code order.</summary>
public sealed record FirstLevelRegions(FrozenDictionary<string, ImmutableArray<FirstLevelRegion>> ByName)
{
    public static FirstLevelRegions Empty { get; } = new(FrozenDictionary<string, ImmutableArray<FirstLevelRegion>>.Empty);

    public ImmutableArray<FirstLevelRegion> Find(string name) =>
        ByName.GetValueOrDefault(NameFolding.FoldedWords(name), []);

    /// <summary>Every name of every region, with its region; the spelling kept is the list's own.</summary>
    internal static FirstLevelRegions Load(string lexiconDir)
    {
        var byName = new Dictionary<string, List<FirstLevelRegion>>(StringComparer.Ordinal);
        // code, country, names
        foreach (var r in LexiconTsv.Rows(Path.Combine(lexiconDir, "regions.tsv")).Where(r => r.Length > 2))
        {
            foreach (var name in LexiconTsv.Alternatives(r[2]))
            {
                // "Asturias, Principado de" and "Galicia [Galicia]" are catalogue forms nobody says.
                if (name.IndexOfAny([',', '[', '(']) >= 0) continue;
                var key = NameFolding.FoldedWords(name);
                if (key.Length == 0) continue;
                if (!byName.TryGetValue(key, out var list)) byName[key] = list = [];
                if (!list.Any(x => x.Code == r[0])) list.Add(new FirstLevelRegion(r[0], r[1], name));
            }
        }
        return new FirstLevelRegions(byName.ToFrozenDictionary(
            kv => kv.Key, kv => kv.Value.OrderBy(x => x.Code, StringComparer.Ordinal).ToImmutableArray(), StringComparer.Ordinal));
    }
}
