using System.Collections.Frozen;
using System.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>How one person's names relate across an interview: a spelling key that romanises
/// Cyrillic, Greek and Hebrew-script Yiddish and folds the usual surname spellings (Szwarc / Schwarz,
/// Feigl / Feigel, Иосиф / Iosif), diminutives and nicknames of given names (hypocoristics), and
/// cross-language equivalents (Stanisław / Stanley), and a woman's surname beside its family form
/// (Nováková / Novák). Lists: models/lexicon/Transliteration, Languages/*/hypocoristics.tsv,
/// diminutive-suffixes.txt, feminine-surname-endings.tsv and name-equivalents.tsv, all written by hand (models/namelists.md).</summary>
public sealed class NameVariants
{
    private readonly (string From, string To)[] _letters;
    private readonly (string From, string To, bool AtEnd)[] _folds;
    private readonly FrozenDictionary<string, FrozenSet<string>> _fullNamesOf;
    private readonly FrozenDictionary<string, FrozenSet<int>> _groupsOf;
    private readonly FrozenSet<string> _diminutiveEndings;
    private readonly (string Feminine, string Masculine)[] _feminineEndings;

    /// <summary>Every given name and short form the hypocoristics and equivalents lists hold, folded as
    /// written and stemmed in its list's language: an exact check, unlike the spelling keys.</summary>
    public FrozenSet<string> ListedForms { get; private init; } = FrozenSet<string>.Empty;

    /// <summary>The short forms of the hypocoristics lists (not their full names), folded as written and
    /// stemmed in the list's language: family talk ("Staś", "Jurek"), which places are seldom named after.</summary>
    public FrozenSet<string> ShortForms { get; private init; } = FrozenSet<string>.Empty;

    private NameVariants((string, string)[] letters, (string, string, bool)[] folds,
        FrozenDictionary<string, FrozenSet<string>> fullNamesOf, FrozenDictionary<string, FrozenSet<int>> groupsOf, FrozenSet<string> diminutiveEndings,
        (string, string)[] feminineEndings)
    {
        _letters = letters;
        _folds = folds;
        _fullNamesOf = fullNamesOf;
        _groupsOf = groupsOf;
        _diminutiveEndings = diminutiveEndings;
        _feminineEndings = feminineEndings;
    }

    public static NameVariants Empty { get; } = new([], [], FrozenDictionary<string, FrozenSet<string>>.Empty, FrozenDictionary<string, FrozenSet<int>>.Empty, FrozenSet<string>.Empty, []);

    /// <summary>The spelling keys a surname may have as a family name: its own, and for every feminine
    /// ending of some language it carries, the family form (Nováková: novakova, novak; Orlova: orlova,
    /// orl, orlov). Two surnames are one family's when their sets meet. Endings of every language are
    /// tried, since a name's language is often the turn's, not the name's.</summary>
    public IEnumerable<string> FamilyKeys(string surname)
    {
        yield return Key(surname);
        var folded = NameFolding.Fold(surname);
        foreach (var (feminine, masculine) in _feminineEndings)
            if (folded.Length - feminine.Length >= ShortestStem && folded.EndsWith(feminine, StringComparison.Ordinal))
                yield return Key(folded[..^feminine.Length] + masculine);
    }

    /// <summary>Shortest stem a diminutive ending may follow: "Jan" + "ek", not "Al" + "ek".</summary>
    private const int ShortestStem = 3;

    /// <summary>Which of two given names is a productive diminutive of the other (Irena / Irenka, Ilona /
    /// Ilonka, Pedro / Pedrito, Jonas / Jonukas): the longer one, when its key is the other's key with
    /// its final vowel or its nominative ending (vowel and s) dropped, plus an ending of some language's
    /// Languages/*/diminutive-suffixes.txt. Null when neither is. Endings of every language are tried,
    /// since a name's language is often the turn's, not the name's.</summary>
    public string? DiminutiveOf(string a, string b)
    {
        if (_diminutiveEndings.Count == 0) return null;
        string ka = Key(a), kb = Key(b);
        if (ka.Length == kb.Length) return null;
        var (form, full, formKey, fullKey) = ka.Length > kb.Length ? (a, b, ka, kb) : (b, a, kb, ka);
        foreach (var stem in Stems(fullKey))
            if (stem.Length >= ShortestStem && formKey.StartsWith(stem, StringComparison.Ordinal) && _diminutiveEndings.Contains(formKey[stem.Length..]))
                return form;
        return null;
    }

