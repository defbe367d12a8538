using System.Collections.Frozen;

namespace SwitchTag.Lexicon;

/// <summary>The per-language case-ending rules. Endings are written folded, as <see cref="NameFolding.Fold"/>
/// leaves them (Polish "-ą" is "-a", Lithuanian "-ų" is "-u"). They are the endings of nouns and
/// adjectives in the standard grammars of each language, written down from memory, restricted to
/// those that place and person names take; "-ów"/"-ов" (genitive plural) are left out on purpose,
/// because many town names end that way in the nominative (Kraków, Rostov).</summary>
public static class StemRules
{
    private static readonly StemRule Polish = new(
        "pl",
        ["ami", "ach", "owi", "ego", "emu", "ych", "ich", "ymi", "imi", "ech", "em", "om", "ej", "ym", "im", "a", "e", "i", "o", "u", "y"],
        ["a", "o", "e", "y", "i"],
        s => Replacements(s, ("dz", "g"), ("c", "k"), ("c", "t"), ("rz", "r"), ("sz", "ch"), ("cz", "c"), ("sc", "sk"), ("z", "g")).Concat(FleetingE(s)),
        DropSoftI);

    private static readonly StemRule Czech = new(
        "cs",
        ["ech", "ach", "ami", "emi", "ovi", "eho", "emu", "ich", "ych", "ou", "em", "um", "ym", "ho", "e", "i", "u", "y", "a", "o"],
        ["a", "o", "e", "y", "i"],
        s => Replacements(s, ("z", "h"), ("z", "g"), ("c", "k"), ("s", "ch")).Concat(FleetingE(s)));

    private static readonly StemRule Slovak = new(
        "sk",
        ["iach", "och", "ach", "ami", "ovi", "eho", "emu", "ych", "ich", "ou", "om", "em", "ej", "e", "i", "u", "y", "a", "o"],
        ["a", "o", "e", "y", "i"],
        s => Replacements(s, ("c", "k"), ("z", "h")).Concat(FleetingE(s)));

    private static readonly StemRule SouthSlavic = new(
        "hr",
        ["ima", "ama", "om", "em", "u", "a", "e", "i", "o", "ом", "ем", "има", "ама", "у", "а", "е", "и", "о"],
        ["a", "o", "e", "i", "а", "о", "е", "и"]);

    private static readonly StemRule Russian = new(
        "ru",
        ["ами", "ями", "ого", "его", "ому", "ему", "ыми", "ими", "ах", "ях", "ой", "ей", "ом", "ем", "ою", "ею", "ам", "ям",
         "ый", "ий", "ая", "яя", "ое", "ее", "ую", "юю", "ым", "им", "ых", "их", "ью", "а", "я", "ы", "и", "у", "ю", "е", "о", "ь"],
        ["ый", "ий", "ой", "ая", "яя", "ое", "ее", "ые", "ие", "а", "я", "ь", "о", "е", "ы", "и"]);

    private static readonly StemRule Ukrainian = new(
        "uk",
        ["ами", "ями", "ого", "ому", "ими", "ах", "ях", "ою", "ею", "єю", "ом", "ем", "ам", "ям", "ий", "ій", "оі", "ей",
         "ім", "им", "их", "іх", "а", "я", "и", "і", "у", "ю", "е", "є", "о", "ь"],
        ["ий", "ій", "а", "я", "ь", "о", "е", "и", "і"],
        UkrainianIkavism);

    private static readonly StemRule Lithuanian = new(
        "lt",
        ["iuose", "iuje", "iaus", "iumi", "iems", "ioje", "uose", "oje", "eje", "yje", "uje", "ose", "ese", "yse", "ame",
         "oms", "ems", "ams", "ais", "iai", "iui", "ius", "ios", "ies", "ias", "iam", "umi", "ui", "ai", "ei", "as", "is",
         "ys", "us", "os", "es", "iu", "io", "ia", "a", "e", "i", "o", "u", "y"],
        ["ius", "ias", "iai", "ys", "is", "as", "us", "ai", "os", "es", "ia", "a", "e"]);

    private static readonly StemRule Latvian = new(
        "lv",
        ["ajam", "ajai", "ajos", "iem", "am", "ai", "as", "es", "is", "os", "us", "im", "ei", "a", "e", "i", "u", "s"],
        ["is", "as", "us", "es", "s", "a", "e", "i"]);

    private static readonly StemRule Hungarian = new(
        "hu",
        ["bol", "rol", "tol", "hoz", "hez", "nak", "nek", "ban", "ben", "nal", "nel", "val", "vel", "ert", "kent", "ott", "ett",
         "ig", "ba", "be", "ra", "re", "on", "en", "an", "ot", "et", "at", "ul", "al", "el", "n", "t"],
        [],
        UndoubleFinal,
        // Accusative -t and superessive -n follow a vowel (Budát, Budán); after a consonant the
        // letter belongs to the name (Budapest, Debrecen).
        allows: (stem, ending) => ending is not ("t" or "n") || IsVowel(stem[^1]));

    private static readonly StemRule German = new("de", ["s"], []);

    private static readonly FrozenDictionary<string, StemRule> ByCode = new Dictionary<string, StemRule>
    {
        ["pl"] = Polish, ["pol"] = Polish,
        ["cs"] = Czech, ["ces"] = Czech, ["cze"] = Czech,
        ["sk"] = Slovak, ["slk"] = Slovak, ["slo"] = Slovak,
        ["hr"] = SouthSlavic, ["hrv"] = SouthSlavic, ["sr"] = SouthSlavic, ["srp"] = SouthSlavic,
        ["bs"] = SouthSlavic, ["bos"] = SouthSlavic, ["sl"] = SouthSlavic, ["slv"] = SouthSlavic,
        ["ru"] = Russian, ["rus"] = Russian,
        ["uk"] = Ukrainian, ["ukr"] = Ukrainian,
        ["lt"] = Lithuanian, ["lit"] = Lithuanian,
        ["lv"] = Latvian, ["lav"] = Latvian,
        ["hu"] = Hungarian, ["hun"] = Hungarian,
        ["de"] = German, ["deu"] = German, ["ger"] = German,
    }.ToFrozenDictionary();

    /// <summary>Every distinct rule, for the fallback used when a text's language is unknown.</summary>
    public static IReadOnlyList<StemRule> All { get; } =
        [Polish, Czech, Slovak, SouthSlavic, Russian, Ukrainian, Lithuanian, Latvian, Hungarian, German];

    /// <summary>The rule for an ISO 639-1 or 639-3 code (region suffix ignored: "pl-PL"), or null.</summary>
    public static StemRule? For(string? language)
    {
        if (string.IsNullOrWhiteSpace(language)) return null;
        var code = language.Trim();
        int dash = code.IndexOfAny(['-', '_']);
        if (dash > 0) code = code[..dash];
        return ByCode.GetValueOrDefault(code.ToLowerInvariant());
    }

    private static IEnumerable<string> Replacements(string stem, params (string From, string To)[] changes)
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

    private static bool IsVowel(char c) => "aeiouyаеиоуыэюяієї".Contains(c);

    private static bool IsConsonant(char c) => char.IsLetter(c) && !IsVowel(c);
}
