using System.Text;
using System.Text.Json;

namespace SwitchTag.Tagging;

/// <summary>Scores a <see cref="SequenceTagger"/> on gold files with conlleval's exact-span rules:
/// pooled over all sentences of all files, and per source and per language of the files.</summary>
public static class NerEvaluation
{
    public static Dictionary<string, PrfScore> Evaluate(SequenceTagger tagger, IReadOnlyList<GoldSentence> sentences)
    {
        var predicted = tagger.Tags([.. sentences.Select(s => s.Words)]);
        return ConllScore.Score(sentences.Select((s, i) => (s.Tags, (IReadOnlyList<string>)predicted[i])));
    }

    /// <summary>Tags every sentence of every file once and scores them pooled, per source and per
    /// language.</summary>
    public static NerReport Report(SequenceTagger tagger, IReadOnlyList<(GoldFileLabel Label, IReadOnlyList<GoldSentence> Sentences)> files) =>
        Score(files, tagger.Tags([.. files.SelectMany(f => f.Sentences).Select(s => s.Words)]));

    /// <summary>Scores predicted tags given in file order, sentence by sentence.</summary>
    public static NerReport Score(IReadOnlyList<(GoldFileLabel Label, IReadOnlyList<GoldSentence> Sentences)> files,
        IReadOnlyList<IReadOnlyList<string>> predicted)
    {
        var all = files.SelectMany(f => f.Sentences.Select(s => (f.Label, s))).ToList();
        if (predicted.Count != all.Count) throw new ArgumentException($"{predicted.Count} predicted sentences for {all.Count} gold ones", nameof(predicted));
        var pairs = all.Select((x, i) => (x.Label, Pair: (x.s.Tags, predicted[i]))).ToList();
        return new NerReport(
            ConllScore.Score(pairs.Select(p => p.Pair)),
            Grouped(pairs, l => l.Source),
            Grouped(pairs, l => l.Language.Code));
    }

    /// <summary>The sentence with every word lower-cased (invariant culture), tags unchanged: how
    /// the tagger does on speech-recognition output that carries no capitals.</summary>
    public static GoldSentence LowerCased(GoldSentence s) =>
        s with { Words = [.. s.Words.Select(w => w.ToLowerInvariant())] };

    private static IReadOnlyDictionary<string, IReadOnlyDictionary<string, PrfScore>> Grouped(
        List<(GoldFileLabel Label, (IReadOnlyList<string>, IReadOnlyList<string>) Pair)> pairs, Func<GoldFileLabel, string> key) =>
        pairs.GroupBy(p => key(p.Label), StringComparer.Ordinal)
            .OrderBy(g => g.Key, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => (IReadOnlyDictionary<string, PrfScore>)ConllScore.Score(g.Select(p => p.Pair)), StringComparer.Ordinal);

    /// <summary>The <c>eval ner --json</c> object: micro first, then PER, LOC, ORG, each with
    /// precision, recall and f1.</summary>
    public static string ToJson(IReadOnlyDictionary<string, PrfScore> scores) => Json(w => WriteScores(w, scores));

    /// <summary>The contract's four fields, then <c>bySource</c> and <c>byLanguage</c>: one object
    /// per source or language with the same four fields and <c>goldNames</c>, the number of gold
    /// names it was scored on.</summary>
    public static string ToJson(NerReport report) => Json(w =>
    {
        WriteScores(w, report.Overall);
        foreach (var (name, groups) in new[] { ("bySource", report.BySource), ("byLanguage", report.ByLanguage) })
        {
            w.WriteStartObject(name);
            foreach (var (key, scores) in groups)
            {
                w.WriteStartObject(key);
                WriteScores(w, scores);
                w.WriteNumber("goldNames", scores["micro"].Gold);
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
    });

    public static string ToTable(IReadOnlyDictionary<string, PrfScore> scores)
    {
        var sb = new StringBuilder("type   precision  recall  f1      gold  predicted\n");
        foreach (var key in ConllScore.Types.Prepend("micro"))
        {
            var s = scores[key];
            sb.Append($"{key,-6} {s.Precision,9:F4}  {s.Recall,6:F4}  {s.F1,6:F4}  {s.Gold,5}  {s.Predicted,9}\n");
        }
        return sb.ToString();
    }

    /// <summary>The pooled table, then one micro line per source and per language when the files
    /// hold more than one of either.</summary>
    public static string ToTable(NerReport report)
    {
        var sb = new StringBuilder(ToTable(report.Overall));
        foreach (var (name, groups) in new[] { ("source", report.BySource), ("language", report.ByLanguage) })
        {
            if (groups.Count < 2) continue;
            sb.Append($"\n{name,-20} precision  recall  f1      gold  predicted\n");
            foreach (var (key, scores) in groups)
            {
                var s = scores["micro"];
                sb.Append($"{key,-20} {s.Precision,9:F4}  {s.Recall,6:F4}  {s.F1,6:F4}  {s.Gold,5}  {s.Predicted,9}\n");
            }
        }
        return sb.ToString();
    }

    private static void WriteScores(Utf8JsonWriter w, IReadOnlyDictionary<string, PrfScore> scores)
    {
        foreach (var key in ConllScore.Types.Prepend("micro"))
        {
            var s = scores[key];
            w.WriteStartObject(key);
            w.WriteNumber("precision", Math.Round(s.Precision, 4));
            w.WriteNumber("recall", Math.Round(s.Recall, 4));
            w.WriteNumber("f1", Math.Round(s.F1, 4));
            w.WriteEndObject();
        }
    }

    private static string Json(Action<Utf8JsonWriter> write)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            write(w);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }
}
