using SwitchTag.Core.Text;

namespace SwitchTag.Lexicon;

/// <summary>Collects <see cref="NameCaution"/>s for gazetteer names from text corpora: one-sentence-
/// per-line files named by language code (lid/&lt;code&gt;.txt) and NER files in IOB2/CoNLL columns.</summary>
public static class GazetteerCautions
{
    private const int MinLowerCase = 3;
    private const int MinCapitalised = 2;
    private const int MinPerson = 2;

    /// <summary>Places this populous keep their name even if it is also a capitalised word or a
    /// person's name (Essen, Boston, Jordan).</summary>
    private const long PopulationLimit = 100_000;

    public static Dictionary<string, NameCaution> Collect(
        NameIndex index,
        IReadOnlyList<GazetteerPlace> places,
        IEnumerable<string> languageCorpora,
        IEnumerable<string> nerFiles)
    {
        var cautions = new Dictionary<string, NameCaution>(StringComparer.Ordinal);
        foreach (var file in languageCorpora)
            FromCorpus(file, index, places, cautions);
        FromNer(nerFiles, index, places, cautions);
        return cautions;
    }

    private static void FromCorpus(string file, NameIndex index, IReadOnlyList<GazetteerPlace> places, Dictionary<string, NameCaution> cautions)
    {
        var language = Path.GetFileNameWithoutExtension(file);
        var rule = StemRules.For(language);
        var lower = new Dictionary<string, int>(StringComparer.Ordinal);
        var capitalisedMid = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var line in File.ReadLines(file))
        {
            var words = NameWords.Split(line);
            for (int k = 0; k < words.Count; k++)
            {
                char first = line[words[k].Start];
                if (char.IsLower(first)) Increment(lower, words[k].Folded);
                else if (k > 0 && char.IsUpper(first) && !TextPosition.IsSentenceStart(line, words[k].Start))
                    Increment(capitalisedMid, words[k].Folded);
            }
        }
        foreach (var (word, count) in lower)
            if (count >= MinLowerCase && PlacesNamed(word, index, rule).Any())
                Add(cautions, word, NameCaution.CommonWord);
        foreach (var (word, count) in capitalisedMid)
        {
            if (count >= MinCapitalised && OnlySmallPlaces(PlacesNamed(word, index, rule), places))
                Add(cautions, word, NameCaution.CapitalisedWord);
        }
    }

    private static void FromNer(IEnumerable<string> files, NameIndex index, IReadOnlyList<GazetteerPlace> places, Dictionary<string, NameCaution> cautions)
    {
        var person = new Dictionary<string, int>(StringComparer.Ordinal);
        var place = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var file in files)
            foreach (var line in File.ReadLines(file))
            {
                if (line.Length == 0 || line[0] == '#') continue;
                var columns = line.Split('\t');
                if (columns.Length < 2) columns = line.Split(' ');
                if (columns.Length < 2) continue;
                bool indexed = columns[0].All(char.IsAsciiDigit) && columns.Length >= 3;
                var token = indexed ? columns[1] : columns[0];
                var tag = indexed ? columns[2] : columns[^1];
                var folded = NameFolding.Fold(token);
                if (tag.EndsWith("-PER", StringComparison.Ordinal)) Increment(person, folded);
                else if (tag.EndsWith("-LOC", StringComparison.Ordinal)) Increment(place, folded);
            }
        foreach (var (word, count) in person)
            if (count >= MinPerson && count > place.GetValueOrDefault(word) && index.IndexOf(word) is >= 0 and var k
                && OnlySmallPlaces(index.IdsAt(k).ToArray(), places))
                Add(cautions, word, NameCaution.PersonName);
    }

    /// <summary>Places a one-word name can be, under the corpus language's rule.</summary>
    private static IEnumerable<int> PlacesNamed(string word, NameIndex index, StemRule? rule)
    {
        var words = new List<NameWord> { new(0, word.Length, word) };
        foreach (var hit in InflectedMatcher.MatchAt(index, word, words, 0, rule))
            if (hit.WordCount == 1)
                foreach (int id in index.IdsAt(hit.KeyIndex).ToArray())
                    yield return id;
    }

    private static bool OnlySmallPlaces(IEnumerable<int> ids, IReadOnlyList<GazetteerPlace> places)
    {
        bool any = false;
        foreach (int id in ids)
        {
            if (places[id].Population >= PopulationLimit) return false;
            any = true;
        }
        return any;
    }

    private static void Increment(Dictionary<string, int> counts, string word) =>
        counts[word] = counts.GetValueOrDefault(word) + 1;

    private static void Add(Dictionary<string, NameCaution> cautions, string word, NameCaution caution) =>
        cautions[word] = cautions.GetValueOrDefault(word) | caution;
}
