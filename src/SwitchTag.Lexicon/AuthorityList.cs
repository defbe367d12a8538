using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>A curated list of people, places and organisations (CSV: <c>label,name,variants</c>),
/// matched in text with inflection-aware rules. An entry's label is final: a name listed as a
/// person is only ever found as a person.</summary>
public sealed class AuthorityList : INameLexicon
{
    private static readonly string[] Header = ["label", "name", "variants"];

    private readonly NameIndex _index;
    private readonly HashSet<string> _words;

    private AuthorityList(ImmutableArray<AuthorityEntry> entries)
    {
        Entries = entries;
        _index = NameIndex.Build(entries.SelectMany((e, id) =>
            e.Variants.Prepend(e.Name).Select(form => (NameFolding.FoldedWords(form), id))));
        _words = new HashSet<string>(
            Enumerable.Range(0, _index.Count).SelectMany(k => _index.KeyAt(k).Split(' ')).Where(w => w.Length >= 2),
            StringComparer.Ordinal);
    }

    public static AuthorityList Empty { get; } = new([]);

    public ImmutableArray<AuthorityEntry> Entries { get; }

    /// <summary>Reads an RFC 4180 CSV file with a header row <c>label,name,variants</c>; labels are
    /// PER, LOC or ORG, variants are separated by '|'. Bad rows are skipped with a diagnostic.</summary>
    public static (AuthorityList List, ImmutableArray<Diagnostic> Problems) Load(string csvPath)
    {
        string text;
        try
        {
            text = File.ReadAllText(csvPath);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return (Empty, [new Diagnostic(new SourceLine(csvPath, 1), Severity.Error, $"cannot read authority list: {e.Message}")]);
        }
        return Parse(text, csvPath);
    }

    /// <summary>As <see cref="Load"/>, from CSV text already in memory; <paramref name="path"/> names it in diagnostics.</summary>
    public static (AuthorityList List, ImmutableArray<Diagnostic> Problems) Parse(string csvText, string path)
    {
        var problems = ImmutableArray.CreateBuilder<Diagnostic>();
        var (records, csvProblems) = Rfc4180Reader.Parse(csvText);
        foreach (var (line, message) in csvProblems)
            problems.Add(new Diagnostic(new SourceLine(path, line), Severity.Error, message));

        var entries = ImmutableArray.CreateBuilder<AuthorityEntry>();
        var firstByKey = new Dictionary<string, AuthorityEntry>(StringComparer.Ordinal);
        for (int r = 0; r < records.Length; r++)
        {
            var record = records[r];
            var at = new SourceLine(path, record.Line);
            if (r == 0 && IsHeader(record)) continue;
            if (r == 0)
                problems.Add(new Diagnostic(at, Severity.Warning, "no header row label,name,variants; reading the first row as data"));
            if (ParseRow(record, at, problems) is not { } entry) continue;
            // A one-word form that is a stop word or a single letter ("I", "The") would tag ordinary words as names everywhere.
            if (entry.Variants.Prepend(entry.Name).FirstOrDefault(IsStopWord) is { } stop)
            {
                problems.Add(new Diagnostic(at, Severity.Error, $"\"{stop}\" is a stop word (a single letter, or a function word or title of a language profile); the row is refused"));
                continue;
            }
            foreach (var form in entry.Variants.Prepend(entry.Name))
            {
                var key = NameFolding.FoldedWords(form);
                if (firstByKey.TryGetValue(key, out var earlier))
                {
                    if (earlier.Label != entry.Label)
                        problems.Add(new Diagnostic(at, Severity.Warning,
                            $"\"{form}\" is also listed as {earlier.Label} at {earlier.At}; the earlier row wins"));
                }
                else firstByKey[key] = entry;
            }
            entries.Add(entry);
        }
        return (new AuthorityList(entries.ToImmutable()), [.. problems.OrderBy(p => p.At.Line)]);
    }

    private static bool IsStopWord(string form)
    {
        string folded = NameFolding.Fold(form.Trim());
        return !folded.Contains(' ') && (folded.Length < 2 || GazetteerStopWords.Words.Contains(folded));
    }

