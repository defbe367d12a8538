using System.Text.Json;

namespace LangIdTools;

/// <summary>One utterance of ../shared/data/codeswitch/miami-dev/gold.jsonl: its words are
/// <c>Text.Split(' ')</c>, each with one gold label (a language code, und, filler, other or mixed).</summary>
public sealed record SpeechUtterance(string Conversation, string Speaker, string Text, string[] Labels, string[] Pair, bool Mixed)
{
    /// <summary>Char offset of each space-separated word of <see cref="Text"/>.</summary>
    public int[] WordStarts()
    {
        var starts = new int[Labels.Length];
        int at = 0;
        for (int w = 0; w < starts.Length; w++)
        {
            starts[w] = at;
            int space = Text.IndexOf(' ', at);
            at = space < 0 ? Text.Length : space + 1;
        }
        return starts;
    }

    /// <summary>The README's rule: only words labelled with one of the pair's two codes are scored.</summary>
    public bool IsScored(int word) => Array.IndexOf(Pair, Labels[word]) >= 0;
}

public static class SpeechGold
{
    public const string MiamiDev = "codeswitch/miami-dev/gold.jsonl";

    /// <summary>Utterances grouped by conversation, in file order.</summary>
    public static List<List<SpeechUtterance>> Load(string dataRoot)
    {
        var conversations = new List<List<SpeechUtterance>>();
        foreach (var line in File.ReadLines(Path.Combine(dataRoot, MiamiDev)))
        {
            using var doc = JsonDocument.Parse(line);
            var r = doc.RootElement;
            string id = r.GetProperty("id").GetString()!;
            var u = new SpeechUtterance(id[..id.LastIndexOf(':')], r.GetProperty("speaker").GetString()!,
                r.GetProperty("text").GetString()!, r.GetProperty("labels").GetString()!.Split(' '),
                r.GetProperty("pair").GetString()!.Split('-'), r.GetProperty("mixed").GetInt32() == 1);
            if (u.Labels.Length != u.WordStarts().Length) throw new InvalidDataException($"{id}: labels and words differ in number");
            if (conversations.Count == 0 || conversations[^1][0].Conversation != u.Conversation) conversations.Add([]);
            conversations[^1].Add(u);
        }
        return conversations;
    }
}
