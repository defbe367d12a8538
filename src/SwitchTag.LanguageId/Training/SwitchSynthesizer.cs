namespace SwitchTag.LanguageId.Training;

/// <summary>A whitespace-delimited word of a synthetic turn with its gold language.</summary>
public readonly record struct GoldWord(int Start, int End, string Code);

/// <summary>An English line with a known stretch of another language inside or at its end.</summary>
public sealed record SyntheticTurn(string Text, IReadOnlyList<GoldWord> Words, string InsertedCode);

/// <summary>Builds code-switched turns from corpus lines with a seeded generator: an English line
/// with 2–6 consecutive words of another language's line inserted at a word boundary or appended
/// as a tail. The same seed and lines always give the same turns.</summary>
public static class SwitchSynthesizer
{
    public static List<SyntheticTurn> Build(IReadOnlyList<CorpusLine> lines, Split split, int count, int seed)
    {
        var random = new Random(seed);
        var english = lines.Where(l => l.Split == split && l.Code == "en" && Words(l.Text).Length >= 6)
            .Select(l => l.Text).ToList();
        var byClass = lines.Where(l => l.Split == split && l.Code != "en" && Words(l.Text).Length >= 2)
            .GroupBy(l => l.Class).OrderBy(g => g.Key, StringComparer.Ordinal).Select(g => g.ToList()).ToList();
        var turns = new List<SyntheticTurn>(count);
        if (english.Count == 0 || byClass.Count == 0) return turns;
        for (int i = 0; i < count; i++)
        {
            var baseWords = Words(english[random.Next(english.Count)]);
            var pool = byClass[random.Next(byClass.Count)];
            var foreignLine = pool[random.Next(pool.Count)];
            var foreign = Words(foreignLine.Text);
            int take = Math.Min(foreign.Length, random.Next(2, 7));
            int from = random.Next(foreign.Length - take + 1);
            bool tail = random.Next(2) == 0;
            int at = tail ? baseWords.Length : random.Next(1, baseWords.Length);
            var words = new List<(string Word, string Code)>();
            words.AddRange(baseWords[..at].Select(w => (w, "en")));
            words.AddRange(foreign.Skip(from).Take(take).Select(w => (w, foreignLine.Code)));
            words.AddRange(baseWords[at..].Select(w => (w, "en")));
            var gold = new List<GoldWord>(words.Count);
            var text = new System.Text.StringBuilder();
            foreach (var (word, code) in words)
            {
                if (text.Length > 0) text.Append(' ');
                gold.Add(new GoldWord(text.Length, text.Length + word.Length, code));
                text.Append(word);
            }
            turns.Add(new SyntheticTurn(text.ToString(), gold, foreignLine.Code));
        }
        return turns;
    }

    private static string[] Words(string text) => text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
}
