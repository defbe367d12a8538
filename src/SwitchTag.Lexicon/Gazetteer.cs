using SwitchTag.Core.Text;
using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>Populated places with their names in Latin, Cyrillic, Greek and Hebrew script, found by
/// folded and inflected spellings. Built from GeoNames (CC BY); see models/gazetteer.md.</summary>
public sealed class Gazetteer : INameLexicon
{
    /// <summary>The shipped file's name inside models/.</summary>
    public const string FileName = "gazetteer.bin.gz";

    /// <summary>One-word names shorter than this are never found in running text.</summary>
    public const int MinWordLength = 3;

    /// <summary>A common word naming only places smaller than this is not a place even mid-sentence
    /// ("shouting Alle raus", "Hard" in English).</summary>
    public const long VillagePopulation = 15_000;

    private readonly GazetteerPlace[] _places;
    private readonly NameIndex _index;
    private readonly IReadOnlyDictionary<string, NameCaution> _cautions;

    private Gazetteer(GazetteerPlace[] places, NameIndex index, IReadOnlyDictionary<string, NameCaution> cautions, ImmutableArray<Diagnostic> problems)
    {
        _places = places;
        _index = index;
        _cautions = cautions;
        Problems = problems;
    }

    public static Gazetteer Empty { get; } = new([], NameIndex.Build([]), new Dictionary<string, NameCaution>(), []);

    /// <summary>Why the gazetteer is empty or incomplete (file missing, corrupt, rows skipped).</summary>
    public ImmutableArray<Diagnostic> Problems { get; }

    public IReadOnlyList<GazetteerPlace> Places => _places;

    /// <summary>Distinct folded names indexed.</summary>
    public int NameCount => _index.Count;

    /// <summary>Folded words (names, or inflected forms of names) that are risky to tag alone.</summary>
    public IReadOnlyDictionary<string, NameCaution> Cautions => _cautions;

    /// <summary>Reads the compact file written by <see cref="Save"/>. A missing or damaged file gives
    /// an empty gazetteer whose <see cref="Problems"/> says why.</summary>
    public static Gazetteer Load(string path)
    {
        try
        {
            var (places, index, cautions) = GazetteerFile.Read(path);
            return new Gazetteer(places, index, cautions, []);
        }
        catch (Exception e) when (e is IOException or InvalidDataException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return new Gazetteer([], NameIndex.Build([]), new Dictionary<string, NameCaution>(), [new Diagnostic(new SourceLine(path, 1), Severity.Error, $"cannot load gazetteer: {e.Message}")]);
        }
    }

    /// <summary>Builds the gazetteer straight from a GeoNames dump (cities1000.txt, cities15000.txt),
    /// keeping the same names the shipped file keeps. <paramref name="languageCorpora"/> are
    /// one-sentence-per-line files named by language code (lid/pl.txt) and <paramref name="nerFiles"/>
    /// IOB2/CoNLL files; both only mark <see cref="Cautions"/>.</summary>
    public static Gazetteer FromGeoNamesText(string path, IEnumerable<string>? languageCorpora = null, IEnumerable<string>? nerFiles = null)
    {
        var (rows, problems) = GeoNamesText.Read(path);
        return FromRows(rows, languageCorpora, nerFiles, problems);
    }

    public static Gazetteer FromRows(
        IEnumerable<GeoNamesRow> rows,
        IEnumerable<string>? languageCorpora = null,
        IEnumerable<string>? nerFiles = null,
        ImmutableArray<Diagnostic> problems = default)
    {
        var list = rows.ToList();
        var places = list.Select(r => r.Place).ToArray();
        var index = NameIndex.Build(list.SelectMany((row, id) =>
            row.Names.Select(NameFolding.FoldedWords).Distinct(StringComparer.Ordinal).Select(key => (key, id))));
        var cautions = GazetteerCautions.Collect(index, places, languageCorpora ?? [], nerFiles ?? []);
        return new Gazetteer(places, index, cautions, problems.IsDefault ? [] : problems);
    }

    public void Save(string path) => GazetteerFile.Write(path, _places, _index, _cautions);

    /// <summary>Every place one of whose names is <paramref name="name"/> exactly, folded, or as an
    /// inflected form under the rules of <paramref name="language"/> (for a language without rules,
    /// every rule is tried when folded spelling finds nothing). Most populous first.</summary>
    public IReadOnlyList<GazetteerPlace> Lookup(string name, LanguageCode language) =>
        Candidates(name, language).Select(c => c.Place).ToList();

