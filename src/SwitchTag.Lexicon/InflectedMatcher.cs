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
    /// <summary>Words one name may span: a match starting at a word looks at most this many words.</summary>
    public const int MaxNameWords = 6;

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
        var seen = new HashSet<int>();
        foreach (var firstWord in DictionaryForms(firstStems, rule))
        {
            int exact = index.IndexOf(firstWord);
            if (exact >= 0) TryAdd(exact);
            var (from, to) = index.PrefixRange(firstWord + " ");
            for (int k = from; k < to; k++) TryAdd(k);
        }
        return hits;

        void TryAdd(int k)
        {
            if (seen.Add(k) && TryMatchKey(index.KeyAt(k), rule, fallback, words, first, available, stems, out int count, out var kind))
                hits.Add(new IndexHit(k, count, kind));
        }
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

    /// <summary>Every dictionary word whose nominative stem could be one of <paramref name="stems"/>:
    /// the stem itself and the stem plus each nominative ending, with and without the Polish
    /// softness "i" (Gdyn- → Gdynia). A superset: each is checked again by <see cref="Meets"/>.</summary>
    private static IEnumerable<string> DictionaryForms(HashSet<string> stems, StemRule? rule)
    {
        var forms = new HashSet<string>(stems, StringComparer.Ordinal);
        if (rule is not null)
            foreach (var stem in stems)
                foreach (var ending in rule.NominativeEndings)
                {
                    forms.Add(stem + ending);
                    forms.Add(stem + "i" + ending);
                }
        return forms;
    }
}
