using System.Collections.Frozen;
using System.Collections.Immutable;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>What marks a capitalised word as a person's name: a title or honorific before it ("Pan",
/// "Herr", "Reb", "Mrs."), a kinship word before it ("ciocia", "uncle", "tante"), or a listed first
/// name beside it. Every language's lists at once: a narrator switching languages keeps the titles
/// of the other language ("Mister Hnatyuk" in Ukrainian talk). First names are folded. Markers are matched as written (French "Me" is a title, English "me" is not), or with the first
/// letter lowered at a sentence start; <see cref="Abbreviations"/> are the titles listed with a dot.</summary>
public sealed record PersonCues(FrozenSet<string> Titles, FrozenSet<string> Kinship, FrozenSet<string> FirstNames, FrozenSet<string> Abbreviations)
{
    public static PersonCues Empty { get; } = new(FrozenSet<string>.Empty, FrozenSet<string>.Empty, FrozenSet<string>.Empty, FrozenSet<string>.Empty);

    /// <summary>Whether a word, as written, marks the next name as a person.</summary>
    public bool IsMarker(string word) => In(Titles, word) || IsKinship(word);

    /// <summary>Whether a word, as written or capitalised at a sentence start, is a kinship word.</summary>
    public bool IsKinship(string word) => In(Kinship, word);

    /// <summary>Kinship word (as written) to the relation it names, from the first word of its English
    /// gloss, brother and sister read as sibling ("ojciec": parent, "brat": sibling).</summary>
    public FrozenDictionary<string, string> KinshipRoles { get; init; } = FrozenDictionary<string, string>.Empty;

    /// <summary>The relation a kinship word names, as written or capitalised at a sentence start; null
    /// for no kinship word or one whose gloss names no relation.</summary>
    public string? KinshipRole(string word) =>
        KinshipRoles.TryGetValue(word, out var role) || (word.Length > 0 && char.IsUpper(word[0]) && KinshipRoles.TryGetValue(Lowered(word), out role)) ? role : null;

    private static bool In(FrozenSet<string> words, string word) =>
        words.Contains(word) || (word.Length > 0 && char.IsUpper(word[0]) && words.Contains(Lowered(word)));

    /// <summary>Whether the word is a title listed with a dot ("Mr.", "Dr."), so "Mr. Roth" is one name.</summary>
    public bool IsAbbreviation(string word) => Abbreviations.Contains(word) || Abbreviations.Contains(Lowered(word));

    private static string Lowered(string word) => char.ToLowerInvariant(word[0]) + word[1..];

    public bool IsFirstName(string folded) => FirstNames.Contains(folded);

    /// <summary>Title (as written, no dot) to the sex its list gives it, 'f' or 'm'; titles of either
    /// sex ("Dr.") are left out.</summary>
    public FrozenDictionary<string, char> TitleSexes { get; init; } = FrozenDictionary<string, char>.Empty;

    /// <summary>The sex a title gives the name after it ("Frau", "Mrs.", "paní": 'f'; "Herr", "Mr.", "pan":
    /// 'm'), as written or capitalised at a sentence start; null for no title or one of either sex.</summary>
    public char? TitleSex(string word)
    {
        word = word.TrimEnd('.');
        if (word.Length == 0) return null;
        return TitleSexes.TryGetValue(word, out var sex) || (char.IsUpper(word[0]) && TitleSexes.TryGetValue(Lowered(word), out sex)) ? sex : null;
    }

    /// <summary>Folded first name to the sex the lists give it, 'f' or 'm'; a name listed with both, or
    /// as either, is left out.</summary>
    public FrozenDictionary<string, char> FirstNameSexes { get; init; } = FrozenDictionary<string, char>.Empty;

    /// <summary>Listed given names that are also ordinary words of a language, as "code\tfolded word"
    /// (given-names-also-words.tsv, generated from the language-ID sentences).</summary>
    public FrozenSet<string> OrdinaryWordNames { get; init; } = FrozenSet<string>.Empty;

    /// <summary>Whether a folded given name is also an ordinary word of <paramref name="language"/>
    /// ("will" in English, "rosario" in Spanish): said alone it is no evidence of a person there.</summary>
    public bool IsOrdinaryWord(string folded, Core.Languages.LanguageCode language) => OrdinaryWordNames.Contains(language.Code + "\t" + folded);

    /// <summary>Folded phrases (one to three words) that come before a woman's birth name: "née",
    /// "geb.", "z domu", "урождённая" (Languages/*/birth-name-markers.txt).</summary>
    public FrozenSet<string> BirthNameMarkers { get; init; } = FrozenSet<string>.Empty;

