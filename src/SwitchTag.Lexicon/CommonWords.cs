namespace SwitchTag.Lexicon;

/// <summary>Counts how often each word is written in lower case in running text: a town name that
/// is also an ordinary word ("most" in Czech and English, "nice", "split") shows up lower-case in
/// any corpus of the language, while a name does not.</summary>
public static class CommonWords
{
    /// <summary>Folded word → lower-case occurrences over all <paramref name="files"/> (one text per line),
    /// kept only for words <paramref name="keep"/> accepts (the gazetteer's one-word names).</summary>
    public static Dictionary<string, int> Count(IEnumerable<string> files, Func<string, bool> keep, int minCount = 2)
    {
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var file in files)
            foreach (var line in File.ReadLines(file))
                foreach (var word in NameWords.Split(line))
                {
                    if (!char.IsLower(line[word.Start])) continue;
                    if (!keep(word.Folded)) continue;
                    counts[word.Folded] = counts.GetValueOrDefault(word.Folded) + 1;
                }
        return counts.Where(p => p.Value >= minCount).ToDictionary(p => p.Key, p => p.Value, StringComparer.Ordinal);
    }
}