    /// <summary>Names of the list in <paramref name="text"/>, longest first and non-overlapping,
    /// in text order. Words inflect by the rules of <paramref name="language"/>; for a language
    /// without rules (en, und) folded equality is tried first and every rule only where that finds
    /// nothing. A one-word entry needs a capitalised word, so "Rose" does not match "rose".</summary>
    public ImmutableArray<NameMatch> Find(string text, LanguageCode language)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (Entries.IsEmpty || text.Length == 0) return [];
        var rule = StemRules.For(language);
        var candidates = new List<NameMatch>();
        foreach (var (words, starts) in NameWords.Windows(text, InflectedMatcher.MaxNameWords - 1))
            for (int i = 0; i < starts; i++)
            {
                var best = BestHit(text, words, i, rule);
                if (best is not { } hit) continue;
                var entry = Entries[_index.IdsAt(hit.KeyIndex)[0]];
                candidates.Add(new NameMatch(words[i].Start, words[i + hit.WordCount - 1].End, entry.Label, entry.Name, MentionSource.Authority));
            }
        return NameMatchSelection.LongestFirst(candidates);
    }

    /// <summary>A capitalised word that is one word of a listed name as written (folded): "Kowalczyk"
    /// of "Anna Kowalczyk". Inflected forms are not known names: their ending is evidence of a language.</summary>
    public bool IsKnownName(ReadOnlySpan<char> word)
    {
        word = word.Trim();
        return word.Length >= 2 && NameWords.StartsUpper(word) && _words.Contains(NameFolding.Fold(word.ToString()));
    }

    private IndexHit? BestHit(string text, List<NameWord> words, int i, StemRule? rule)
    {
        var hits = Usable(InflectedMatcher.MatchAt(_index, text, words, i, rule), text, words, i);
        if (hits.Count == 0 && rule is null)
            hits = Usable(StemRules.All.SelectMany(r => InflectedMatcher.MatchAt(_index, text, words, i, r, fallback: true)).ToList(), text, words, i);
        if (hits.Count == 0) return null;
        return hits
            .OrderByDescending(h => h.WordCount)
            .ThenBy(h => h.Kind)
            .ThenBy(h => _index.IdsAt(h.KeyIndex)[0])
            .First();
    }

    private static List<IndexHit> Usable(List<IndexHit> hits, string text, List<NameWord> words, int i) =>
        hits.Where(h => h.WordCount > 1 || NameWords.StartsUpper(text.AsSpan(words[i].Start))).ToList();

    private static bool IsHeader(CsvRecord record) =>
        record.Fields.Length >= 2
        && record.Fields.Zip(Header).All(p => string.Equals(p.First.Trim(), p.Second, StringComparison.OrdinalIgnoreCase));

    private static AuthorityEntry? ParseRow(CsvRecord record, SourceLine at, ImmutableArray<Diagnostic>.Builder problems)
    {
        var fields = record.Fields;
        if (fields.Length is < 2 or > 3)
        {
            problems.Add(new Diagnostic(at, Severity.Error, $"expected 2 or 3 fields (label,name,variants), found {fields.Length}"));
            return null;
        }
        if (!Enum.TryParse<NameLabel>(fields[0].Trim(), ignoreCase: true, out var label) || !Enum.IsDefined(label)
            || fields[0].Trim().Any(char.IsDigit))
        {
            problems.Add(new Diagnostic(at, Severity.Error, $"label \"{fields[0]}\" is not PER, LOC or ORG"));
            return null;
        }
        var name = fields[1].Trim();
        if (NameFolding.FoldedWords(name).Length == 0)
        {
            problems.Add(new Diagnostic(at, Severity.Error, "name is empty"));
            return null;
        }
        var variants = fields.Length < 3
            ? ImmutableArray<string>.Empty
            : fields[2].Split('|', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries)
                .Where(v => NameFolding.FoldedWords(v).Length > 0 && v != name)
                .Distinct(StringComparer.Ordinal)
                .ToImmutableArray();
        return new AuthorityEntry(label, name, variants, at);
    }
}
