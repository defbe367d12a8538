namespace SwitchTag.Lexicon;

/// <summary>How a stretch of text met an indexed name.</summary>
public enum MatchKind
{
    /// <summary>Every word equal once folded ("Krakow" for "Kraków").</summary>
    Folded,

    /// <summary>At least one word met through its stem ("Krakowie" for "Kraków").</summary>
    Inflected,
}

/// <summary>One indexed name met by the words starting at a position.</summary>
public readonly record struct IndexHit(int KeyIndex, int WordCount, MatchKind Kind);

/// <summary>Meets text words with indexed names word by word. A text word meets a name word when
/// one of the text word's stems (<see cref="StemRule.Stems"/>) is the name word itself or the name
/// word's nominative stem; with no rule only folded equality counts.</summary>
public static class InflectedMatcher
{
    private const int MaxNameWords = 6;

    /// <summary>All names that the words from <paramref name="first"/> on spell, under one rule
    /// (null: folded equality only); <paramref name="fallback"/> when the rule is not the text's own
    /// language's (see <see cref="StemRule.Stems"/>).</summary>
    public static List<IndexHit> MatchAt(NameIndex index, string text, IReadOnlyList<NameWord> words, int first, StemRule? rule, bool fallback = false)
    {
        var hits = new List<IndexHit>();
        int available = CountJoinedWords(text, words, first);
        var stems = new HashSet<string>?[available];
        var firstStems = StemsOf(words[first].Folded, rule, fallback);
        stems[0] = firstStems;
        int maxExtra = rule is null ? 0 : rule.NominativeEndings.Select(e => e.Length).DefaultIfEmpty(0).Max();
        int longestStem = firstStems.Max(s => s.Length);
        var seen = new HashSet<int>();
        foreach (var prefix in MinimalPrefixes(firstStems))
        {
            var (from, to) = index.PrefixRange(prefix);
            for (int k = from; k < to; k++)
            {
                if (!seen.Add(k)) continue;
                var key = index.KeyAt(k);
                int space = key.IndexOf(' ');
                int firstLength = space < 0 ? key.Length : space;
                if (firstLength > longestStem + maxExtra) continue;
                if (TryMatchKey(key, rule, fallback, words, first, available, stems, out int count, out var kind))
                    hits.Add(new IndexHit(k, count, kind));
            }
        }
        return hits;
    }

    /// <summary>Whether a folded text word can be an inflected form of a folded name word.</summary>
    public static bool WordMeets(string textWord, string nameWord, StemRule? rule, bool fallback = false) =>
        textWord == nameWord || (rule is not null && Meets(StemsOf(textWord, rule, fallback), nameWord, rule));

    private static bool TryMatchKey(
        string key, StemRule? rule, bool fallback, IReadOnlyList<NameWord> words, int first, int available,
        HashSet<string>?[] stems, out int count, out MatchKind kind)
    {
        var keyWords = key.Split(' ');
        count = keyWords.Length;
        kind = MatchKind.Folded;
        if (keyWords.Length > available) return false;
        for (int j = 0; j < keyWords.Length; j++)
        {
            var textWord = words[first + j].Folded;
            if (textWord == keyWords[j]) continue;
            stems[j] ??= StemsOf(textWord, rule, fallback);
            if (!Meets(stems[j]!, keyWords[j], rule)) return false;
            kind = MatchKind.Inflected;
        }
        return true;
    }

    private static bool Meets(HashSet<string> textStems, string nameWord, StemRule? rule) =>
        textStems.Contains(nameWord) || (rule is not null && textStems.Contains(rule.NominativeStem(nameWord)));

    private static HashSet<string> StemsOf(string folded, StemRule? rule, bool fallback) =>
        rule is null ? [folded] : new HashSet<string>(rule.Stems(folded, fallback), StringComparer.Ordinal);

    /// <summary>Words from <paramref name="first"/> on that are joined by name gaps (at most <see cref="MaxNameWords"/>).</summary>
    private static int CountJoinedWords(string text, IReadOnlyList<NameWord> words, int first)
    {
        int n = 1;
        while (n < MaxNameWords && first + n < words.Count
               && NameWords.IsNameGap(text.AsSpan(words[first + n - 1].End, words[first + n].Start - words[first + n - 1].End)))
            n++;
        return n;
    }

    /// <summary>The stems none of which starts with another, so each prefix range is scanned once.</summary>
    private static IEnumerable<string> MinimalPrefixes(HashSet<string> stems)
    {
        var sorted = stems.OrderBy(s => s, StringComparer.Ordinal).ToList();
        string? last = null;
        foreach (var s in sorted)
        {
            if (last is not null && s.StartsWith(last, StringComparison.Ordinal)) continue;
            last = s;
            yield return s;
        }
    }
}