    /// <summary>Whether <paramref name="before"/>, the text right before a name, ends with a birth-name
    /// marker (commas and spaces between them allowed: "Anna Nowak, z domu Wiśniewska").</summary>
    public bool EndsWithBirthNameMarker(string before)
    {
        if (BirthNameMarkers.Count == 0) return false;
        var words = NameWords.Split(NameFolding.Fold(before.TrimEnd(' ', ',', ':', '\u00A0')));
        for (int n = 1; n <= Math.Min(3, words.Count); n++)
            if (BirthNameMarkers.Contains(string.Join(' ', words.Skip(words.Count - n).Select(w => w.Folded)))) return true;
        return false;
    }

    /// <summary>Folded words that speak of a marriage ("married", "férjem", "замуж"; Languages/*/marriage-words.txt).</summary>
    public FrozenSet<string> MarriageWords { get; init; } = FrozenSet<string>.Empty;

    /// <summary>Folded beginnings of words that speak of a marriage (the list's entries ending in *: "heirat", "férj").</summary>
    public ImmutableArray<string> MarriagePrefixes { get; init; } = [];

    /// <summary>Whether one of the words (as written; punctuation around them is ignored) speaks of a marriage.</summary>
    public bool SpeaksOfMarriage(IEnumerable<string> words) =>
        words.SelectMany(w => NameWords.Split(w)).Select(w => w.Folded)
            .Any(w => MarriageWords.Contains(w) || MarriagePrefixes.Any(p => w.StartsWith(p, StringComparison.Ordinal)));

    /// <summary>Phrases that give a person another name (Languages/*/naming-phrases.tsv), folded words,
    /// with whether they name the speaker ("they called me") or the person named before ("we called him").</summary>
    public ImmutableArray<(string[] Words, bool Self)> NamingPhrases { get; init; } = [];

    /// <summary>Folded phrases after which a name, one word or full, is one the speaker went by ("I
    /// was Angela Georgiou", "byłam Marysią Kwiatkowską"): naming-phrases.tsv rows of kind went-by.</summary>
    public ImmutableArray<string[]> WentByPhrases { get; init; } = [];

    /// <summary>Whether the text right before a name ends with a went-by phrase and one space, the
    /// name not being followed by a possessive ("I was Rachel's friend" names no alias).</summary>
    public bool SpeakerWentBy(string before, string after)
    {
        // One space between phrase and name, no comma: "I was, Anna was" names nobody.
        if (WentByPhrases.IsEmpty || before.Length < 2 || before[^1] != ' ' || !char.IsLetter(before[^2])
            || after.StartsWith("'s", StringComparison.Ordinal) || after.StartsWith("’s", StringComparison.Ordinal)) return false;
        var prior = FoldedWords(before);
        return WentByPhrases.Any(words => EndsWith(prior, words));
    }

    /// <summary>Folded phrases after which a name is given to a new person ("we named", "назвали"):
    /// naming-phrases.tsv rows of kind named. A child named for a grandparent is another person.</summary>
    public ImmutableArray<string[]> NamedPhrases
    {
        get;
        init
        {
            field = value;
            NamedLastWords = value.Select(p => p[^1]).ToFrozenSet(StringComparer.Ordinal);
        }
    } = [];

    private FrozenSet<string> NamedLastWords { get; init; } = FrozenSet<string>.Empty;

    /// <summary>Whether the text right before a name ends with a named phrase and one space.</summary>
    public bool NamedBefore(string before)
    {
        if (NamedPhrases.IsEmpty || before.Length < 2 || before[^1] != ' ' || !char.IsLetter(before[^2])) return false;
        // Most names follow no such phrase: the last word is checked before the text is folded.
        int start = before.Length - 1;
        while (start > 0 && char.IsLetter(before[start - 1])) start--;
        if (!NamedLastWords.Contains(NameFolding.Fold(before[start..^1]))) return false;
        var prior = FoldedWords(before);
        return NamedPhrases.Any(words => EndsWith(prior, words));
    }

    /// <summary>Folded phrases after which a name is a new one taken by the person the phrase's subject
    /// is ("she became Shoshana Segal", "Tibor became Ted"): naming-phrases.tsv rows of kind became
    /// (no pronoun: the person said right before), became-f and became-m (a pronoun of that sex).</summary>
    public ImmutableArray<(string[] Words, char? Sex)> BecamePhrases { get; init; } = [];