    /// <summary>As <see cref="Lookup"/>, with how each place was met: folded matches before
    /// inflected ones would be the reviewer's ranking; this list keeps population order.</summary>
    public IReadOnlyList<GazetteerCandidate> Candidates(string name, LanguageCode language)
    {
        if (string.IsNullOrWhiteSpace(name) || _places.Length == 0) return [];
        var words = NameWords.Split(name);
        if (words.Count == 0) return [];
        var rule = StemRules.For(language);
        var hits = WholeNameHits(name, words, rule, fallback: false);
        if (hits.Count == 0 && rule is null)
            hits = StemRules.All.SelectMany(r => WholeNameHits(name, words, r, fallback: true)).ToList();

        var best = new Dictionary<int, GazetteerCandidate>();
        foreach (var hit in hits)
            foreach (int id in _index.IdsAt(hit.KeyIndex))
                if (!best.TryGetValue(id, out var seen) || hit.Kind < seen.Kind)
                    best[id] = new GazetteerCandidate(_places[id], hit.Kind);
        return best.Values.OrderByDescending(c => c.Place.Population).ThenBy(c => c.Place.GeonameId).ToList();
    }

    /// <summary>Capitalised spans of <paramref name="text"/> that are gazetteer names, longest first,
    /// non-overlapping, for a tagger working without a model. Conservative: the first and last word
    /// of a span must be capitalised; a one-word span needs <see cref="MinWordLength"/> letters, must
    /// not be a stop word (function words, titles, month names), a person's name or a word
    /// capitalised for another reason (<see cref="NameCaution"/>), and a common lower-case word is
    /// skipped at the start of a sentence, or anywhere if it names only villages (&lt; 15,000 people).
    /// Inflection follows <paramref name="language"/> only; no fallback across rules here.</summary>
    public ImmutableArray<NameMatch> Find(string text, LanguageCode language)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (_places.Length == 0 || text.Length == 0) return [];
        var rule = StemRules.For(language);
        var candidates = new List<NameMatch>();
        foreach (var (words, starts) in NameWords.Windows(text, InflectedMatcher.MaxNameWords - 1))
            for (int i = 0; i < starts; i++)
            {
                if (!char.IsLetter(text[words[i].Start]) || !NameWords.StartsUpper(text.AsSpan(words[i].Start))) continue;
                var hits = InflectedMatcher.MatchAt(_index, text, words, i, rule)
                    .Where(h => NameWords.StartsUpper(text.AsSpan(words[i + h.WordCount - 1].Start)))
                    .Where(h => h.WordCount > 1 || AcceptsSingleWord(text, words, i, h))
                    .ToList();
                if (hits.Count == 0) continue;
                int longest = hits.Max(h => h.WordCount);
                var place = hits.Where(h => h.WordCount == longest)
                    .SelectMany(h => _index.IdsAt(h.KeyIndex).ToArray())
                    .Select(id => _places[id])
                    .OrderByDescending(p => p.Population).ThenBy(p => p.GeonameId)
                    .First();
                candidates.Add(new NameMatch(words[i].Start, words[i + longest - 1].End, NameLabel.LOC, place.Name, MentionSource.Gazetteer));
            }
        return NameMatchSelection.LongestFirst(candidates);
    }

    /// <summary>A capitalised word of 3+ letters that is a place name spelled as it stands (folded),
    /// not a stop word, common word or word capitalised for another reason: safe for a language
    /// segmenter to treat as belonging to no language. Person names that are also places ("David")
    /// count as known, even though they are also capitalised words.</summary>
    public bool IsKnownName(ReadOnlySpan<char> word)
    {
        word = word.Trim();
        if (word.Length < MinWordLength || !NameWords.StartsUpper(word) || !char.IsLetter(word[0])) return false;
        var folded = NameFolding.Fold(word.ToString());
        return !folded.Contains(' ') && _index.IndexOf(folded) >= 0
            && !GazetteerStopWords.Words.Contains(folded)
            && CautionOf(folded) is var caution
            && !caution.HasFlag(NameCaution.CommonWord)
            && (!caution.HasFlag(NameCaution.CapitalisedWord) || caution.HasFlag(NameCaution.PersonName));
    }

    private List<IndexHit> WholeNameHits(string name, List<NameWord> words, StemRule? rule, bool fallback) =>
        InflectedMatcher.MatchAt(_index, name, words, 0, rule, fallback).Where(h => h.WordCount == words.Count).ToList();

    private bool AcceptsSingleWord(string text, List<NameWord> words, int i, IndexHit hit)
    {
        var folded = words[i].Folded;
        var key = _index.KeyAt(hit.KeyIndex);
        if (folded.Length < MinWordLength || GazetteerStopWords.Words.Contains(folded) || GazetteerStopWords.Words.Contains(key)) return false;
        var caution = CautionOf(folded) | CautionOf(key);
        if ((caution & (NameCaution.PersonName | NameCaution.CapitalisedWord)) != 0) return false;
        if ((caution & NameCaution.CommonWord) == 0) return true;
        long largest = 0;
        foreach (int id in _index.IdsAt(hit.KeyIndex)) largest = Math.Max(largest, _places[id].Population);
        return largest >= VillagePopulation && !TextPosition.IsSentenceStart(text, words[i].Start);
    }

    private NameCaution CautionOf(string folded) => _cautions.GetValueOrDefault(folded);
}
