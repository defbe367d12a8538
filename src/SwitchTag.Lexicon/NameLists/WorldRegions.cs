using System.Collections.Frozen;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Continents and world regions (the territories of territories.tsv with a UN M49 numeric
/// code: Europe, South America, Asia...), in every language CLDR names them. Such a name lies in no
/// town, so the talk's setting never places it.</summary>
public sealed class WorldRegions(FrozenSet<string> folded)
{
    /// <summary>The names by their first three letters: a case form keeps its name's start, so a
    /// query tries the inflection rules on a handful of names, not all of them.</summary>
    private readonly FrozenDictionary<string, string[]> _byStart = folded.GroupBy(Start, StringComparer.Ordinal)
        .ToFrozenDictionary(g => g.Key, g => g.ToArray(), StringComparer.Ordinal);

    public static WorldRegions Empty { get; } = new(FrozenSet<string>.Empty);

    /// <summary>Whether the name, as written or as a case form in <paramref name="language"/>
    /// (Hungarian "Európát"), names a continent or world region.</summary>
    public bool Contains(string name, LanguageCode language)
    {
        var words = NameFolding.FoldedWords(name);
        return folded.Contains(words)
            || _byStart.TryGetValue(Start(words), out var near) && near.Any(n => NameFolding.IsInflectionOf(name, n, language));
    }

    private static string Start(string folded) => folded.Length <= 3 ? folded : folded[..3];

    /// <summary>From the rows of territories.tsv (code, names).</summary>
    internal static WorldRegions From(IEnumerable<string[]> territories) =>
        new(territories
            .Where(r => r[0].Length > 0 && r[0].All(char.IsAsciiDigit))
            .SelectMany(r => LexiconTsv.Alternatives(r[1]))
            .Select(NameFolding.FoldedWords)
            .Where(n => n.Length > 0)
            .ToFrozenSet(StringComparer.Ordinal));
}
