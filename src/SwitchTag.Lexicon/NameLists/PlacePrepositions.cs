using SwitchTag.Core.Text;
using System.Collections.Frozen;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Prepositions that put the next name in a place ("w Tarnowie", "nach Wien", "из Лиды"),
/// folded, every language at once (models/lexicon/place-prepositions.tsv, written by hand).</summary>
public sealed record PlacePrepositions(FrozenSet<string> Words)
{
    public static PlacePrepositions Empty { get; } = new(FrozenSet<string>.Empty);

    /// <summary>Whether the word of <paramref name="text"/> just before <paramref name="nameStart"/>
    /// (one space between) is such a preposition, itself not inside a name ("Maria de Souza": a
    /// capitalised word before "de" mid-sentence makes "de" a name particle).</summary>
    public bool Precedes(string text, int nameStart)
    {
        int end = nameStart - 1;
        if (end < 1 || text[end] != ' ') return false;
        int start = end;
        while (start > 0 && char.IsLetter(text[start - 1])) start--;
        if (start == end || !Words.Contains(NameFolding.Fold(text[start..end]))) return false;
        int before = start - 1;
        if (before < 1 || text[before] != ' ') return true;
        int prev = before;
        while (prev > 0 && char.IsLetter(text[prev - 1])) prev--;
        return prev == before || !char.IsUpper(text[prev]) || TextPosition.IsSentenceStart(text, prev);
    }

    internal static PlacePrepositions Load(string lexiconDir) =>
        new(LexiconTsv.Rows(Path.Combine(lexiconDir, "place-prepositions.tsv"))
            .Where(r => r.Length > 1)
            .SelectMany(r => LexiconTsv.Alternatives(r[1]))
            .Select(NameFolding.Fold)
            .ToFrozenSet(StringComparer.Ordinal));
}