    private static IEnumerable<string> Stems(string key)
    {
        yield return key;
        if (key.Length > 1 && IsVowel(key[^1])) yield return key[..^1];
        if (key.Length > 2 && key[^1] == 's' && IsVowel(key[^2])) yield return key[..^2];
    }

    private static bool IsVowel(char c) => "aeiouy".Contains(c);

    /// <summary>The spelling key of one name word: romanised (first spelling of each table), folded,
    /// apostrophes dropped (the soft sign's romanisation: Ольга / Olga; O'Brien / OBrien), spelling
    /// folds applied in order, doubled letters collapsed.</summary>
    public string Key(string word)
    {
        var text = NameFolding.Fold(word);
        if (_letters.Length > 0 && text.Any(c => c > 0x24F)) text = Romanise(text);
        if (text.Contains('\'')) text = text.Replace("'", "", StringComparison.Ordinal);
        foreach (var (from, to, atEnd) in _folds)
            text = atEnd ? (text.EndsWith(from, StringComparison.Ordinal) ? text[..^from.Length] + to : text) : text.Replace(from, to, StringComparison.Ordinal);
        var sb = new StringBuilder(text.Length);
        foreach (char c in text)
            if (sb.Length == 0 || sb[^1] != c) sb.Append(c);
        return sb.ToString();
    }

    /// <summary>The full given names (as keys) a form is a diminutive or nickname of; a full name
    /// maps to itself. Empty when the lists do not know the form.</summary>
    public IReadOnlySet<string> FullNames(string word) =>
        _fullNamesOf.TryGetValue(Key(word), out var set) ? set : FrozenSet<string>.Empty;

    /// <summary>Whether the hypocoristics or equivalents lists know the word as a given name or one of
    /// its forms (romanised forms too: "Giorgos", which the first-name lists have only as Γιώργος).</summary>
    public bool KnowsGivenName(string word)
    {
        var key = Key(word);
        return _fullNamesOf.ContainsKey(key) || _groupsOf.ContainsKey(key);
    }

    /// <summary>Whether two given names are diminutives of one full name, or one of the other.</summary>
    public bool SameGivenName(string a, string b)
    {
        var ka = Key(a);
        var kb = Key(b);
        if (ka == kb) return true;
        var fa = FullNames(a);
        var fb = FullNames(b);
        return fa.Contains(kb) || fb.Contains(ka) || fa.Overlaps(fb);
    }

    /// <summary>Whether two given names are listed as cross-language equivalents (directly, or
    /// through the full names of diminutives): a probable link, not a proof.</summary>
    public bool Equivalent(string a, string b)
    {
        var ga = Groups(a);
        return ga.Count > 0 && Groups(b).Overlaps(ga);
    }

    private HashSet<int> Groups(string word)
    {
        var set = new HashSet<int>();
        foreach (var key in FullNames(word).Append(Key(word)))
            if (_groupsOf.TryGetValue(key, out var groups)) set.UnionWith(groups);
        return set;
    }

    private string Romanise(string text)
    {
        var sb = new StringBuilder(text.Length);
        for (int i = 0; i < text.Length;)
        {
            var hit = _letters.FirstOrDefault(l => string.CompareOrdinal(text, i, l.From, 0, l.From.Length) == 0);
            if (hit.From is null) { sb.Append(text[i]); i++; continue; }
            sb.Append(hit.To);
            i += hit.From.Length;
        }
        return sb.ToString();
    }

