using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using System.Collections.Frozen;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Prepositions that put the next name in a place ("w Tarnowie", "nach Wien", "из Лиды"),
/// folded, every language at once (models/lexicon/place-prepositions.tsv, written by hand), less the
/// words a language uses for "at someone's" (<see cref="PersonsOnly"/>: Czech "u Kolářových" is at the
/// Kolářs', though Croatian "u" is "in").</summary>
public sealed record PlacePrepositions(FrozenSet<string> Words)
{
    public static PlacePrepositions Empty { get; } = new(FrozenSet<string>.Empty);

    /// <summary>Language code to the folded words that take persons there (the file's rows whose
    /// language is written "code:persons").</summary>
    public FrozenDictionary<string, FrozenSet<string>> PersonsOnly { get; init; } = FrozenDictionary<string, FrozenSet<string>>.Empty;

    /// <summary>Whether the word of <paramref name="text"/> just before <paramref name="nameStart"/>
    /// (one space between) is such a preposition, itself not inside a name ("Maria de Souza": a
    /// capitalised word before "de" mid-sentence makes "de" a name particle), and not one that takes
    /// persons in <paramref name="language"/>, the language of the name's stretch.</summary>
    public bool Precedes(string text, int nameStart, LanguageCode language = default)
    {
        int end = nameStart - 1;
        if (end < 1 || text[end] != ' ') return false;
        int start = end;
        while (start > 0 && char.IsLetter(text[start - 1])) start--;
        var word = NameFolding.Fold(text[start..end]);
        if (start == end || !Words.Contains(word)) return false;
        if (PersonsOnly.TryGetValue(language.Code, out var persons) && persons.Contains(word)) return false;
        int before = start - 1;
        if (before < 1 || text[before] != ' ') return true;
        int prev = before;
        while (prev > 0 && char.IsLetter(text[prev - 1])) prev--;
        return prev == before || !char.IsUpper(text[prev]) || TextPosition.IsSentenceStart(text, prev);
    }

    internal static PlacePrepositions Load(string lexiconDir)
    {
        var rows = LexiconTsv.Rows(Path.Combine(lexiconDir, "place-prepositions.tsv")).Where(r => r.Length > 1).ToList();
        const string Persons = ":persons";
        return new(rows.Where(r => !r[0].EndsWith(Persons, StringComparison.Ordinal))
            .SelectMany(r => LexiconTsv.Alternatives(r[1]))
            .Select(NameFolding.Fold)
            .ToFrozenSet(StringComparer.Ordinal))
        {
            PersonsOnly = rows.Where(r => r[0].EndsWith(Persons, StringComparison.Ordinal))
                .GroupBy(r => r[0].Trim()[..^Persons.Length])
                .ToFrozenDictionary(g => g.Key, g => g.SelectMany(r => LexiconTsv.Alternatives(r[1])).Select(NameFolding.Fold).ToFrozenSet(StringComparer.Ordinal), StringComparer.Ordinal),
        };
    }
}
