using System.Text;
using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

namespace SwitchTag.Store;

/// <summary>How text is put into the full-text index and how a query is asked of it. The index holds
/// each word folded the way names are folded (<see cref="NameFolding.Fold"/>: case, diacritics, ł, ß...),
/// so SQLite only sees plain lower-case words. A query word becomes prefix terms on its possible stems
/// under every language's case-ending rules ("Krakowie" → <c>krakow*</c>), which finds every inflected
/// form sharing the stem; the candidates are then checked with the index's own name matching
/// (<see cref="NameFolding.SameName"/>), so the prefix's over-reach ("krakowski") is dropped.</summary>
public static class SearchTerms
{
    /// <summary>The folded words of a text joined by one space: the <c>terms</c> column. Splitting it
    /// at each space gives the words of <see cref="NameWords.Split"/> in order, one for one.</summary>
    public static string Of(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (var word in NameWords.Split(text))
        {
            if (sb.Length > 0) sb.Append(' ');
            sb.Append(word.Folded);
        }
        return sb.ToString();
    }

    /// <summary>An FTS5 MATCH expression for the query's words in order (a phrase), each word an OR of
    /// prefix terms; null when the query has no word.</summary>
    public static string? MatchExpression(IReadOnlyList<string> queryWords)
    {
        if (queryWords.Count == 0) return null;
        var phrases = new List<string> { "" };
        foreach (var word in queryWords)
        {
            var next = new List<string>();
            foreach (var prefix in PrefixesOf(word))
                foreach (var phrase in phrases)
                    next.Add(phrase.Length == 0 ? Quote(prefix) : phrase + " + " + Quote(prefix));
            // A long query could multiply alternatives; past a handful the first word's prefixes suffice
            // to find candidates, and verification keeps only real matches.
            if (next.Count > 64) break;
            phrases = next;
        }
        return string.Join(" OR ", phrases.Select(p => "(" + p + ")"));
    }

    /// <summary>The folded words of a query.</summary>
    public static List<string> QueryWords(string query) => NameWords.Split(query).Select(w => w.Folded).ToList();

    /// <summary>Whether the words of a stored text, from <paramref name="first"/> on, are the query's
    /// words, each the same name or an inflected form of it (as the index groups mentions).
    /// <paramref name="meets"/> remembers each word's answer: a collection repeats its words often.</summary>
    public static bool MeetsAt(IReadOnlyList<string> words, int first, IReadOnlyList<string> queryWords, LanguageCode textLanguage,
        Dictionary<(string, LanguageCode, int), bool> meets)
    {
        if (first + queryWords.Count > words.Count) return false;
        for (int i = 0; i < queryWords.Count; i++)
        {
            var key = (Word: words[first + i], textLanguage, i);
            if (!meets.TryGetValue(key, out bool same))
                meets[key] = same = NameFolding.SameName(key.Word, textLanguage, queryWords[i], LanguageCode.Undetermined);
            if (!same) return false;
        }
        return true;
    }

    /// <summary>Every stem the word may have under any language's rules, reduced to the shortest
    /// ones (a prefix term on "krakow" already covers "krakowi").</summary>
    internal static List<string> PrefixesOf(string folded)
    {
        var stems = new HashSet<string>(StringComparer.Ordinal) { folded };
        foreach (var rule in StemRules.All)
        {
            stems.Add(rule.NominativeStem(folded));
            foreach (var stem in rule.Stems(folded)) stems.Add(stem);
        }
        var ordered = stems.OrderBy(s => s.Length).ThenBy(s => s, StringComparer.Ordinal).ToList();
        var kept = new List<string>();
        foreach (var s in ordered)
            if (!kept.Any(k => s.StartsWith(k, StringComparison.Ordinal))) kept.Add(s);
        return kept;
    }

    private static string Quote(string term) => "\"" + term.Replace("\"", "\"\"") + "\"*";
}
