namespace SwitchTag.Lexicon;

/// <summary>The stem changes a language's <c>stemming.txt</c> names (<c>alternations</c>,
/// <c>normalise</c>, <c>allows</c>): what a list of endings cannot say. A language needing a new one
/// adds it here by name.</summary>
public static class StemOperations
{
    public static readonly IReadOnlyDictionary<string, Func<string, IEnumerable<string>>> Alternations =
        new Dictionary<string, Func<string, IEnumerable<string>>>(StringComparer.Ordinal)
        {
            ["fleeting-e"] = FleetingE,
            ["ukrainian-ikavism"] = UkrainianIkavism,
            ["undouble-final"] = UndoubleFinal,
        };

    public static readonly IReadOnlyDictionary<string, Func<string, string>> Normalisers =
        new Dictionary<string, Func<string, string>>(StringComparer.Ordinal)
        {
            ["drop-soft-i"] = DropSoftI,
        };

    public static readonly IReadOnlyDictionary<string, Func<string, string, bool>> Tests =
        new Dictionary<string, Func<string, string, bool>>(StringComparer.Ordinal)
        {
            // Hungarian accusative -t and superessive -n follow a vowel (Budát, Budán); the
            // accusative also follows r, l, n and j bare (Tibort, Pált); after other
            // consonants the letter belongs to the name (Budapest, Debrecen).
            ["hungarian-bare-t-n"] = (stem, ending) => ending switch
            {
                "t" => IsVowel(stem[^1]) || stem[^1] is 'r' or 'l' or 'n' or 'j',
                "n" => IsVowel(stem[^1]),
                _ => true,
            },
        };

    public static IEnumerable<string> Replacements(string stem, IEnumerable<(string From, string To)> changes)
    {
        foreach (var (from, to) in changes)
            if (stem.EndsWith(from, StringComparison.Ordinal))
                yield return stem[..^from.Length] + to;
    }

    /// <summary>West Slavic mobile e: "Wiedeń" → "Wiednia", "Plzeň" → "Plzni"; the oblique stem
    /// "wiedn" gives back "wieden".</summary>
    private static IEnumerable<string> FleetingE(string stem)
    {
        if (stem.Length >= 3 && IsConsonant(stem[^1]) && IsConsonant(stem[^2]))
            yield return string.Concat(stem.AsSpan(0, stem.Length - 1), "e", stem.AsSpan(stem.Length - 1));
    }

    /// <summary>Polish soft stems: "Poznań" → "Poznania"; folded "poznani-a" loses the "i" that
    /// only marks the softness, giving back "poznan".</summary>
    private static string DropSoftI(string stem) =>
        stem.Length > StemRule.MinStem && stem[^1] == 'i' && IsConsonant(stem[^2]) ? stem[..^1] : stem;

    /// <summary>Ukrainian closed-syllable і: "Львів" → "Львова", "Київ" → "Києва"; the oblique stem's
    /// last о/е/є becomes і again.</summary>
    private static IEnumerable<string> UkrainianIkavism(string stem)
    {
        for (int i = stem.Length - 2; i >= 0; i--)
        {
            char c = stem[i];
            if (c is 'о' or 'е' or 'є')
            {
                yield return string.Concat(stem.AsSpan(0, i), "і", stem.AsSpan(i + 1));
                yield break;
            }
            if (IsVowel(c)) yield break;
        }
    }

    /// <summary>Hungarian instrumental assimilation: "Budapesttel" = "Budapest" + doubled t + "el".</summary>
    private static IEnumerable<string> UndoubleFinal(string stem)
    {
        if (stem.Length >= 4 && stem[^1] == stem[^2] && IsConsonant(stem[^1]))
            yield return stem[..^1];
    }

    public static bool IsVowel(char c) => "aeiouyаеиоуыэюяієї".Contains(c);

    private static bool IsConsonant(char c) => char.IsLetter(c) && !IsVowel(c);
}