    internal static NameVariants Load(string lexiconDir)
    {
        var table = Path.Combine(lexiconDir, "Transliteration");
        // Longest letters first, so digraphs (ου, וו) win over their first letter.
        var letters = new[] { "cyrillic-latin.tsv", "greek-latin.tsv", "yiddish-latin.tsv" }
            .SelectMany(f => LexiconTsv.Rows(Path.Combine(table, f)))
            .Where(r => r.Length > 1 && LexiconTsv.Alternatives(r[1]).Length > 0)
            .Select(r => (From: NameFolding.Fold(r[0]), To: LexiconTsv.Alternatives(r[1])[0]))
            .Where(l => l.From.Length > 0)
            .DistinctBy(l => l.From)
            .OrderByDescending(l => l.From.Length)
            .ToArray();
        var folds = LexiconTsv.Rows(Path.Combine(table, "spelling-folds.tsv"))
            .Where(r => r.Length > 1)
            .Select(r => r[0].EndsWith('$') ? (r[0][..^1], r[1], true) : (r[0], r[1], false))
            .ToArray();
        var partial = new NameVariants(letters, folds, FrozenDictionary<string, FrozenSet<string>>.Empty, FrozenDictionary<string, FrozenSet<int>>.Empty, FrozenSet<string>.Empty, []);

        var fullNamesOf = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        var listed = new HashSet<string>(StringComparer.Ordinal);
        var shortForms = new HashSet<string>(StringComparer.Ordinal);
        // Each form also under its stem in its language, so a case form stemmed the same way meets it
        // (Polish vocative "Irenko" and "Irenka" share the stem "irenk").
        foreach (var (language, folder) in LexiconTsv.Languages(lexiconDir))
            foreach (var row in LexiconTsv.Rows(Path.Combine(folder, "hypocoristics.tsv")).Where(r => r.Length > 1))
            {
                var full = partial.Key(row[0]);
                foreach (var form in LexiconTsv.Alternatives(row[1]))
                {
                    shortForms.Add(NameFolding.Fold(form));
                    shortForms.Add(NameFolding.Stem(form, language));
                }
                foreach (var form in LexiconTsv.Alternatives(row[1]).Append(row[0]))
                {
                    listed.Add(NameFolding.Fold(form));
                    listed.Add(NameFolding.Stem(form, language));
                    foreach (var key in new[] { partial.Key(form), partial.Key(NameFolding.Stem(form, language)) })
                    {
                        if (!fullNamesOf.TryGetValue(key, out var set)) fullNamesOf[key] = set = [];
                        set.Add(full);
                    }
                }
            }

        // Endings keyed like the names (romanised, folded), so "очка" meets a romanised Cyrillic key.
        var endings = LexiconTsv.Languages(lexiconDir)
            .SelectMany(l => LexiconTsv.Rows(Path.Combine(l.Folder, "diminutive-suffixes.txt")))
            .Select(r => partial.Key(r[0].Trim()))
            .Where(e => e.Length > 0)
            .ToFrozenSet(StringComparer.Ordinal);

        var feminineEndings = LexiconTsv.Languages(lexiconDir)
            .SelectMany(l => LexiconTsv.Rows(Path.Combine(l.Folder, "feminine-surname-endings.tsv")))
            .Select(r => (Feminine: NameFolding.Fold(r[0].Trim()), Masculine: r.Length > 1 ? NameFolding.Fold(r[1].Trim()) : ""))
            .Where(e => e.Feminine.Length > 0)
            .Distinct()
            .ToArray();

        var groupsOf = new Dictionary<string, HashSet<int>>(StringComparer.Ordinal);
        int group = 0;
        foreach (var row in LexiconTsv.Rows(Path.Combine(lexiconDir, "name-equivalents.tsv")))
        {
            foreach (var cell in row)
            {
                int colon = cell.IndexOf(':');
                var name = colon >= 0 ? cell[(colon + 1)..] : cell;
                listed.Add(NameFolding.Fold(name));
                if (colon > 0 && LanguageCode.TryParse(cell[..colon], out var language)) listed.Add(NameFolding.Stem(name, language));
                var key = partial.Key(name);
                if (key.Length == 0) continue;
                if (!groupsOf.TryGetValue(key, out var set)) groupsOf[key] = set = [];
                set.Add(group);
            }
            group++;
        }
        return new NameVariants(letters, folds,
            fullNamesOf.ToFrozenDictionary(p => p.Key, p => p.Value.ToFrozenSet(StringComparer.Ordinal), StringComparer.Ordinal),
            groupsOf.ToFrozenDictionary(p => p.Key, p => p.Value.ToFrozenSet(), StringComparer.Ordinal), endings, feminineEndings)
        {
            ListedForms = listed.Where(f => f.Length > 0).ToFrozenSet(StringComparer.Ordinal),
            ShortForms = shortForms.Where(f => f.Length > 0).ToFrozenSet(StringComparer.Ordinal),
        };
    }
}
