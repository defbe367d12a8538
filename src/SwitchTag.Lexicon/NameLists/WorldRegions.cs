using System.Collections.Frozen;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Continents and world regions (the territories of territories.tsv with a UN M49 numeric
/// code: Europe, South America, Asia...), in every language CLDR names them. Such a name lies in no
/// town, so the talk's setting never places it.</summary>
public sealed class WorldRegions(FrozenSet<string> folded)
{
    public static WorldRegions Empty { get; } = new(FrozenSet<string>.Empty);

    /// <summary>Whether the name, as written or as a case form in <paramref name="language"/>
    /// (Hungarian "Európát"), names a continent or world region. A scan of the list: asked once per
    /// place heading the gazetteer lacks, not per mention.</summary>
    public bool Contains(string name, LanguageCode language) =>
        folded.Contains(NameFolding.FoldedWords(name)) || folded.Any(n => NameFolding.IsInflectionOf(name, n, language));

    internal static WorldRegions Load(string lexiconDir) =>
        new(LexiconTsv.Rows(Path.Combine(lexiconDir, "territories.tsv"))
            .Where(r => r.Length > 1 && r[0].Length > 0 && r[0].All(char.IsAsciiDigit))
            .SelectMany(r => LexiconTsv.Alternatives(r[1]))
            .Select(NameFolding.FoldedWords)
            .Where(n => n.Length > 0)
            .ToFrozenSet(StringComparer.Ordinal));
}
