namespace SwitchTag.Tagging;

/// <summary>Precision, recall and F1 of exact chunk matches.</summary>
public sealed record PrfScore(int Correct, int Predicted, int Gold)
{
    public double Precision => Predicted == 0 ? 0 : (double)Correct / Predicted;
    public double Recall => Gold == 0 ? 0 : (double)Correct / Gold;
    public double F1 => Precision + Recall == 0 ? 0 : 2 * Precision * Recall / (Precision + Recall);
}

/// <summary>conlleval's scoring: a chunk starts at B-X, or at I-X after O or after a chunk of
/// another type; it ends before O, B-, or I- of another type; a predicted chunk is correct when
/// its start, end and type all equal a gold chunk's.</summary>
public static class ConllScore
{
    public static readonly string[] Types = ["PER", "LOC", "ORG"];

    public static List<(int Start, int End, string Type)> Chunks(IReadOnlyList<string> tags)
    {
        var chunks = new List<(int, int, string)>();
        int start = -1;
        string type = "";
        for (int i = 0; i <= tags.Count; i++)
        {
            string tag = i < tags.Count ? tags[i] : "O";
            bool continues = tag.StartsWith("I-", StringComparison.Ordinal) && start >= 0 && tag[2..] == type;
            if (continues) continue;
            if (start >= 0) chunks.Add((start, i, type));
            start = -1;
            if (tag.Length > 2 && tag[1] == '-') { start = i; type = tag[2..]; }
        }
        return chunks;
    }

    /// <summary>Per type and micro ("micro") scores over paired gold and predicted tag sequences.</summary>
    public static Dictionary<string, PrfScore> Score(IEnumerable<(IReadOnlyList<string> Gold, IReadOnlyList<string> Predicted)> pairs)
    {
        const int predictedSlot = 0, correctSlot = 1, goldSlot = 2;
        var counts = Types.Append("micro").ToDictionary(t => t, _ => new int[3]);
        foreach (var (gold, predicted) in pairs)
        {
            var g = Chunks(gold).ToHashSet();
            foreach (var c in Chunks(predicted))
            {
                Count(c.Type, predictedSlot);
                if (g.Contains(c)) Count(c.Type, correctSlot);
            }
            foreach (var c in g) Count(c.Type, goldSlot);
        }
        return counts.ToDictionary(kv => kv.Key, kv => new PrfScore(kv.Value[correctSlot], kv.Value[predictedSlot], kv.Value[goldSlot]));

        void Count(string type, int slot)
        {
            counts["micro"][slot]++;
            if (counts.TryGetValue(type, out var c)) c[slot]++;
        }
    }
}
