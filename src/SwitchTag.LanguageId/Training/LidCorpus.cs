using System.Text;

namespace SwitchTag.LanguageId.Training;

/// <summary>One line of language-identification text. <paramref name="Class"/> is the model class
/// (sr-Cyrl for transliterated Serbian), <paramref name="Code"/> the ISO 639 code it reports.</summary>
public sealed record CorpusLine(string Class, string Code, string Text, string Source, Split Split);

/// <summary>Reads the training text from the shared data folder (see ../shared/data/README.md):
/// lid/&lt;code&gt;.txt (Universal Dependencies sentences), the <c># text = </c> lines of the Universal NER
/// train files (da, sv, hr, sr, sk, pt, zh), NerKor sentences for Hungarian, and Serbian Cyrillic
/// made from the Serbian Latin lines. Deterministic: sources and files in ordinal order.</summary>
public static class LidCorpus
{
    private static readonly (string Code, string Folder)[] UnerTrain =
    [
        ("da", "Danish-DDT"), ("hr", "Croatian-SET"), ("pt", "Portuguese-Bosque"), ("sk", "Slovak-SNK"),
        ("sr", "Serbian-SET"), ("sv", "Swedish-Talbanken"), ("zh", "Chinese-GSD"),
    ];

    /// <summary>NerKor has about 66k sentences; one in four (chosen by text hash) keeps Hungarian in
    /// line with the other languages and training within its time budget.</summary>
    private const int NerKorKeepOneIn = 4;

    public static List<CorpusLine> Load(string dataRoot)
    {
        var lines = new List<CorpusLine>();
        var lid = Path.Combine(dataRoot, "lid");
        foreach (var file in Directory.GetFiles(lid, "*.txt").Order(StringComparer.Ordinal))
        {
            var code = Path.GetFileNameWithoutExtension(file);
            foreach (var line in File.ReadLines(file)) Add(lines, code, line, "lid/" + code + ".txt");
        }
        foreach (var (code, folder) in UnerTrain)
        {
            var dir = Path.Combine(dataRoot, "ner", "uner", folder);
            if (!Directory.Exists(dir)) continue;
            foreach (var file in Directory.GetFiles(dir, "*-train.iob2").Order(StringComparer.Ordinal))
                foreach (var line in File.ReadLines(file))
                    if (line.StartsWith("# text = ", StringComparison.Ordinal))
                        Add(lines, code, line["# text = ".Length..], "ner/uner/" + folder);
        }
        var nerkor = Path.Combine(dataRoot, "ner", "nerkor", "data");
        if (Directory.Exists(nerkor))
            foreach (var sentence in NerKorSentences(nerkor))
                if (Fnv(sentence) % NerKorKeepOneIn == 0)
                    Add(lines, "hu", sentence, "ner/nerkor");
        return Deduplicate(lines);
    }

    private static void Add(List<CorpusLine> lines, string code, string raw, string source)
    {
        var text = raw.Trim();
        if (text.Length < 3) return;
        var split = HoldOut.Of(text);
        if (code == "sr")
        {
            lines.Add(new CorpusLine("sr-Latn", "sr", text, source, split));
            lines.Add(new CorpusLine("sr-Cyrl", "sr", SerbianCyrillic.FromLatin(text), source + " (Cyrillic)", split));
            return;
        }
        lines.Add(new CorpusLine(code, code, text, source, split));
    }

    private static List<CorpusLine> Deduplicate(List<CorpusLine> lines)
    {
        var seen = new HashSet<(string, string)>();
        return lines.Where(l => seen.Add((l.Class, l.Text))).ToList();
    }

    /// <summary>NerKor CoNLL-U Plus: the first column is the token form; sentences end at a blank line.
    /// Tokens are joined by spaces, without a space before closing punctuation or after opening.</summary>
    private static IEnumerable<string> NerKorSentences(string root)
    {
        foreach (var file in Directory.GetFiles(root, "*.conllup", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
        {
            var sb = new StringBuilder();
            bool glue = true;
            foreach (var line in File.ReadLines(file).Append(""))
            {
                if (line.Length == 0)
                {
                    if (sb.Length > 0) yield return sb.ToString();
                    sb.Clear();
                    glue = true;
                    continue;
                }
                if (line[0] == '#') continue;
                int tab = line.IndexOf('\t');
                var form = tab < 0 ? line : line[..tab];
                bool closing = form is "." or "," or "!" or "?" or ";" or ":" or ")" or "]" or "»" or "”" or "…";
                if (sb.Length > 0 && !glue && !closing) sb.Append(' ');
                sb.Append(form);
                glue = form is "(" or "[" or "„" or "«";
            }
        }
    }

    private static ulong Fnv(string s)
    {
        ulong h = 14695981039346656037UL;
        foreach (char c in s) h = (h ^ c) * 1099511628211UL;
        return h ^ (h >> 31);
    }
}