    /// <summary>The longest became phrase the text right before a name ends with (one space, no comma,
    /// no possessive after the name, as <see cref="SpeakerWentBy"/>): whether it holds a pronoun, and
    /// the pronoun's sex; null when there is none.</summary>
    public (bool Pronoun, char? Sex)? BecameBefore(string before, string after)
    {
        if (BecamePhrases.IsEmpty || before.Length < 2 || before[^1] != ' ' || !char.IsLetter(before[^2])
            || after.StartsWith("'s", StringComparison.Ordinal) || after.StartsWith("’s", StringComparison.Ordinal)) return null;
        var prior = FoldedWords(before);
        var found = BecamePhrases.Where(p => EndsWith(prior, p.Words)).OrderByDescending(p => p.Words.Length).FirstOrDefault();
        return found.Words is null ? null : (found.Sex is not null, found.Sex);
    }

    private static List<string> FoldedWords(string text) => NameWords.Split(NameFolding.Fold(text)).Select(w => w.Folded).ToList();

    /// <summary>Whether the folded words end with the phrase's words.</summary>
    private static bool EndsWith(List<string> words, string[] phrase) =>
        words.Count >= phrase.Length && words.Skip(words.Count - phrase.Length).SequenceEqual(phrase);

    /// <summary>Most words of the clause after a name that closes with a naming phrase ("Terka, my father called her").</summary>
    private const int NamingReach = 5;

    /// <summary>Whether the text right before a one-word name ends with a naming phrase ("everyone called
    /// me Litsa"), or the text right after it, set off by a comma, has one within a few words ("Takis, we called him"): true
    /// when the phrase names the speaker, false when it names the person said before, null when there is none.</summary>
    public bool? NamingPhraseAround(string before, string after)
    {
        if (NamingPhrases.IsEmpty) return null;
        var prior = FoldedWords(before);
        // After the name only when it is set off by a comma and the phrase closes the clause: "Avraham
        // always called me Gretl" names Gretl, and so does "Ilona, my father called her Ilonka".
        var next = after.StartsWith(',') ? FoldedWords(Clause(after[1..])) : [];
        if (next.Count > NamingReach) next = [];
        foreach (var (words, self) in NamingPhrases)
        {
            if (EndsWith(prior, words) || EndsWith(next, words)) return self;
        }
        return null;
    }

    /// <summary>The text up to the first comma or sentence end.</summary>
    private static string Clause(string text)
    {
        int end = text.IndexOfAny([',', '.', ';', '!', '?']);
        return end < 0 ? text : text[..end];
    }

    internal static PersonCues Load(string lexiconDir)
    {
        var titles = new HashSet<string>(StringComparer.Ordinal);
        var kinship = new HashSet<string>(StringComparer.Ordinal);
        var first = new HashSet<string>(StringComparer.Ordinal);
        var abbreviations = new HashSet<string>(StringComparer.Ordinal);
        var roles = new Dictionary<string, string>(StringComparer.Ordinal);
        var titleSexes = new Dictionary<string, char>(StringComparer.Ordinal);
        var nameSexes = new Dictionary<string, char>(StringComparer.Ordinal);
        foreach (var (_, folder) in LexiconTsv.Languages(lexiconDir))
        {
            var titleRows = LexiconTsv.Rows(Path.Combine(folder, "titles.tsv")).ToList();
            AddSexes(titleSexes, titleRows, f => f.TrimEnd('.'));
            var titleForms = Forms(titleRows).ToList();
            titles.UnionWith(titleForms.Select(f => f.TrimEnd('.')));
            abbreviations.UnionWith(titleForms.Where(f => f.EndsWith('.')).Select(f => f.TrimEnd('.')));
            var kin = LexiconTsv.Rows(Path.Combine(folder, "kinship.tsv")).ToList();
            kinship.UnionWith(Forms(kin));
            foreach (var row in kin.Where(r => r.Length > 2))
                if (Relation(row[2]) is { } relation) roles.TryAdd(row[0].Trim(), relation);
            var nameRows = LexiconTsv.Rows(Path.Combine(folder, "first-names.tsv")).ToList();
            first.UnionWith(Forms(nameRows).Select(NameFolding.Fold));
            AddSexes(nameSexes, nameRows, NameFolding.Fold);
        }
        var birthNames = LexiconTsv.Languages(lexiconDir)
            .SelectMany(l => LexiconTsv.Rows(Path.Combine(l.Folder, "birth-name-markers.txt")))
            .Select(r => string.Join(' ', NameWords.Split(NameFolding.Fold(r[0])).Select(w => w.Folded)))
            .ToHashSet(StringComparer.Ordinal);
        var marriage = LexiconTsv.Languages(lexiconDir)
            .SelectMany(l => LexiconTsv.Rows(Path.Combine(l.Folder, "marriage-words.txt")))
            .Select(r => r[0].Trim()).Where(w => w.Length > 0).ToList();
        // naming-phrases.tsv rows: phrase and kind (self, other, went-by), read once for both lists.
        var phrases = LexiconTsv.Languages(lexiconDir)
            .SelectMany(l => LexiconTsv.Rows(Path.Combine(l.Folder, "naming-phrases.tsv")))
            .Where(r => r.Length > 1)
            .Select(r => (Words: FoldedWords(r[0]).ToArray(), Kind: r[1].Trim()))
            .Where(p => p.Words.Length > 0)
            .ToList();
        return new PersonCues(Frozen(titles), Frozen(kinship), Frozen(first), Frozen(abbreviations))
        {
            BirthNameMarkers = Frozen(birthNames),
            KinshipRoles = roles.ToFrozenDictionary(StringComparer.Ordinal),
            TitleSexes = Sexed(titleSexes),
            FirstNameSexes = Sexed(nameSexes),
            OrdinaryWordNames = Frozen([.. LexiconTsv.Rows(Path.Combine(lexiconDir, "given-names-also-words.tsv"))
                .Where(r => r.Length > 1).Select(r => r[0].Trim() + "\t" + NameFolding.Fold(r[1].Trim()))]),
            MarriageWords = Frozen([.. marriage.Where(w => !w.EndsWith('*')).Select(NameFolding.Fold)]),
            MarriagePrefixes = [.. marriage.Where(w => w.EndsWith('*')).Select(w => NameFolding.Fold(w[..^1])).Where(w => w.Length > 0).Distinct()],
            NamingPhrases = [.. phrases.Where(p => p.Kind is "self" or "other").Select(p => (p.Words, Self: p.Kind == "self"))],
            WentByPhrases = [.. phrases.Where(p => p.Kind == "went-by").Select(p => p.Words)],
            NamedPhrases = [.. phrases.Where(p => p.Kind == "named").Select(p => p.Words)],
            BecamePhrases = [.. phrases.Where(p => p.Kind is "became" or "became-f" or "became-m")
                .Select(p => (p.Words, p.Kind switch { "became-f" => 'f', "became-m" => 'm', _ => (char?)null }))],
        };
    }

    /// <summary>The relation an English gloss names: its first word ("uncle (mother's brother)": uncle),
    /// brother and sister as sibling, grandmother and grandfather as grandparent; null for a gloss
    /// naming none ("romanised forms").</summary>
    private static string? Relation(string gloss)
    {
        var first = gloss.Trim().Split(' ', ',', '(')[0].ToLowerInvariant();
        return first switch
        {
            "brother" or "sister" => "sibling",
            // The lists gloss some words by sex and some not (Greek γιαγιά: grandparent; grandma: grandmother).
            "grandmother" or "grandfather" => "grandparent",
            "romanised" or "" => null,
            _ => first,
        };
    }

    /// <summary>Adds each row's form (first cell, through <paramref name="form"/>) with its sex (second
    /// cell, f or m; u rows say nothing); a form met with both sexes is marked '?' so that it is left out.</summary>
    private static void AddSexes(Dictionary<string, char> sexes, IEnumerable<string[]> rows, Func<string, string> form)
    {
        foreach (var row in rows.Where(r => r.Length > 1 && r[1].Trim() is "f" or "m"))
        {
            var key = form(row[0].Trim());
            char sex = row[1].Trim()[0];
            if (key.Length == 0) continue;
            sexes[key] = sexes.TryGetValue(key, out var known) && known != sex ? '?' : sex;
        }
    }

    private static FrozenDictionary<string, char> Sexed(Dictionary<string, char> sexes) =>
        sexes.Where(x => x.Value != '?').ToFrozenDictionary(StringComparer.Ordinal);

    private static FrozenSet<string> Frozen(HashSet<string> set) => set.Where(s => s.Length > 0).ToFrozenSet(StringComparer.Ordinal);

    /// <summary>The first cell of every row as written, one word only (the name splitter's words, so
    /// "o." and prefixes written with a hyphen, "παπα-", are left out).</summary>
    private static IEnumerable<string> Forms(IEnumerable<string[]> rows) =>
        rows
            .Select(r => r[0].Trim())
            .Where(f => f.Length > 0 && NameWords.Split(f) is [var w] && w.Start == 0 && (w.End == f.Length || f[w.End..] == "."));
}
